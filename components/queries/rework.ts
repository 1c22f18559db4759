import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ReworkItemView, ReworkResponse, TimelineEvent } from '@/shared/review';
import { api } from '@/components/lib/api-client';
import { jobKeys } from './jobs';

export const reworkKeys = {
  items: (jobId: number) => [...jobKeys.detail(jobId), 'rework-items'] as const,
  timeline: (jobId: number) => [...jobKeys.detail(jobId), 'timeline'] as const,
  disputes: ['disputes'] as const,
  mailbox: ['mailbox'] as const,
};

export function useReworkItemsQuery(jobId: number) {
  return useQuery({ queryKey: reworkKeys.items(jobId), queryFn: async () => (await api.get<{ items: ReworkItemView[] }>(`/api/jobs/${jobId}/rework-items`)).items });
}

export function useReworkAnswerMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ itemId, response, note, fileIds }: { itemId: number; response: ReworkResponse; note: string; fileIds: number[] }) =>
      api.put<{ item: ReworkItemView }>(`/api/rework-items/${itemId}/response`, { response, note, fileIds }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobKeys.detail(jobId) }),
  });
}

export function useTimelineQuery(jobId: number) {
  return useQuery({ queryKey: reworkKeys.timeline(jobId), queryFn: async () => (await api.get<{ events: TimelineEvent[] }>(`/api/jobs/${jobId}/timeline`)).events });
}

export type Dispute = ReworkItemView & { jobId: number; claimReference: string; technician: string };

export function useDisputesQuery(enabled: boolean) {
  return useQuery({ queryKey: reworkKeys.disputes, queryFn: async () => (await api.get<{ disputes: Dispute[] }>('/api/disputes')).disputes, enabled });
}

export function useDisputeDecisionMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ itemId, outcome, note }: { itemId: number; outcome: 'upheld' | 'withdrawn'; note: string }) =>
      api.put(`/api/rework-items/${itemId}/dispute-outcome`, { outcome, note }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reworkKeys.disputes }),
  });
}

export type MailboxMessage = { id: string; receivedAt: string; from: string; to: string[]; subject: string; text: string; html: string };

export function useMailboxQuery() {
  return useQuery({
    queryKey: reworkKeys.mailbox,
    queryFn: async () => (await api.get<{ messages: MailboxMessage[] }>('/api/mailbox')).messages,
    refetchInterval: 5000,
  });
}
