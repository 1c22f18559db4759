// A job's capture record: the autosaved draft and its submission as a new revision.
import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { CaptureRecord } from '@/shared/capture-record';
import type { JobStatus } from '@/shared/jobs';
import type { Finding } from '@/shared/pre-submit-checks';

import { invalidateJobs } from './jobs';

export function useRecordSaveMutation(jobId: number) {
  return useMutation({
    mutationFn: (record: CaptureRecord) => api.put<{ version: number; savedAt: string }>(`/api/jobs/${jobId}/record`, record),
  });
}

export function useRecordSubmitMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (record: CaptureRecord) =>
      api.post<{ revision: number; status: JobStatus; submittedAt: string; warnings: Finding[] }>(`/api/jobs/${jobId}/submit`, record),
    onSuccess: () => invalidateJobs(queryClient),
  });
}
