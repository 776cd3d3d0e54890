import { useMutation } from '@tanstack/react-query';
import { api } from './client';

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (request: { email: string }) => api<void>('/auth/password-reset', { method: 'POST', body: request }),
  });
}

export function useCompletePasswordReset() {
  return useMutation({
    mutationFn: (completion: { token: string; password: string }) =>
      api<void>('/auth/password-reset/complete', { method: 'POST', body: completion }),
  });
}
