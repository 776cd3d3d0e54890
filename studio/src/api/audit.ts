import { keepPreviousData, useMutation, useQuery } from '@tanstack/react-query';
import { answerOf, client } from './client';

export interface AuditFilter {
  actorId?: number;
  action?: string;
  /** YYYY-MM-DD, both ends included. */
  from?: string;
  to?: string;
}

export function useAuditLog(params: AuditFilter & { page: number; pageSize: number }) {
  return useQuery({
    queryKey: ['audit', params],
    queryFn: () => answerOf(client.GET('/api/audit', { params: { query: params } })),
    placeholderData: keepPreviousData,
  });
}

/** The same filter as CSV, through the client so the request carries the bearer token. */
export function useDownloadAuditCsv() {
  return useMutation({
    mutationFn: (filter: AuditFilter) =>
      answerOf(client.GET('/api/audit', { params: { query: filter }, headers: { Accept: 'text/csv' }, parseAs: 'blob' })),
  });
}
