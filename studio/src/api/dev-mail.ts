import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { Page } from '@mantlepiece/shared';
import { api } from './client';

export interface CapturedMailSummary {
  id: string;
  to: string;
  subject: string;
  date: string;
}

export interface CapturedMail extends CapturedMailSummary {
  from: string;
  text: string;
  html: string;
}

/**
 * Captured mail exists only while the server uses the local SMTP stand-in; everywhere else the
 * route answers 404, and the studio then hides the page.
 */
export function useCapturedMail(page: number, enabled = true) {
  return useQuery({
    queryKey: ['dev-mail', page],
    queryFn: () => api<Page<CapturedMailSummary>>('/dev/mail', { query: { page, pageSize: 25 } }),
    enabled,
    retry: false,
    placeholderData: keepPreviousData,
  });
}

export function useCapturedMessage(id: string | undefined) {
  return useQuery({
    queryKey: ['dev-mail', 'message', id],
    queryFn: () => api<CapturedMail>(`/dev/mail/${encodeURIComponent(id ?? '')}`),
    enabled: id !== undefined,
  });
}
