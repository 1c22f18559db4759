import { useRouter } from 'expo-router';
import { useMemo, useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { DECISION_LABELS, DECISIONS, type Decision, type Workspace } from '@/shared/review';
import { scaleMax } from '@/shared/rubric';
import { evaluate, type ScoreSheet } from '@/shared/scoring';
import { ApiError } from '@/components/lib/api-client';
import { useKeyboard } from '@/components/lib/use-keyboard';
import { useClaimMutation, useReleaseMutation, useReviewSubmitMutation, useSecondClaimMutation } from '@/components/queries/reviews';
import { useSessionQuery } from '@/components/queries/session';
import { Button } from '@/components/ui/button';
import { ChoiceField } from '@/components/ui/choice-field';
import { HelpOverlay } from '@/components/ui/help-overlay';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { colors, space, WIDE_BREAKPOINT } from '@/components/ui/theme';
import { CriterionRow, type CriterionEntry } from './criterion-row';
import { ChangesPanel } from './changes-panel';
import { LEVEL_LABELS } from '@/shared/capture-record';
import { suggestedComments } from '@/shared/station-analysis';
import { StationPlot } from '@/components/stations/station-plot';
import { Section } from '@/components/ui/section';
import { ReassignOne } from './reassign-one';
import { RevisionPanel } from './revision-panel';
import { ScoreSummary } from './score-summary';

const KEYS = [
  { keys: '↓ or j', action: 'Next criterion' },
  { keys: '↑ or k', action: 'Previous criterion' },
  { keys: '0 1 2 3 4', action: 'Score the current criterion' },
  { keys: 'p / f', action: 'Pass or fail a pass/fail criterion' },
  { keys: '?', action: 'Show or hide these keys' },
];

export function ScoringScreen({ workspace }: { workspace: Workspace }) {
  const router = useRouter();
  const { data: me } = useSessionQuery();
  const { rubric, applicable, job } = workspace;
  const second = workspace.secondReviewId;
  const carried = workspace.previous?.carried ?? {};
  // Criteria whose inputs did not change start from the last review's score, marked so.
  const [entries, setEntries] = useState<Record<string, CriterionEntry>>(() =>
    Object.fromEntries(rubric.criteria.map((c) => {
      const from = applicable[c.key] ? carried[c.key] : undefined;
      return [c.key, from ? { score: from.score ?? undefined, stockReason: from.stockReason, comment: from.comment } : { score: applicable[c.key] ? undefined : null, stockReason: null, comment: '' }];
    })),
  );
  const [current, setCurrent] = useState(0);
  const [decision, setDecision] = useState<Decision | undefined>();
  const [help, setHelp] = useState(false);
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const submit = useReviewSubmitMutation(job.id, second);
  const claim = useClaimMutation();
  const release = useReleaseMutation();
  const wide = useWindowDimensions().width >= WIDE_BREAKPOINT;

  const suggestions = useMemo(
    () => (workspace.revision.stationAnalysis ? suggestedComments(workspace.revision.stationAnalysis, workspace.revision.record.units, (l) => LEVEL_LABELS[l]) : { spacing: [], registration: [] }),
    [workspace.revision],
  );
  const holdsClaim = second !== null ? workspace.secondClaimedByMe : job.claimedBy?.id === me?.id && me?.role === 'reviewer';
  const secondClaim = useSecondClaimMutation();
  const sheet: ScoreSheet = useMemo(() => Object.fromEntries(rubric.criteria.map((c) => [c.key, entries[c.key].score])), [entries, rubric]);
  const evaluation = evaluate(rubric, sheet);

  const setScore = (value: number) => {
    const criterion = rubric.criteria[current];
    if (!criterion || !applicable[criterion.key] || value > scaleMax(criterion.scale)) return;
    setEntries((e) => ({ ...e, [criterion.key]: { ...e[criterion.key], score: value } }));
  };
  const move = (step: number) => setCurrent((i) => Math.min(Math.max(i + step, 0), rubric.criteria.length - 1));
  const currentIsPassFail = rubric.criteria[current]?.scale.kind === 'pass_fail';

  useKeyboard({
    ArrowDown: (e) => { e.preventDefault(); move(1); },
    j: () => move(1),
    ArrowUp: (e) => { e.preventDefault(); move(-1); },
    k: () => move(-1),
    ...Object.fromEntries([0, 1, 2, 3, 4].map((n) => [String(n), () => !currentIsPassFail && setScore(n)])),
    p: () => currentIsPassFail && setScore(1),
    f: () => currentIsPassFail && setScore(0),
    '?': () => setHelp((h) => !h),
  }, holdsClaim && !help);

  const onSubmit = async () => {
    if (!decision) return;
    setFieldErrors({});
    try {
      await submit.mutateAsync({
        decision,
        scores: rubric.criteria.map((c) => ({ key: c.key, score: entries[c.key].score ?? null, stockReason: entries[c.key].stockReason, comment: entries[c.key].comment })),
      });
      router.replace('/queue');
    } catch (error) {
      if (error instanceof ApiError) setFieldErrors(error.fields);
    }
  };

  const rubricColumn = (
    <View style={{ gap: space.sm }}>
      <View style={wide ? styles.sticky : undefined}>
        <ScoreSummary evaluation={evaluation} passMark={rubric.passMark} />
      </View>
      <Text variant="muted">{`Rubric version ${rubric.version}. Press ? for keys.`}</Text>
      {rubric.criteria.map((criterion, index) => (
        <CriterionRow
          key={criterion.key}
          criterion={criterion}
          applies={applicable[criterion.key]}
          entry={entries[criterion.key]}
          suggestions={criterion.key === 'spacing' ? suggestions.spacing : criterion.key === 'registration' ? suggestions.registration : []}
          carriedFrom={criterion.key in carried && entries[criterion.key].score === carried[criterion.key].score ? workspace.previous!.revision : null}
          current={index === current}
          error={fieldErrors[`scores.${criterion.key}`] ?? fieldErrors[`scores.${criterion.key}.comment`]}
          onFocus={() => setCurrent(index)}
          onChange={(entry) => setEntries((e) => ({ ...e, [criterion.key]: entry }))}
        />
      ))}
      <ChoiceField<Decision> label="Decision" options={DECISIONS.map((d) => ({ value: d, label: DECISION_LABELS[d] }))} value={decision} onChange={setDecision} error={fieldErrors.decision} />
      {decision === 'accept' && evaluation.complete && !evaluation.passed ? <Notice tone="caution">A failing review cannot be accepted. Request rework or a recapture.</Notice> : null}
      {submit.error instanceof ApiError && !Object.keys(submit.error.fields).length ? <Notice tone="error">{submit.error.message}</Notice> : null}
      <Button label={second ? 'Save blind second review' : 'Record decision'} onPress={() => void onSubmit()} disabled={!decision || !evaluation.complete} busy={submit.isPending} />
    </View>
  );

  return (
    <View style={{ gap: space.md }}>
      {second ? <Notice tone="info">Blind second review: the first reviewer's score is hidden. Your decision does not change the job.</Notice> : null}
      {!holdsClaim ? (
        <View style={styles.claimBar}>
          <Text>{second !== null ? 'Claim this blind review before scoring it.' : job.claimedBy ? `Claimed by ${job.claimedBy.name}.` : 'Nobody has claimed this job yet.'}</Text>
          {me?.role === 'reviewer' ? (
            <Button label="Claim to score" onPress={() => (second !== null ? secondClaim.mutate(second) : claim.mutate(job.id))} busy={claim.isPending || secondClaim.isPending} />
          ) : null}
          {secondClaim.error ? <Notice tone="error">{secondClaim.error.message}</Notice> : null}
          {me?.role === 'manager' && second === null ? <ReassignOne jobId={job.id} currentId={job.claimedBy?.id ?? null} /> : null}
          {claim.error ? <Notice tone="error">{claim.error.message}</Notice> : null}
        </View>
      ) : second === null ? (
        <View style={styles.claimBar}>
          <Text>{`You hold the claim${workspace.claimExpiresAt ? ` until ${new Date(workspace.claimExpiresAt).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' })} (extended while you work)` : ''}.`}</Text>
          <Button label="Release claim" tone="secondary" onPress={() => release.mutate(job.id, { onSuccess: () => router.replace('/queue') })} />
        </View>
      ) : null}
      <View style={[styles.columns, wide && { flexDirection: 'row', alignItems: 'flex-start' }]}>
        <View style={[{ gap: space.md }, wide ? { flex: 1 } : undefined]}>
          {workspace.previous ? <ChangesPanel previous={workspace.previous} currentRevision={workspace.revision.number} /> : null}
          <RevisionPanel revision={workspace.revision} />
          {workspace.revision.stationAnalysis ? (
            <Section title="Station layout" summary="Computed by Sightline from the station file">
              <StationPlot analysis={workspace.revision.stationAnalysis} units={workspace.revision.record.units} />
            </Section>
          ) : null}
        </View>
        <View style={wide ? { flex: 1 } : undefined}>{holdsClaim ? rubricColumn : null}</View>
      </View>
      <HelpOverlay visible={help} title="Scoring keys" keys={KEYS} onClose={() => setHelp(false)} />
    </View>
  );
}

const styles = StyleSheet.create({
  columns: { gap: space.lg },
  // position: sticky exists on the web build only; a phone scrolls the summary away.
  sticky: { position: 'sticky' as 'relative', top: 0, zIndex: 1 },
  claimBar: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap', backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.line, borderRadius: 8, padding: space.md },
});
