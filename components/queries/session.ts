import { type QueryClient, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api, ApiError } from '@/components/lib/api-client';
import type { SessionUser } from '@/shared/api-types';

export const sessionKeys = { root: ['session'] as const };

// Resolves to null when nobody is signed in, so layouts can redirect without an error state.
export function useSessionQuery() {
  return useQuery({
    queryKey: sessionKeys.root,
    queryFn: async (): Promise<SessionUser | null> => {
      try {
        return (await api.get<{ user: SessionUser }>('/api/me')).user;
      } catch (error) {
        if (error instanceof ApiError && error.status === 401) return null;
        throw error;
      }
    },
    staleTime: 60_000,
  });
}

export function useSignInMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { email: string; password: string }) => api.post<{ user: SessionUser }>('/api/session', input),
    onSuccess: ({ user }) => {
      forgetOtherQueries(queryClient);
      queryClient.setQueryData(sessionKeys.root, user);
    },
  });
}

export function useSignOutMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete<void>('/api/session'),
    onSettled: () => {
      forgetOtherQueries(queryClient);
      queryClient.setQueryData(sessionKeys.root, null);
    },
  });
}

// Another person's cached data must not survive a change of user. The session query itself
// stays in the cache (cleared, its observers would miss the new value).
function forgetOtherQueries(queryClient: QueryClient) {
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionKeys.root[0] });
}
