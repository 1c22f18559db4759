// The signed-in person's notifications and their e-mail choices. The list is polled, so a
// notice raised on any instance shows up within half a minute.
import { type QueryClient, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';
import type { NotificationKind, NotificationList, NotificationPref } from '@/shared/notifications';

export const notificationKeys = { list: ['notifications'] as const, prefs: ['notifications', 'prefs'] as const };

const invalidateList = (queryClient: QueryClient) => queryClient.invalidateQueries({ queryKey: notificationKeys.list, exact: true });

export function useNotificationsQuery() {
  return useQuery({
    queryKey: notificationKeys.list,
    queryFn: () => api.get<NotificationList>('/api/notifications'),
    refetchInterval: 30_000,
  });
}

export function useMarkReadMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.post<void>(`/api/notifications/${id}/read`),
    onSettled: () => invalidateList(queryClient),
  });
}

export function useMarkAllReadMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<void>('/api/notifications/read-all'),
    onSettled: () => invalidateList(queryClient),
  });
}

export function useNotificationPrefsQuery() {
  return useQuery({
    queryKey: notificationKeys.prefs,
    queryFn: async () => (await api.get<{ prefs: NotificationPref[] }>('/api/notifications/prefs')).prefs,
  });
}

export function useSetNotificationPrefMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: { kind: NotificationKind; email: boolean }) =>
      (await api.put<{ prefs: NotificationPref[] }>(`/api/notifications/prefs/${input.kind}`, { email: input.email })).prefs,
    onSuccess: (prefs) => queryClient.setQueryData(notificationKeys.prefs, prefs),
  });
}
