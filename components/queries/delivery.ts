// A job's delivery to the adjuster (managers): summary builds and share links.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { DeliveryState, SharedSummary } from '@/shared/api-types';

import { invalidateJob, jobKeys } from './jobs';

export const deliveryKeys = {
  of: (jobId: number) => [...jobKeys.detail(jobId), 'delivery'] as const,
  shared: (token: string) => ['shared', token] as const,
};

export function useDeliveryQuery(jobId: number) {
  return useQuery({
    queryKey: deliveryKeys.of(jobId),
    queryFn: () => api.get<DeliveryState>(`/api/jobs/${jobId}/delivery`),
    // A build queued a moment ago finishes within seconds: look again until it has.
    refetchInterval: (query) => (query.state.data?.deliveries.some((d) => d.status === 'pending') ? 3_000 : false),
  });
}

export function useRebuildSummaryMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<DeliveryState>(`/api/jobs/${jobId}/summary`),
    onSuccess: () => invalidateJob(queryClient, jobId),
  });
}

export function useIssueLinkMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<{ url: string; expiresAt: string }>(`/api/jobs/${jobId}/share-links`),
    onSuccess: () => invalidateJob(queryClient, jobId),
  });
}

export function useRevokeLinkMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (linkId: number) => api.delete<void>(`/api/jobs/${jobId}/share-links/${linkId}`),
    onSuccess: () => invalidateJob(queryClient, jobId),
  });
}

// The adjuster's page: no session needed.
export function useSharedSummaryQuery(token: string) {
  return useQuery({ queryKey: deliveryKeys.shared(token), queryFn: () => api.get<SharedSummary>(`/api/share/${token}`), retry: false });
}
