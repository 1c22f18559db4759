// Rubric versions: every save adds one.
import { type QueryClient, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { Rubric, RubricDefinition } from '@/shared/rubric';

export const rubricKeys = { root: ['rubrics'] as const };

export function invalidateRubrics(queryClient: QueryClient) {
  return queryClient.invalidateQueries({ queryKey: rubricKeys.root });
}

export function useRubricsQuery() {
  return useQuery({ queryKey: rubricKeys.root, queryFn: async () => (await api.get<{ rubrics: Rubric[] }>('/api/rubrics')).rubrics });
}

export function useRubricCreateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (definition: RubricDefinition) => api.post<{ rubric: Rubric }>('/api/rubrics', definition),
    onSuccess: () => invalidateRubrics(queryClient),
  });
}
