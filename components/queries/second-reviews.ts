// Blind second reviews waiting for a reviewer.
import { type QueryClient, useQuery } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { OpenSecondReview } from '@/shared/api-types';

export const secondReviewKeys = { root: ['second-reviews'] as const };

export function invalidateSecondReviews(queryClient: QueryClient) {
  return queryClient.invalidateQueries({ queryKey: secondReviewKeys.root });
}

export function useSecondReviewsQuery(enabled: boolean) {
  return useQuery({
    queryKey: secondReviewKeys.root,
    queryFn: async () => (await api.get<{ secondReviews: OpenSecondReview[] }>('/api/second-reviews')).secondReviews,
    enabled,
  });
}
