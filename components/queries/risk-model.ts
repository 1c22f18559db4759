// The rework-risk model in use (kept on the device, so the hint works offline) and a
// manager's refit.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { withDeviceCopy } from '@/components/device/device-copy';
import { api, ApiError } from '@/components/lib/api-client';
import type { RiskModelView } from '@/shared/risk-hint';

const riskKeys = { model: ['risk-model'] as const };

export function useRiskModelQuery() {
  return useQuery({
    queryKey: riskKeys.model,
    queryFn: async () => {
      try {
        return await withDeviceCopy(
          '/api/risk-model',
          async () => (await api.get<{ model: RiskModelView | null }>('/api/risk-model')).model,
        );
      } catch (error) {
        // Offline with no copy: no model, so the hint says there is not enough history.
        if (error instanceof ApiError && error.status === 0) return null;
        throw error;
      }
    },
  });
}

export function useRiskFitMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<{ model: RiskModelView }>('/api/risk-model/fit'),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: riskKeys.model }),
  });
}
