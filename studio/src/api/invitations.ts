import { useMutation, useQuery } from '@tanstack/react-query';
import type { Role, SessionView } from '@mantlepiece/shared';
import { api, setSession } from './client';

export interface InvitationView {
  email: string;
  name: string;
  roles: Role[];
  locales: string[];
  expiresAt: string;
}

export function useInvitation(token: string) {
  return useQuery({
    queryKey: ['invitation', token],
    queryFn: () => api<InvitationView>(`/auth/invitations/${encodeURIComponent(token)}`),
    retry: false,
  });
}

export function useAcceptInvitation() {
  return useMutation({
    mutationFn: (acceptance: { token: string; name: string; password: string }) =>
      api<SessionView>('/auth/invitations/accept', { method: 'POST', body: acceptance }),
    onSuccess: (session) => setSession(session),
  });
}
