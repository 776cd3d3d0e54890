import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { SEARCH_TEXT_LENGTH } from '@mantlepiece/shared';
import { answerOf, client } from './client';

/** Global search over every venue of the person's; asks only once the text is long enough for the server. */
export function useGlobalSearch(text: string) {
  const q = text.trim();
  return useQuery({
    queryKey: ['search', q],
    queryFn: () => answerOf(client.GET('/api/search', { params: { query: { q } } })),
    enabled: q.length >= SEARCH_TEXT_LENGTH.min && q.length <= SEARCH_TEXT_LENGTH.max,
    placeholderData: keepPreviousData,
  });
}
