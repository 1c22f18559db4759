import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ApiError } from '@/components/lib/api-client';
import { useReworkAnswerMutation, useReworkItemsQuery } from '@/components/queries/rework';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Checkbox } from '@/components/ui/checkbox';
import { ChoiceField } from '@/components/ui/choice-field';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { colors, space } from '@/components/ui/theme';
import type { StoredFile } from '@/shared/files';
import { JOB_STATUS_LABELS, type JobStatus } from '@/shared/jobs';
import { REWORK_RESPONSE_LABELS, REWORK_RESPONSES, type ReworkItemView, type ReworkResponse } from '@/shared/review';

// What the checklist says follows the job's real state: only an open request asks for answers.
function checklistText(status: JobStatus, open: number, total: number, editable: boolean): { title: string; text: string } {
  if (status !== 'rework_requested') {
    return { title: 'Last rework request', text: `${JOB_STATUS_LABELS[status]}. The answers below were given to the last rework request.` };
  }
  if (!editable) return { title: 'Rework requested', text: `${open} of ${total} item(s) still wait for the technician's answer.` };
  return {
    title: 'Rework requested',
    text: open
      ? `${open} of ${total} item(s) still need your answer before you can resubmit.`
      : 'Every item is answered. Correct the record below and submit the next revision.',
  };
}

// The reviewer's failing items, each answered by the technician before resubmitting.
export function ReworkChecklist({
  jobId,
  status,
  editable,
  files,
}: {
  jobId: number;
  status: JobStatus;
  editable: boolean;
  files: StoredFile[];
}) {
  const items = useReworkItemsQuery(jobId);
  if (!items.data?.length) return null;
  const open = items.data.filter((i) => !i.response).length;
  const words = checklistText(status, open, items.data.length, editable);
  return (
    <View style={styles.box} role="region" aria-label={words.title}>
      <Text variant="heading" role="heading" aria-level={2}>
        {words.title}
      </Text>
      <Text variant="muted">{words.text}</Text>
      {items.data.map((item, i) => (
        <ReworkItemCard key={item.id} jobId={jobId} item={item} index={i} editable={editable} files={files} />
      ))}
    </View>
  );
}

function ReworkItemCard({
  jobId,
  item,
  index,
  editable,
  files,
}: {
  jobId: number;
  item: ReworkItemView;
  index: number;
  editable: boolean;
  files: StoredFile[];
}) {
  const answer = useReworkAnswerMutation(jobId);
  const [response, setResponse] = useState<ReworkResponse | undefined>(item.response ?? undefined);
  const [note, setNote] = useState(item.responseNote ?? '');
  const [fileIds, setFileIds] = useState<number[]>(item.responseFileIds);
  const attached = files.filter((f) => item.responseFileIds.includes(f.id));
  const fieldError = answer.error instanceof ApiError ? (answer.error.fields.note ?? answer.error.message) : undefined;
  return (
    <View style={styles.item} role="group" aria-label={`Rework item ${index + 1}: ${item.title}`}>
      <View style={styles.head}>
        <Text variant="label">{`${index + 1}. ${item.title}`}</Text>
        <Badge
          label={item.response ? `Answered: ${REWORK_RESPONSE_LABELS[item.response]}` : 'Open'}
          tone={item.response ? 'pass' : 'rework'}
        />
      </View>
      {item.stockReason ? <Text variant="muted">{item.stockReason}</Text> : null}
      <Text>{item.instruction}</Text>
      {item.disputeOutcome ? (
        <Text variant="small">{`Manager: dispute ${item.disputeOutcome}${item.disputeNote ? ` (${item.disputeNote})` : ''}`}</Text>
      ) : null}
      {editable ? (
        <>
          <ChoiceField<ReworkResponse>
            label={`Your answer to item ${index + 1}`}
            options={REWORK_RESPONSES.map((r) => ({ value: r, label: REWORK_RESPONSE_LABELS[r] }))}
            value={response}
            onChange={setResponse}
          />
          <TextField label={`What you did, or why (item ${index + 1})`} value={note} onChangeText={setNote} multiline error={fieldError} />
          {files.length ? <Text variant="label">Files that show it (upload new ones under Files)</Text> : null}
          {files.map((f) => (
            <Checkbox
              key={f.id}
              label={`Attach ${f.name} to item ${index + 1}`}
              checked={fileIds.includes(f.id)}
              onChange={(on) => setFileIds(on ? [...fileIds, f.id] : fileIds.filter((id) => id !== f.id))}
            />
          ))}
          <Button
            label={`Save answer ${index + 1}`}
            tone="secondary"
            disabled={!response}
            busy={answer.isPending}
            onPress={() => response && answer.mutate({ itemId: item.id, response, note, fileIds })}
          />
        </>
      ) : item.responseNote ? (
        <Text variant="small">{`Technician: ${item.responseNote}`}</Text>
      ) : null}
      {!editable && attached.length ? <Text variant="small">{`Files: ${attached.map((f) => f.name).join(', ')}`}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.rework,
    borderLeftWidth: 6,
    borderRadius: 8,
    padding: space.lg,
    gap: space.md,
  },
  item: { borderWidth: 1, borderColor: colors.line, borderRadius: 6, padding: space.md, gap: space.sm },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
});
