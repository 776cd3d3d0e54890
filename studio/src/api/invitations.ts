import { useMutation, useQuery } from '@tanstack/react-query';
import { answerOf, client, setSession, type Schema } from './client';

export type InvitationView = Schema<'InvitationPreview'>;

export function useInvitation(token: string) {
  return useQuery({
    queryKey: ['invitation', token],
    queryFn: () => answerOf(client.GET('/api/auth/invitations/{token}', { params: { path: { token } } })),
    retry: false,
  });
}

export function useAcceptInvitation() {
  return useMutation({
    mutationFn: (acceptance: { token: string; name: string; password: string }) =>
      answerOf(client.POST('/api/auth/invitations/accept', { body: acceptance })),
    onSuccess: (session) => setSession(session),
  });
}
