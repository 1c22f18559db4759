// The reviewer's workspace: the record on one side, the rubric on the other (stacked on phones).
import { useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';

import { lazyView } from '@/components/lib/lazy-view';
import { useSessionQuery } from '@/components/queries/session';
import { usePlanQuery } from '@/components/queries/visit-plan';
import { RiskHintPanel } from '@/components/risk/risk-hint-panel';
import { HelpOverlay } from '@/components/ui/help-overlay';
import { Notice } from '@/components/ui/notice';
import { Section } from '@/components/ui/section';
import { space, WIDE_BREAKPOINT } from '@/components/ui/theme';
import { PlanCard } from '@/components/visit-plan/plan-card';
import type { Workspace } from '@/shared/review';

import { ChangesPanel } from './changes-panel';
import { ClaimBar } from './claim-bar';
import { RevisionPanel } from './revision-panel';
import { RubricColumn } from './rubric-column';
import { useScoreSheet } from './use-score-sheet';
import { SCORING_KEYS, useScoringKeys } from './use-scoring-keys';

const StationPlot = lazyView(() => import('@/components/stations/station-plot').then((m) => m.StationPlot), 'the station plan');

// The technician's visit plan beside the record, collapsed: what was meant to be captured.
function JobPlan({ jobId }: { jobId: number }) {
  const plan = usePlanQuery(jobId);
  if (!plan.data) return null;
  return <PlanCard jobId={jobId} plan={plan.data.version > 0 ? plan.data.plan : null} canPlan={false} />;
}

export function ScoringScreen({ workspace, onDecided }: { workspace: Workspace; onDecided: (message: string) => void }) {
  const { data: me } = useSessionQuery();
  const { job, revision } = workspace;
  const second = workspace.secondReviewId;
  const scores = useScoreSheet(workspace);
  const [current, setCurrent] = useState(0);
  const [help, setHelp] = useState(false);

  const wide = useWindowDimensions().width >= WIDE_BREAKPOINT;
  const holdsClaim = second !== null ? workspace.secondClaimedByMe : job.claimedBy?.id === me?.id && me?.role === 'reviewer';

  useScoringKeys({
    criteria: workspace.rubric.criteria,
    current,
    setCurrent,
    setScore: scores.setScore,
    toggleHelp: () => setHelp((h) => !h),
    enabled: holdsClaim && !help,
  });

  return (
    <View style={{ gap: space.md }}>
      {second ? (
        <Notice tone="info">Blind second review: the first reviewer&apos;s score is hidden. Your decision does not change the job.</Notice>
      ) : null}
      <ClaimBar workspace={workspace} holdsClaim={holdsClaim} />
      <View style={[styles.columns, wide && styles.wideColumns]}>
        <View style={[{ gap: space.md }, wide ? { flex: 1 } : undefined]}>
          {workspace.previous ? (
            <ChangesPanel previous={workspace.previous} currentRevision={revision.number} files={revision.files} />
          ) : null}
          <RiskHintPanel
            record={revision.record}
            analysis={revision.stationAnalysis}
            job={{ lossType: job.lossType, propertyType: job.propertyType }}
            revision={revision.number}
            audience="reviewer"
          />
          <RevisionPanel revision={revision} />
          <JobPlan jobId={job.id} />
          {revision.stationAnalysis ? (
            <Section title="Station layout" summary="Computed by Sightline from the station file">
              <StationPlot analysis={revision.stationAnalysis} units={revision.record.units} />
            </Section>
          ) : null}
        </View>
        <View style={wide ? { flex: 1 } : undefined}>
          {holdsClaim ? (
            <RubricColumn
              workspace={workspace}
              scores={scores}
              current={current}
              onFocusCriterion={setCurrent}
              stickySummary={wide}
              onDecided={onDecided}
            />
          ) : null}
        </View>
      </View>
      <HelpOverlay visible={help} title="Scoring keys" keys={SCORING_KEYS} onClose={() => setHelp(false)} />
    </View>
  );
}

const styles = StyleSheet.create({
  columns: { gap: space.lg },
  wideColumns: { flexDirection: 'row', alignItems: 'flex-start' },
});
