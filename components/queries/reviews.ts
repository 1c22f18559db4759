import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { QueuePage, ScoreInput, Workspace, Decision } from '@/shared/review';
import type { Rubric, RubricDefinition } from '@/shared/rubric';
import { api } from '@/components/lib/api-client';
import { jobKeys } from './jobs';

export const reviewKeys = {
  queueRoot: ['queue'] as const,
  queue: (search: string) => [...reviewKeys.queueRoot, search] as const,
  workspace: (jobId: number, second: number | null) => ['workspace', jobId, second] as const,
  secondReviews: ['second-reviews'] as const,
  rubrics: ['rubrics'] as const,
  reviewers: ['reviewers'] as const,
};

export function useQueueQuery(search: string) {
  return useQuery({
    queryKey: reviewKeys.queue(search),
    queryFn: () => api.get<QueuePage>(`/api/queue${search ? `?${search}` : ''}`),
    placeholderData: keepPreviousData,
    refetchInterval: 60_000,
  });
}

function useInvalidateQueue() {
  const queryClient = useQueryClient();
  return () => Promise.all([
    queryClient.invalidateQueries({ queryKey: reviewKeys.queueRoot }),
    queryClient.invalidateQueries({ queryKey: ['workspace'] }),
    queryClient.invalidateQueries({ queryKey: jobKeys.root }),
  ]);
}

export function useClaimMutation() {
  const invalidate = useInvalidateQueue();
  return useMutation({
    mutationFn: (jobId: number) => api.post<{ claimExpiresAt: string }>(`/api/jobs/${jobId}/claim`),
    onSettled: invalidate,
  });
}

export function useReleaseMutation() {
  const invalidate = useInvalidateQueue();
  return useMutation({ mutationFn: (jobId: number) => api.delete<void>(`/api/jobs/${jobId}/claim`), onSettled: invalidate });
}

export function useReassignMutation() {
  const invalidate = useInvalidateQueue();
  return useMutation({
    mutationFn: (input: { toReviewerId: number; fromReviewerId?: number; jobIds?: number[] }) => api.post<{ moved: number }>('/api/claims/reassign', input),
    onSettled: invalidate,
  });
}

export function useWorkspaceQuery(jobId: number, second: number | null) {
  return useQuery({
    queryKey: reviewKeys.workspace(jobId, second),
    queryFn: () => api.get<Workspace>(`/api/jobs/${jobId}/workspace${second ? `?second=${second}` : ''}`),
  });
}

export type ReviewResult = { reviewId: number; score: number | null; passed: boolean; decision?: Decision; failedRules?: string[] };

export function useReviewSubmitMutation(jobId: number, second: number | null) {
  const invalidate = useInvalidateQueue();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { decision: Decision; scores: ScoreInput[] }) =>
      api.post<ReviewResult>(second ? `/api/second-reviews/${second}/reviews` : `/api/jobs/${jobId}/reviews`, input),
    onSuccess: async () => {
      await invalidate();
      await queryClient.invalidateQueries({ queryKey: reviewKeys.secondReviews });
    },
  });
}

export function useSecondReviewsQuery(enabled: boolean) {
  return useQuery({
    queryKey: reviewKeys.secondReviews,
    queryFn: async () => (await api.get<{ secondReviews: { id: number; jobId: number; claimReference: string; revision: number; createdAt: string }[] }>('/api/second-reviews')).secondReviews,
    enabled,
  });
}

export function useRubricsQuery() {
  return useQuery({ queryKey: reviewKeys.rubrics, queryFn: async () => (await api.get<{ rubrics: Rubric[] }>('/api/rubrics')).rubrics });
}

export function useRubricCreateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (definition: RubricDefinition) => api.post<{ rubric: Rubric }>('/api/rubrics', definition),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reviewKeys.rubrics }),
  });
}

export function useReviewersQuery(enabled: boolean) {
  return useQuery({
    queryKey: reviewKeys.reviewers,
    queryFn: async () => (await api.get<{ reviewers: { id: number; name: string }[] }>('/api/reviewers')).reviewers,
    enabled,
  });
}

export function useSecondClaimMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (secondReviewId: number) => api.post<{ claimExpiresAt: string }>(`/api/second-reviews/${secondReviewId}/claim`),
    onSettled: () => Promise.all([
      queryClient.invalidateQueries({ queryKey: ['workspace'] }),
      queryClient.invalidateQueries({ queryKey: reviewKeys.secondReviews }),
    ]),
  });
}
