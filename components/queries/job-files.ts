// Files attached to a job: removing one. Uploads go through the device queue (use-upload-queue).
import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { StoredFile } from '@/shared/files';

import { invalidateJob } from './jobs';

export function useFileDetachMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (fileId: number) => api.delete<void>(`/api/jobs/${jobId}/files/${fileId}`),
    onSuccess: () => invalidateJob(queryClient, jobId),
  });
}

export function useFileCaptionMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { fileId: number; caption: string }) =>
      api.patch<{ file: StoredFile }>(`/api/jobs/${jobId}/files/${input.fileId}`, { caption: input.caption }),
    onSuccess: () => invalidateJob(queryClient, jobId),
  });
}
