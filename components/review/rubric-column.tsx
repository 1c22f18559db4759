// The rubric side of the scoring screen: live total, one row per criterion, the decision.
// The shared review rules run here first, so most mistakes are shown before a round trip.
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ApiError } from '@/components/lib/api-client';
import { useReviewSubmitMutation } from '@/components/queries/workspace';
import { Button } from '@/components/ui/button';
import { ChoiceField } from '@/components/ui/choice-field';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, space } from '@/components/ui/theme';
import { LEVEL_LABELS } from '@/shared/capture-record';
import { type Decision, DECISION_LABELS, decisionOutcomeText, DECISIONS, type Workspace } from '@/shared/review';
import { decisionProblem, validateScores } from '@/shared/review-rules';
import { isBelowFullMarks } from '@/shared/scoring';
import { suggestedComments } from '@/shared/station-analysis';

import { CriterionRow } from './criterion-row';
import { ScoreSummary } from './score-summary';
import { describeReviewDraft, useReviewDraft } from './use-review-draft';
import type { useScoreSheet } from './use-score-sheet';

type Props = {
  workspace: Workspace;
  scores: ReturnType<typeof useScoreSheet>;
  current: number;
  onFocusCriterion: (index: number) => void;
  stickySummary: boolean;
  onDecided: (message: string) => void;
};

export function RubricColumn({ workspace, scores, current, onFocusCriterion, stickySummary, onDecided }: Props) {
  const { rubric, applicable, job } = workspace;
  const second = workspace.secondReviewId;
  const carried = workspace.previous?.carried ?? {};
  const { decision, setDecision, note, setNote } = scores;
  const [decided, setDecided] = useState(false);
  const draft = useReviewDraft(workspace, { scores: scores.scoreInputs(), decision, note }, !decided);
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const submit = useReviewSubmitMutation(job.id, second);
  const { entries, evaluation } = scores;
  const suggestions = useMemo(
    () =>
      workspace.revision.stationAnalysis
        ? suggestedComments(workspace.revision.stationAnalysis, workspace.revision.record.units, (l) => LEVEL_LABELS[l])
        : { spacing: [], registration: [] },
    [workspace.revision],
  );
  const acceptProblem = decision ? decisionProblem(decision, evaluation) : null;

  const onSubmit = async () => {
    if (!decision) return;
    const inputs = scores.scoreInputs();
    const local = validateScores(rubric.criteria, workspace.revision.record, inputs).fields;
    if (Object.keys(local).length) return showErrors(local);
    setFieldErrors({});
    try {
      setDecided(true);
      const result = await submit.mutateAsync({ decision, scores: inputs, note });
      const items =
        decision === 'rework'
          ? inputs.filter((s) =>
              isBelowFullMarks(
                rubric.criteria.find((c) => c.key === s.key)!,
                s.score,
              ),
            ).length
          : 0;
      onDecided(decisionOutcomeText(job.claimReference, decision, items, second !== null, result.emailQueued ?? true));
    } catch (error) {
      setDecided(false);
      if (error instanceof ApiError) showErrors(error.fields);
    }
  };

  // Errors are listed beside the decision button, and the first criterion in error comes into view.
  const showErrors = (fields: Record<string, string>) => {
    setFieldErrors(fields);
    const first = rubric.criteria.findIndex((c) =>
      Object.keys(fields).some((f) => f === `scores.${c.key}` || f.startsWith(`scores.${c.key}.`)),
    );
    if (first >= 0) onFocusCriterion(first);
  };
  const errorList = errorSummary(rubric.criteria, fieldErrors);

  return (
    <View style={{ gap: space.sm }}>
      <View style={stickySummary ? styles.sticky : undefined}>
        <ScoreSummary evaluation={evaluation} passMark={rubric.passMark} />
      </View>
      <Text variant="muted">{`Rubric version ${rubric.version}. Press ? for keys.`}</Text>
      <Text variant="small" role="status" aria-live="polite">
        {describeReviewDraft(draft.status)}
      </Text>
      {draft.status.kind === 'conflict' ? (
        <Notice tone="caution">
          Your scores for this record were also saved from another tab or machine. Keep the scores on this screen, or load the other ones.
        </Notice>
      ) : null}
      {draft.status.kind === 'conflict' ? (
        <View style={styles.row}>
          <Button label="Keep these scores" onPress={() => draft.resolve('mine', () => undefined)} />
          <Button
            label="Load the other scores"
            tone="secondary"
            onPress={() => draft.resolve('theirs', (d) => scores.replace(d.scores, d.decision, d.note))}
          />
        </View>
      ) : null}
      {rubric.criteria.map((criterion, index) => (
        <CriterionRow
          key={criterion.key}
          criterion={criterion}
          applies={applicable[criterion.key]}
          entry={entries[criterion.key]}
          suggestions={criterion.key === 'spacing' ? suggestions.spacing : criterion.key === 'registration' ? suggestions.registration : []}
          carriedFrom={
            criterion.key in carried && entries[criterion.key].score === carried[criterion.key].score ? workspace.previous!.revision : null
          }
          current={index === current}
          error={fieldErrors[`scores.${criterion.key}`] ?? fieldErrors[`scores.${criterion.key}.comment`]}
          onFocus={() => onFocusCriterion(index)}
          onChange={(entry) => scores.setEntry(criterion.key, entry)}
        />
      ))}
      <ChoiceField<Decision>
        label="Decision"
        options={DECISIONS.map((d) => ({ value: d, label: DECISION_LABELS[d] }))}
        value={decision}
        onChange={setDecision}
        error={fieldErrors.decision}
      />
      <TextField
        label="Note to the technician (optional)"
        hint="Sent with the decision, beside the comments on each criterion"
        value={note}
        onChangeText={setNote}
        multiline
        maxLength={2000}
        style={{ minHeight: 64, textAlignVertical: 'top' }}
      />
      {acceptProblem ? <Notice tone="caution">A failing review cannot be accepted. Request rework or a recapture.</Notice> : null}
      {submit.error instanceof ApiError && !Object.keys(submit.error.fields).length ? (
        <Notice tone="error">{submit.error.message}</Notice>
      ) : null}
      {errorList.length ? (
        <View role="alert" style={styles.errors}>
          <Text variant="label">{`${errorList.length} thing${errorList.length === 1 ? '' : 's'} to fix before the decision is recorded:`}</Text>
          {errorList.map((line) => (
            <Text key={line} variant="small">{`• ${line}`}</Text>
          ))}
        </View>
      ) : null}
      <Button
        label={second ? 'Save blind second review' : 'Record decision'}
        onPress={() => void onSubmit()}
        disabled={!decision || !evaluation.complete}
        busy={submit.isPending}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  // position: sticky exists on the web build only; a phone scrolls the summary away.
  sticky: { position: 'sticky' as 'relative', top: 0, zIndex: 1 },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  errors: { borderLeftWidth: 4, borderLeftColor: colors.fail, paddingLeft: space.sm, gap: 2 },
});

// Field errors in words, named by the criterion they belong to, in rubric order.
function errorSummary(criteria: Workspace['rubric']['criteria'], fields: Record<string, string>): string[] {
  const named = criteria.flatMap((c) =>
    Object.entries(fields)
      .filter(([f]) => f === `scores.${c.key}` || f.startsWith(`scores.${c.key}.`))
      .map(([, message]) => `${c.title}: ${message}`),
  );
  const other = Object.entries(fields)
    .filter(([f]) => !f.startsWith('scores.'))
    .map(([f, message]) => (f === 'decision' ? `Decision: ${message}` : f === 'note' ? `Note: ${message}` : message));
  return [...named, ...other];
}
