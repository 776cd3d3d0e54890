import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Page, Role, UserView } from '@mantlepiece/shared';
import { api } from './client';

export const USER_SORTS = ['name', '-name', 'email', '-email', 'createdAt', '-createdAt', 'lastSignInAt', '-lastSignInAt'] as const;
export type UserSort = (typeof USER_SORTS)[number];

export interface UserListParams {
  page: number;
  pageSize: number;
  q?: string;
  role?: Role;
  active?: boolean;
  sort?: UserSort;
}

const usersKey = ['users'] as const;

export function useUsers(params: UserListParams) {
  return useQuery({
    queryKey: [...usersKey, params],
    queryFn: () => api<Page<UserView>>('/users', { query: { ...params } }),
    // The table keeps showing the previous page while the next one loads, so it does not jump.
    placeholderData: keepPreviousData,
  });
}

export interface InvitationRequest {
  email: string;
  name: string;
  roles: Role[];
  locales: string[];
}

export interface SentInvitation extends InvitationRequest {
  id: number;
  expiresAt: string;
}

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitation: InvitationRequest) => api<SentInvitation>('/users/invitations', { method: 'POST', body: invitation }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersKey }),
  });
}

export interface UserChanges {
  name?: string;
  roles?: Role[];
  locales?: string[];
  active?: boolean;
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: { id: number; changes: UserChanges }) => api<UserView>(`/users/${id}`, { method: 'PATCH', body: changes }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersKey }),
  });
}
