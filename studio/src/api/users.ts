import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Page, Role, UserView } from '@mantlepiece/shared';
import { api } from './client';
import type { UserSort } from '@mantlepiece/shared';

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
  /** The venue whose roles the invitation grants; null for roles at every venue (the organisation admin's choice). */
  venueId: number | null;
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

export interface GrantChange {
  person: UserView;
  name: string;
  /** null: the roles held at every venue; otherwise the membership at that venue. */
  venueId: number | null;
  roles: Role[];
  locales: string[];
}

/**
 * Saves an edited person: the name, and the roles and locales of one grant. A venue's membership
 * is set, or ended when it is left with no roles; roles at every venue go on the account.
 */
export function useSaveGrant() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ person, name, venueId, roles, locales }: GrantChange) => {
      if (venueId === null) return api<UserView>(`/users/${person.id}`, { method: 'PATCH', body: { name, roles, locales } });
      if (name !== person.name) await api<UserView>(`/users/${person.id}`, { method: 'PATCH', body: { name } });
      const path = `/users/${person.id}/memberships/${venueId}`;
      if (roles.length) return api<UserView>(path, { method: 'PUT', body: { roles, locales } });
      return person.memberships.some((grant) => grant.venueId === venueId) ? api<UserView>(path, { method: 'DELETE' }) : person;
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersKey }),
  });
}
