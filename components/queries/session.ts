// Who is signed in. The user is also kept on this device, so the signed-in pages open
// without a connection; sign-out clears everything the device kept.
import { type QueryClient, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { setDeviceUser } from '@/components/device/device-copy';
import { clearDevice, deviceKey, readDevice, writeDevice } from '@/components/device/device-store';
import { api, ApiError } from '@/components/lib/api-client';
import type { SessionUser } from '@/shared/api-types';

export const sessionKeys = { root: ['session'] as const };

async function remember(user: SessionUser | null) {
  setDeviceUser(user?.id ?? null);
  if (user) await writeDevice(deviceKey.user, user);
}

// Resolves to null when nobody is signed in, so layouts can redirect without an error state.
export function useSessionQuery() {
  return useQuery({
    queryKey: sessionKeys.root,
    queryFn: async (): Promise<SessionUser | null> => {
      try {
        const { user } = await api.get<{ user: SessionUser }>('/api/me');
        await remember(user);
        return user;
      } catch (error) {
        if (error instanceof ApiError && error.status === 401) {
          setDeviceUser(null);
          return null;
        }
        // No connection: the user this device last saw signed in, if any.
        if (error instanceof ApiError && error.status === 0) {
          const kept = (await readDevice<SessionUser>(deviceKey.user)) ?? null;
          setDeviceUser(kept?.id ?? null);
          if (kept) return kept;
        }
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
    onSuccess: async ({ user }) => {
      forgetOtherQueries(queryClient);
      await clearDevice();
      await remember(user);
      queryClient.setQueryData(sessionKeys.root, user);
    },
  });
}

export function useSignOutMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete<void>('/api/session'),
    onSettled: async () => {
      forgetOtherQueries(queryClient);
      await clearDevice();
      setDeviceUser(null);
      queryClient.setQueryData(sessionKeys.root, null);
    },
  });
}

// Another person's cached data must not survive a change of user. The session query itself
// stays in the cache (cleared, its observers would miss the new value).
function forgetOtherQueries(queryClient: QueryClient) {
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionKeys.root[0] });
}
