import { keepPreviousData, skipToken, useQuery } from '@tanstack/react-query';
import { PAGE_SIZE } from '@mantlepiece/shared';
import { answerOf, client } from './client';

/**
 * Captured mail exists only while the server uses the local SMTP stand-in; everywhere else the
 * route answers 404, and the studio then hides the page.
 */
export function useCapturedMail(page: number, enabled = true) {
  return useQuery({
    queryKey: ['dev-mail', page],
    queryFn: () => answerOf(client.GET('/api/dev/mail', { params: { query: { page, pageSize: PAGE_SIZE.fallback } } })),
    enabled,
    retry: false,
    placeholderData: keepPreviousData,
  });
}

export function useCapturedMessage(id: string | undefined) {
  return useQuery({
    queryKey: ['dev-mail', 'message', id],
    queryFn: id === undefined ? skipToken : () => answerOf(client.GET('/api/dev/mail/{id}', { params: { path: { id } } })),
  });
}
