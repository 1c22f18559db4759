// Rework items of a job, the technician's answers, and disputes for managers.
import { type QueryClient, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { withDeviceCopy } from '@/components/device/device-copy';
import { api } from '@/components/lib/api-client';
import type { Dispute } from '@/shared/api-types';
import type { ReworkItemView, ReworkResponse } from '@/shared/review';

import { invalidateJob, jobKeys } from './jobs';

export const reworkKeys = {
  items: (jobId: number) => [...jobKeys.detail(jobId), 'rework-items'] as const,
  disputes: ['disputes'] as const,
};

export function invalidateDisputes(queryClient: QueryClient) {
  return queryClient.invalidateQueries({ queryKey: reworkKeys.disputes });
}

export function useReworkItemsQuery(jobId: number) {
  const path = `/api/jobs/${jobId}/rework-items`;
  return useQuery({
    queryKey: reworkKeys.items(jobId),
    queryFn: async () => (await withDeviceCopy(path, () => api.get<{ items: ReworkItemView[] }>(path))).items,
  });
}

export function useReworkAnswerMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ itemId, response, note, fileIds }: { itemId: number; response: ReworkResponse; note: string; fileIds: number[] }) =>
      api.put<{ item: ReworkItemView }>(`/api/rework-items/${itemId}/response`, { response, note, fileIds }),
    onSuccess: () => invalidateJob(queryClient, jobId),
  });
}

export function useDisputesQuery(enabled: boolean) {
  return useQuery({
    queryKey: reworkKeys.disputes,
    queryFn: async () => (await api.get<{ disputes: Dispute[] }>('/api/disputes')).disputes,
    enabled,
  });
}

export function useDisputeDecisionMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ itemId, outcome, note }: { itemId: number; outcome: 'upheld' | 'withdrawn'; note: string }) =>
      api.put(`/api/rework-items/${itemId}/dispute-outcome`, { outcome, note }),
    onSuccess: () => invalidateDisputes(queryClient),
  });
}
