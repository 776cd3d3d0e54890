import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { answerOf, client, onSessionChange, refreshSession, setSession, type Schema } from './client';

export const sessionKey = ['session'] as const;

/**
 * The signed-in session, or null. On page load this trades the refresh cookie for a session once;
 * afterwards sign-in, sign-out, refreshes and profile changes write it straight into the cache.
 */
export function useSession() {
  return useQuery({
    queryKey: sessionKey,
    queryFn: refreshSession,
    staleTime: Infinity,
    gcTime: Infinity,
    retry: false,
  });
}

/** The signed-in person; only for pages behind the session guard. */
export function useCurrentUser(): Schema<'UserView'> {
  const { data } = useSession();
  if (!data) throw new Error('useCurrentUser needs a signed-in session');
  return data.user;
}

/** Keeps the query cache in step with the client's session, and forgets everyone's data on sign-out. */
export function connectSessionToCache(queryClient: QueryClient): () => void {
  return onSessionChange((session) => {
    if (!session) queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionKey[0] });
    queryClient.setQueryData(sessionKey, session);
  });
}

export type Credentials = Schema<'SignInDto'>;

export function useSignIn() {
  return useMutation({
    mutationFn: (credentials: Credentials) => answerOf(client.POST('/api/auth/login', { body: credentials })),
    onSuccess: (session) => setSession(session),
  });
}

export function useSignOut() {
  return useMutation({
    mutationFn: () => answerOf(client.POST('/api/auth/logout')),
    // Signed out locally even when the server could not be told: the token is gone from memory.
    onSettled: () => setSession(null),
  });
}

export function useUpdateMe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: Schema<'UpdateProfileDto'>) => answerOf(client.PATCH('/api/auth/me', { body: changes })),
    onSuccess: (user) => {
      queryClient.setQueryData<Schema<'SessionView'> | null>(sessionKey, (session) => (session ? { ...session, user } : session));
    },
  });
}
