// What the local fake SMTP server received.
import { useQuery } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { MailboxMessage } from '@/shared/api-types';

export const mailboxKeys = { root: ['mailbox'] as const };

export function useMailboxQuery() {
  return useQuery({
    queryKey: mailboxKeys.root,
    queryFn: async () => (await api.get<{ messages: MailboxMessage[] }>('/api/mailbox')).messages,
    refetchInterval: 5000,
  });
}
