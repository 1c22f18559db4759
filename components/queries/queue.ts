// The review queue, one page per search string (filters, sort and page live in the URL).
import { keepPreviousData, type QueryClient, useQuery } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { QueuePage } from '@/shared/review';

export const queueKeys = {
  root: ['queue'] as const,
  page: (search: string) => [...queueKeys.root, search] as const,
};

export function invalidateQueue(queryClient: QueryClient) {
  return queryClient.invalidateQueries({ queryKey: queueKeys.root });
}

export function useQueueQuery(search: string) {
  return useQuery({
    queryKey: queueKeys.page(search),
    queryFn: () => api.get<QueuePage>(`/api/queue${search ? `?${search}` : ''}`),
    placeholderData: keepPreviousData,
    refetchInterval: 60_000,
  });
}
