// Claims on records waiting for review: take, release, move (managers), and blind-review claims.
import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';

import { invalidateSecondReviews } from './second-reviews';
import { invalidateReviewWork, invalidateWorkspaces } from './workspace';

export function useClaimMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (jobId: number) => api.post<{ claimExpiresAt: string }>(`/api/jobs/${jobId}/claim`),
    onSettled: () => invalidateReviewWork(queryClient),
  });
}

export function useReleaseMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (jobId: number) => api.delete<void>(`/api/jobs/${jobId}/claim`),
    onSettled: () => invalidateReviewWork(queryClient),
  });
}

export function useReassignMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { toReviewerId: number; fromReviewerId?: number; jobIds?: number[] }) =>
      api.post<{ moved: number }>('/api/claims/reassign', input),
    onSettled: () => invalidateReviewWork(queryClient),
  });
}

export function useSecondClaimMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (secondReviewId: number) => api.post<{ claimExpiresAt: string }>(`/api/second-reviews/${secondReviewId}/claim`),
    onSettled: () => Promise.all([invalidateWorkspaces(queryClient), invalidateSecondReviews(queryClient)]),
  });
}

// Claims the next free record in the queue filter the reviewer came from (its query string).
export function useClaimNextMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (queueFilter: string) =>
      api.post<{ found: boolean; jobId: number | null }>(`/api/queue/claim-next${queueFilter ? `?${queueFilter}` : ''}`),
    onSettled: () => invalidateReviewWork(queryClient),
  });
}
