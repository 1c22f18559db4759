// A reviewer's workspace for one record (or one blind second review), and the decision on it.
import { type QueryClient, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { ReviewResult } from '@/shared/api-types';
import type { Decision, ReviewDraft, ReviewDraftData, ScoreInput, Workspace } from '@/shared/review';

import { invalidateJobs } from './jobs';
import { invalidateQueue } from './queue';
import { invalidateSecondReviews } from './second-reviews';

export const workspaceKeys = {
  root: ['workspace'] as const,
  one: (jobId: number, second: number | null) => [...workspaceKeys.root, jobId, second] as const,
};

export function invalidateWorkspaces(queryClient: QueryClient) {
  return queryClient.invalidateQueries({ queryKey: workspaceKeys.root });
}

// A claim or a decision changes the queue, the open workspaces and the job pages alike.
export function invalidateReviewWork(queryClient: QueryClient) {
  return Promise.all([invalidateQueue(queryClient), invalidateWorkspaces(queryClient), invalidateJobs(queryClient)]);
}

export function useWorkspaceQuery(jobId: number, second: number | null) {
  return useQuery({
    queryKey: workspaceKeys.one(jobId, second),
    queryFn: () => api.get<Workspace>(`/api/jobs/${jobId}/workspace${second ? `?second=${second}` : ''}`),
  });
}

export function useReviewSubmitMutation(jobId: number, second: number | null) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { decision: Decision; scores: ScoreInput[]; note: string }) =>
      api.post<ReviewResult>(second ? `/api/second-reviews/${second}/reviews` : `/api/jobs/${jobId}/reviews`, input),
    onSuccess: () => Promise.all([invalidateReviewWork(queryClient), invalidateSecondReviews(queryClient)]),
  });
}

// The reviewer's unsaved scores for their claim; the version it is based on goes as If-Match.
export function saveReviewDraft(jobId: number, second: number | null, data: ReviewDraftData, baseVersion: number) {
  return api.put<{ draft: ReviewDraft }>(`/api/jobs/${jobId}/review-draft${second ? `?second=${second}` : ''}`, data, { baseVersion });
}
