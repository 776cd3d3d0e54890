import { keepPreviousData, useMutation, useQuery } from '@tanstack/react-query';
import type { InsightsView } from '@mantlepiece/shared';
import { api, apiFile } from './client';

export interface InsightsFilter {
  galleryId: number;
  /** YYYY-MM-DD, days of the gallery's venue, both ends included; the server picks the last 30 of the venue's days when left out. */
  from?: string;
  to?: string;
}

export function useInsights(filter: InsightsFilter | null) {
  return useQuery({
    queryKey: ['insights', filter],
    queryFn: () => api<InsightsView>('/insights', { query: { ...filter } }),
    placeholderData: keepPreviousData,
    enabled: filter !== null,
  });
}

/** The same figures as CSV, through the client so the request carries the bearer token. */
export function useDownloadInsightsCsv() {
  return useMutation({
    mutationFn: (filter: InsightsFilter) => apiFile('/insights', { query: { ...filter }, accept: 'text/csv' }),
  });
}
