// A job's capture record: the autosaved draft and its submission as a new revision. Both name
// the draft version they are based on; a stale one is refused (409) with the current draft.
import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { CaptureRecord } from '@/shared/capture-record';
import type { JobStatus } from '@/shared/jobs';
import type { Finding } from '@/shared/pre-submit-checks';

import { invalidateJobs } from './jobs';

export type SubmitResult = { revision: number; status: JobStatus; submittedAt: string; warnings: Finding[]; recordVersion: number };

export function saveRecordDraft(jobId: number, record: CaptureRecord, baseVersion: number) {
  return api.put<{ version: number; savedAt: string }>(`/api/jobs/${jobId}/record`, record, { baseVersion });
}

export function useRecordSubmitMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // Sent even when the browser thinks it is offline, so the answer (or failure) is real.
    networkMode: 'always',
    mutationFn: ({ record, baseVersion }: { record: CaptureRecord; baseVersion: number }) =>
      api.post<SubmitResult>(`/api/jobs/${jobId}/submit`, record, { baseVersion }),
    onSuccess: () => invalidateJobs(queryClient),
  });
}
