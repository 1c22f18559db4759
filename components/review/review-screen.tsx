import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';

import { DueText } from '@/components/jobs/due-text';
import { StatusBadge } from '@/components/jobs/status-badge';
import { useWorkspaceQuery } from '@/components/queries/workspace';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';

import { DecisionDone } from './decision-done';
import { ScoringScreen } from './scoring-screen';

export function ReviewScreen({ jobId, second }: { jobId: number; second: number | null }) {
  const workspace = useWorkspaceQuery(jobId, second);
  // Held here, outside the keyed scoring screen, which the decision itself resets.
  const [decided, setDecided] = useState<{ jobId: number; message: string } | null>(null);
  const { from } = useLocalSearchParams<{ from?: string }>();
  if (decided && decided.jobId === jobId)
    return (
      <Screen title="Review">
        <DecisionDone message={decided.message} queueFilter={typeof from === 'string' ? from : ''} />
      </Screen>
    );
  if (workspace.error)
    return (
      <Screen title="Review">
        <Notice tone="error">{workspace.error.message}</Notice>
      </Screen>
    );
  if (!workspace.data)
    return (
      <Screen title="Review">
        <Text variant="muted">Loading…</Text>
      </Screen>
    );
  const { job } = workspace.data;
  return (
    <Screen
      title={`Review ${job.claimReference}`}
      subtitle={`${job.street}, ${job.city} · ${job.technician.name} · revision ${job.revision}`}
      actions={
        <>
          <StatusBadge status={job.status} />
          <DueText job={{ dueAt: job.dueAt, status: job.status }} />
        </>
      }
    >
      <ScoringScreen
        key={`${job.id}-${job.revision}-${second}-${job.claimedBy?.id ?? 0}-${workspace.data.secondClaimedByMe}`}
        workspace={workspace.data}
        onDecided={(message) => setDecided({ jobId, message })}
      />
    </Screen>
  );
}
