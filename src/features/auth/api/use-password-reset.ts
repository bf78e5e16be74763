import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (input: { email: string }) => api.post<void>('/auth/password-reset', input),
    meta: { form: true },
  });
}

export function useConfirmPasswordReset() {
  return useMutation({
    mutationFn: (input: { token: string; newPassword: string }) => api.post<void>('/auth/password-reset/confirm', input),
    meta: { form: true },
  });
}
