// Active technicians, for assigning jobs.
import { useQuery } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { PersonRef } from '@/shared/api-types';

export const technicianKeys = { root: ['technicians'] as const };

export function useTechniciansQuery() {
  return useQuery({
    queryKey: technicianKeys.root,
    queryFn: async () => (await api.get<{ technicians: PersonRef[] }>('/api/technicians')).technicians,
  });
}
