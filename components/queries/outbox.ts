// E-mail that failed every attempt, for managers and admins.
import { type QueryClient, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { FailedEmail } from '@/shared/api-types';

export const outboxKeys = { failed: ['outbox', 'failed'] as const };

export function invalidateFailedEmails(queryClient: QueryClient) {
  return queryClient.invalidateQueries({ queryKey: outboxKeys.failed });
}

export function useFailedEmailsQuery(enabled: boolean) {
  return useQuery({
    queryKey: outboxKeys.failed,
    queryFn: async () => (await api.get<{ messages: FailedEmail[] }>('/api/outbox/failed')).messages,
    enabled,
    refetchInterval: 60_000,
  });
}

export function useFailedEmailRetryMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.post<{ retried: boolean }>(`/api/outbox/${id}/retry`),
    onSuccess: () => invalidateFailedEmails(queryClient),
  });
}
