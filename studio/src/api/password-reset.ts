import { useMutation } from '@tanstack/react-query';
import { answerOf, client } from './client';

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (request: { email: string }) => answerOf(client.POST('/api/auth/password-reset', { body: request })),
  });
}

export function useCompletePasswordReset() {
  return useMutation({
    mutationFn: (completion: { token: string; password: string }) =>
      answerOf(client.POST('/api/auth/password-reset/complete', { body: completion })),
  });
}
