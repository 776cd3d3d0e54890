import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { NotificationPreferences } from '@mantlepiece/shared';
import { answerOf, client } from './client';

const notificationsKey = ['notifications'] as const;
const preferencesKey = ['notification-preferences'] as const;

/** How often the header's bell asks for the unread count: often enough to notice a verdict while working. */
const UNREAD_POLL_MS = 30_000;

export function useNotifications(params: { page: number; pageSize: number; unread?: boolean }) {
  return useQuery({
    queryKey: [...notificationsKey, params],
    queryFn: () => answerOf(client.GET('/api/notifications', { params: { query: { ...params, unread: params.unread ? 'true' : undefined } } })),
    placeholderData: keepPreviousData,
  });
}

/** The unread count alone: one row is the smallest page the list gives. */
export function useUnreadCount() {
  return useQuery({
    queryKey: [...notificationsKey, 'unread'],
    queryFn: () => answerOf(client.GET('/api/notifications', { params: { query: { page: 1, pageSize: 1, unread: 'true' } } })),
    select: (page) => page.unread,
    refetchInterval: UNREAD_POLL_MS,
    staleTime: 0,
  });
}

export function useMarkNotificationsRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (which: { ids: number[] } | { all: true }) => answerOf(client.POST('/api/notifications/read', { body: which })),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: notificationsKey }),
  });
}

export function useNotificationPreferences() {
  return useQuery({ queryKey: preferencesKey, queryFn: () => answerOf(client.GET('/api/notifications/preferences')) });
}

export function useUpdateNotificationPreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (preferences: NotificationPreferences) => answerOf(client.PUT('/api/notifications/preferences', { body: preferences })),
    onSuccess: (preferences) => queryClient.setQueryData(preferencesKey, preferences),
  });
}
