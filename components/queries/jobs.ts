// Jobs: the list, one job's detail (its record draft, revisions, files) and its changes.
import { keepPreviousData, type QueryClient, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { withDeviceCopy } from '@/components/device/device-copy';
import { api } from '@/components/lib/api-client';
import type { JobDetail, RevisionView } from '@/shared/api-types';
import type { ClaimContacts } from '@/shared/contacts';
import type { JobInput, JobListQuery, JobPage, JobSummary, Priority } from '@/shared/jobs';
import type { StationAnalysis } from '@/shared/station-analysis';

export type JobFilters = JobListQuery;

export const jobKeys = {
  root: ['jobs'] as const,
  list: (filters: JobFilters) => [...jobKeys.root, 'list', filters] as const,
  detail: (id: number) => [...jobKeys.root, 'detail', id] as const,
  revision: (id: number, n: number) => [...jobKeys.detail(id), 'revision', n] as const,
  stations: (id: number, revision: number | null) => [...jobKeys.detail(id), 'stations', revision ?? 'draft'] as const,
};

// Everything under a job (its revisions, rework items, timeline) hangs below its detail key.
export function invalidateJob(queryClient: QueryClient, id: number) {
  return queryClient.invalidateQueries({ queryKey: jobKeys.detail(id) });
}

export function invalidateJobs(queryClient: QueryClient) {
  return queryClient.invalidateQueries({ queryKey: jobKeys.root });
}

// The list's query string, in a stable order (a stable cache key and device copy).
export function jobListSearch(filters: JobFilters): string {
  const parts = [
    filters.status?.length ? `status=${filters.status.join(',')}` : '',
    filters.technicianId ? `technicianId=${filters.technicianId}` : '',
    filters.q ? `q=${encodeURIComponent(filters.q)}` : '',
    filters.sort ? `sort=${filters.sort}` : '',
    filters.dir ? `dir=${filters.dir}` : '',
    filters.page && filters.page > 1 ? `page=${filters.page}` : '',
    filters.pageSize ? `pageSize=${filters.pageSize}` : '',
  ].filter(Boolean);
  return parts.length ? `?${parts.join('&')}` : '';
}

export function useJobsQuery(filters: JobFilters) {
  const search = jobListSearch(filters);
  return useQuery({
    queryKey: jobKeys.list(filters),
    queryFn: () => withDeviceCopy(`/api/jobs${search}`, () => api.get<JobPage>(`/api/jobs${search}`)),
    placeholderData: keepPreviousData,
  });
}

export function useJobQuery(id: number) {
  return useQuery({
    queryKey: jobKeys.detail(id),
    queryFn: () => withDeviceCopy(`/api/jobs/${id}`, () => api.get<JobDetail>(`/api/jobs/${id}`)),
    enabled: Number.isInteger(id) && id > 0,
  });
}

export function useRevisionQuery(id: number, number: number | null) {
  return useQuery({
    queryKey: jobKeys.revision(id, number ?? 0),
    queryFn: async () => {
      const path = `/api/jobs/${id}/revisions/${number}`;
      return (await withDeviceCopy(path, () => api.get<{ revision: RevisionView }>(path))).revision;
    },
    enabled: number !== null && number > 0,
  });
}

export function useStationAnalysisQuery(jobId: number, revision: number | null, enabled = true) {
  return useQuery({
    queryKey: jobKeys.stations(jobId, revision),
    queryFn: () =>
      api.get<{ analysis: StationAnalysis | null; units: 'ft' | 'm' }>(
        `/api/jobs/${jobId}/station-analysis${revision ? `?revision=${revision}` : ''}`,
      ),
    enabled,
  });
}

export type NewJob = JobInput;

export function useJobCreateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: NewJob) => api.post<{ job: JobSummary }>('/api/jobs', input),
    onSuccess: () => invalidateJobs(queryClient),
  });
}

export function useJobUpdateMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: { technicianId?: number; priority?: Priority; dueAt?: string } & Partial<Record<keyof ClaimContacts, string>>) =>
      api.patch<{ job: JobSummary }>(`/api/jobs/${jobId}`, changes),
    onSuccess: () => invalidateJobs(queryClient),
  });
}

// Several jobs to one technician, all or none.
export function useReassignJobsMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { jobIds: number[]; technicianId: number }) => api.post<{ moved: number }>('/api/jobs/reassign', input),
    onSettled: () => invalidateJobs(queryClient),
  });
}

// The ids of every job in a filter, for "select all in this filter": at most two pages of
// 100, the most one bulk move takes.
export const BULK_MOVE_MAX = 200;
export async function jobIdsInFilter(filters: JobFilters): Promise<number[]> {
  const ids: number[] = [];
  for (let page = 1; page <= BULK_MOVE_MAX / 100; page++) {
    const result = await api.get<JobPage>(`/api/jobs${jobListSearch({ ...filters, page, pageSize: 100 })}`);
    ids.push(...result.jobs.map((j) => j.id));
    if (result.jobs.length < 100) break;
  }
  return ids;
}
