// Active reviewers, for moving claims.
import { useQuery } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { PersonRef } from '@/shared/api-types';

export const reviewerKeys = { root: ['reviewers'] as const };

export function useReviewersQuery(enabled: boolean) {
  return useQuery({
    queryKey: reviewerKeys.root,
    queryFn: async () => (await api.get<{ reviewers: PersonRef[] }>('/api/reviewers')).reviewers,
    enabled,
  });
}
