import { keepPreviousData, useQuery } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { Calibration, ReviewerRow, TeamRow, TechnicianTrends } from '@/shared/trends';

export type Period = { from: string; to: string; rubricVersion?: string };

export const periodSearch = (p: Period, extra: Record<string, string | number | undefined> = {}) =>
  Object.entries({ from: p.from, to: p.to, rubricVersion: p.rubricVersion || undefined, ...extra })
    .filter(([, v]) => v !== undefined && v !== '')
    .map(([k, v]) => `${k}=${encodeURIComponent(String(v))}`)
    .join('&');

export const trendKeys = { root: ['trends'] as const, of: (kind: string, search: string) => [...trendKeys.root, kind, search] as const };

function useTrend<T>(kind: string, path: string, search: string, enabled = true) {
  return useQuery({
    queryKey: trendKeys.of(kind, search),
    queryFn: () => api.get<T>(`${path}?${search}`),
    placeholderData: keepPreviousData,
    enabled,
  });
}

export const useTechnicianTrendsQuery = (search: string) => useTrend<TechnicianTrends>('technician', '/api/trends', search);
export const useTeamTrendsQuery = (search: string) => useTrend<{ rows: TeamRow[] }>('team', '/api/trends/team', search);
export const useReviewerTrendsQuery = (search: string) => useTrend<{ rows: ReviewerRow[] }>('reviewers', '/api/trends/reviewers', search);
export const useCalibrationQuery = (search: string) => useTrend<Calibration>('calibration', '/api/trends/calibration', search);
