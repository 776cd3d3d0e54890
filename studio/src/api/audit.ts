import { keepPreviousData, useMutation, useQuery } from '@tanstack/react-query';
import type { AuditEventView, Page } from '@mantlepiece/shared';
import { api, apiFile } from './client';

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
    queryFn: () => api<Page<AuditEventView>>('/audit', { query: { ...params } }),
    placeholderData: keepPreviousData,
  });
}

/** The same filter as CSV, through the client so the request carries the bearer token. */
export function useDownloadAuditCsv() {
  return useMutation({
    mutationFn: (filter: AuditFilter) => apiFile('/audit', { query: { ...filter }, accept: 'text/csv' }),
  });
}
