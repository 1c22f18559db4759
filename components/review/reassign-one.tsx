import { useState } from 'react';

import { useReassignMutation } from '@/components/queries/claims';
import { useReviewersQuery } from '@/components/queries/reviewers';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Select } from '@/components/ui/select';

// A manager hands one job's claim to a reviewer (or gives an unclaimed job to one).
export function ReassignOne({ jobId, currentId }: { jobId: number; currentId: number | null }) {
  const reviewers = useReviewersQuery(true);
  const reassign = useReassignMutation();
  const [to, setTo] = useState('');
  return (
    <>
      <Select
        label="Give this job to"
        value={to}
        allLabel="Choose a reviewer…"
        options={(reviewers.data ?? []).filter((r) => r.id !== currentId).map((r) => ({ value: String(r.id), label: r.name }))}
        onChange={setTo}
      />
      <Button
        label="Move the claim"
        tone="secondary"
        disabled={!to}
        busy={reassign.isPending}
        onPress={() => reassign.mutate({ toReviewerId: Number(to), jobIds: [jobId] })}
      />
      {reassign.data ? (
        <Notice tone="info">{reassign.data.moved ? 'Claim moved.' : 'Nothing moved: the job is not waiting for review.'}</Notice>
      ) : null}
      {reassign.error ? <Notice tone="error">{reassign.error.message}</Notice> : null}
    </>
  );
}
