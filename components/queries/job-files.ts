// Files attached to a job: photos, sketches and the station file.
import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { FileKind, StoredFile } from '@/shared/files';

import { invalidateJob } from './jobs';

export function useFileUploadMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ kind, file, name, onProgress }: { kind: FileKind; file: Blob; name: string; onProgress: (f: number) => void }) => {
      const form = new FormData();
      form.append('kind', kind);
      form.append('file', file, name);
      return api.upload<{ file: StoredFile }>(`/api/jobs/${jobId}/files`, form, onProgress);
    },
    onSuccess: () => invalidateJob(queryClient, jobId),
  });
}

export function useFileDetachMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (fileId: number) => api.delete<void>(`/api/jobs/${jobId}/files/${fileId}`),
    onSuccess: () => invalidateJob(queryClient, jobId),
  });
}
