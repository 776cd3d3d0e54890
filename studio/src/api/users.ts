import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { Role, UserSort } from '@mantlepiece/shared';
import { answerOf, client, type Schema } from './client';

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
  // The server reads the filter as the text of a query parameter.
  const active = params.active === undefined ? undefined : params.active ? 'true' : 'false';
  return useQuery({
    queryKey: [...usersKey, params],
    queryFn: () => answerOf(client.GET('/api/users', { params: { query: { ...params, active } } })),
    // The table keeps showing the previous page while the next one loads, so it does not jump.
    placeholderData: keepPreviousData,
  });
}

export type SentInvitation = Schema<'InvitationView'>;

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitation: Schema<'InviteUserDto'>) => answerOf(client.POST('/api/users/invitations', { body: invitation })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersKey }),
  });
}

const userAt = (id: number) => ({ path: { id } });

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: { id: number; changes: Schema<'UpdateUserDto'> }) => answerOf(client.PATCH('/api/users/{id}', { params: userAt(id), body: changes })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersKey }),
  });
}

export interface GrantChange {
  person: Schema<'UserView'>;
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
      const patch = (body: Schema<'UpdateUserDto'>) => answerOf(client.PATCH('/api/users/{id}', { params: userAt(person.id), body }));
      if (venueId === null) return patch({ name, roles, locales });
      if (name !== person.name) await patch({ name });
      const membership = { params: { path: { id: person.id, venueId } } };
      if (roles.length) return answerOf(client.PUT('/api/users/{id}/memberships/{venueId}', { ...membership, body: { roles, locales } }));
      return person.memberships.some((grant) => grant.venueId === venueId)
        ? answerOf(client.DELETE('/api/users/{id}/memberships/{venueId}', membership))
        : person;
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersKey }),
  });
}
