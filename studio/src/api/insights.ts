import { keepPreviousData, skipToken, useMutation, useQuery } from '@tanstack/react-query';
import { answerOf, client } from './client';

export interface InsightsFilter {
  galleryId: number;
  /**
   * YYYY-MM-DD, days of the gallery's venue, both ends included; left out, the server counts the
   * venue's last `INSIGHTS_DEFAULT_DAYS` (shared) and answers which days those were.
   */
  from?: string;
  to?: string;
}

export function useInsights(filter: InsightsFilter | null) {
  return useQuery({
    queryKey: ['insights', filter],
    queryFn: filter === null ? skipToken : () => answerOf(client.GET('/api/insights', { params: { query: filter } })),
    placeholderData: keepPreviousData,
  });
}

/** The same figures as CSV, through the client so the request carries the bearer token. */
export function useDownloadInsightsCsv() {
  return useMutation({
    mutationFn: (filter: InsightsFilter) =>
      answerOf(client.GET('/api/insights', { params: { query: filter }, headers: { Accept: 'text/csv' }, parseAs: 'blob' })),
  });
}
