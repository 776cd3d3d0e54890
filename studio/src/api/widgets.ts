import { useQuery } from '@tanstack/react-query';
import { answerOf, client } from './client';

/** Widget types with the JSON Schema of their params and their defaults, as the server lists them. */
export function useWidgetTypes() {
  return useQuery({
    queryKey: ['widgets'],
    queryFn: () => answerOf(client.GET('/api/widgets')),
    // The list only changes with a new server build.
    staleTime: Number.POSITIVE_INFINITY,
  });
}
