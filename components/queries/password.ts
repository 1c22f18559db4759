// Passwords: asking for a reset link, setting a password from a link, changing one's own.
import { useMutation } from '@tanstack/react-query';

import { api } from '@/components/lib/api-client';

export function usePasswordForgotMutation() {
  return useMutation({ mutationFn: (email: string) => api.post<{ message: string }>('/api/password/forgot', { email }) });
}

export function usePasswordResetMutation() {
  return useMutation({
    mutationFn: (input: { token: string; password: string }) => api.post<{ email: string }>('/api/password/reset', input),
  });
}

export function usePasswordChangeMutation() {
  return useMutation({
    mutationFn: (input: { currentPassword: string; newPassword: string }) => api.put<void>('/api/me/password', input),
  });
}
