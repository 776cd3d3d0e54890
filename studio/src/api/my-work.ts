import { useQuery } from '@tanstack/react-query';
import { answerOf, client } from './client';

/** What is waiting for the signed-in person, per role; refreshed every minute while the home page is open. */
export function useMyWork() {
  return useQuery({
    queryKey: ['me', 'work'],
    queryFn: () => answerOf(client.GET('/api/me/work')),
    refetchInterval: 60_000,
  });
}
