import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CaptureRecord } from '@/shared/capture-record';
import type { FileKind, StoredFile } from '@/shared/files';
import type { JobInput, JobStatus, JobSummary, Priority } from '@/shared/jobs';
import type { CheckResult, Finding } from '@/shared/pre-submit-checks';
import { api } from '@/components/lib/api-client';

export const jobKeys = {
  root: ['jobs'] as const,
  list: (filters: { status?: JobStatus[]; technicianId?: number }) => [...jobKeys.root, 'list', filters] as const,
  detail: (id: number) => [...jobKeys.root, 'detail', id] as const,
  revision: (id: number, n: number) => [...jobKeys.root, 'detail', id, 'revision', n] as const,
  technicians: ['technicians'] as const,
};

export type JobDetail = {
  job: JobSummary;
  record: CaptureRecord;
  recordVersion: number;
  revisions: { number: number; submittedAt: string }[];
  files: StoredFile[];
};

export type Revision = { number: number; submittedAt: string; record: CaptureRecord; files: StoredFile[]; findings: CheckResult };

export function useJobsQuery(filters: { status?: JobStatus[]; technicianId?: number }) {
  const parts = [filters.status?.length ? `status=${filters.status.join(',')}` : '', filters.technicianId ? `technicianId=${filters.technicianId}` : ''].filter(Boolean);
  const search = parts.length ? `?${parts.join('&')}` : '';
  return useQuery({
    queryKey: jobKeys.list(filters),
    queryFn: async () => (await api.get<{ jobs: JobSummary[] }>(`/api/jobs${search}`)).jobs,
    placeholderData: keepPreviousData,
  });
}

export function useJobQuery(id: number) {
  return useQuery({
    queryKey: jobKeys.detail(id),
    queryFn: () => api.get<JobDetail>(`/api/jobs/${id}`),
    enabled: Number.isInteger(id) && id > 0,
  });
}

export function useRevisionQuery(id: number, number: number | null) {
  return useQuery({
    queryKey: jobKeys.revision(id, number ?? 0),
    queryFn: async () => (await api.get<{ revision: Revision }>(`/api/jobs/${id}/revisions/${number}`)).revision,
    enabled: number !== null && number > 0,
  });
}

export function useTechniciansQuery() {
  return useQuery({
    queryKey: jobKeys.technicians,
    queryFn: async () => (await api.get<{ technicians: { id: number; name: string }[] }>('/api/technicians')).technicians,
  });
}

export type NewJob = JobInput;

export function useJobCreateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: NewJob) => api.post<{ job: JobSummary }>('/api/jobs', input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobKeys.root }),
  });
}

export function useRecordSaveMutation(jobId: number) {
  return useMutation({
    mutationFn: (record: CaptureRecord) => api.put<{ version: number; savedAt: string }>(`/api/jobs/${jobId}/record`, record),
  });
}

export function useRecordSubmitMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (record: CaptureRecord) =>
      api.post<{ revision: number; status: JobStatus; submittedAt: string; warnings: Finding[] }>(`/api/jobs/${jobId}/submit`, record),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobKeys.root }),
  });
}

export function useFileUploadMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ kind, file, name, onProgress }: { kind: FileKind; file: Blob; name: string; onProgress: (f: number) => void }) => {
      const form = new FormData();
      form.append('kind', kind);
      form.append('file', file, name);
      return api.upload<{ file: StoredFile }>(`/api/jobs/${jobId}/files`, form, onProgress);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobKeys.detail(jobId) }),
  });
}

export function useFileDetachMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (fileId: number) => api.delete<void>(`/api/jobs/${jobId}/files/${fileId}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobKeys.detail(jobId) }),
  });
}

export function useStationAnalysisQuery(jobId: number, revision: number | null, enabled = true) {
  return useQuery({
    queryKey: [...jobKeys.detail(jobId), 'stations', revision ?? 'draft'],
    queryFn: () => api.get<{ analysis: import('@/shared/station-analysis').StationAnalysis | null; units: 'ft' | 'm' }>(
      `/api/jobs/${jobId}/station-analysis${revision ? `?revision=${revision}` : ''}`,
    ),
    enabled,
  });
}

export function useJobUpdateMutation(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: { technicianId?: number; priority?: Priority; dueAt?: string }) => api.patch<{ job: JobSummary }>(`/api/jobs/${jobId}`, changes),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jobKeys.root }),
  });
}
