import { type QueryClient, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { UserRow } from '@/shared/api-types';
import type { Role } from '@/shared/roles';

export const userKeys = { root: ['users'] as const, list: () => [...userKeys.root, 'list'] as const };

export function invalidateUsers(queryClient: QueryClient) {
  return queryClient.invalidateQueries({ queryKey: userKeys.root });
}

export function useUsersQuery() {
  return useQuery({
    queryKey: userKeys.list(),
    queryFn: async () => (await api.get<{ users: UserRow[] }>('/api/users')).users,
  });
}

export type NewUser = { name: string; email: string; role: Role };

export function useUserCreateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: NewUser) => api.post<{ user: UserRow }>('/api/users', input),
    onSuccess: () => invalidateUsers(queryClient),
  });
}

export function useUserUpdateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...changes }: { id: number; role?: Role; active?: boolean }) =>
      api.patch<{ user: UserRow }>(`/api/users/${id}`, changes),
    onSuccess: () => invalidateUsers(queryClient),
  });
}
