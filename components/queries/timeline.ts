// A job's timeline (append-only events).
import { useQuery } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { TimelineEvent } from '@/shared/review';

import { jobKeys } from './jobs';

export const timelineKeys = { of: (jobId: number) => [...jobKeys.detail(jobId), 'timeline'] as const };

export function useTimelineQuery(jobId: number) {
  return useQuery({
    queryKey: timelineKeys.of(jobId),
    queryFn: async () => (await api.get<{ events: TimelineEvent[] }>(`/api/jobs/${jobId}/timeline`)).events,
  });
}
