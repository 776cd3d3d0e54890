import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { StoryDetailView, Verdict } from '@mantlepiece/shared';
import { useVenueFilter } from '../app/current-venue';
import { answerOf, client } from './client';
import { revisionKey } from './revisions';
import { storyKey } from './stories';
import type { QueueSort } from '@mantlepiece/shared';

export interface QueueParams {
  page: number;
  pageSize: number;
  q?: string;
  sort?: QueueSort;
}

const reviewsKey = ['reviews'] as const;

export function useReviewQueue(params: QueueParams) {
  const venue = useVenueFilter();
  return useQuery({
    queryKey: [...reviewsKey, 'queue', params, venue],
    queryFn: () => answerOf(client.GET('/api/reviews/queue', { params: { query: { ...params, ...venue } } })),
    placeholderData: keepPreviousData,
  });
}

export function useRecordVerdict(revisionId: number, storyId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (verdict: { verdict: Verdict; note?: string }) =>
      answerOf(client.POST('/api/revisions/{id}/reviews', { params: { path: { id: revisionId } }, body: verdict })),
    onSuccess: ({ storyState }) => {
      queryClient.setQueryData<StoryDetailView>(storyKey(storyId), (current) => (current ? { ...current, state: storyState } : current));
      void queryClient.invalidateQueries({ queryKey: revisionKey(revisionId) });
      void queryClient.invalidateQueries({ queryKey: reviewsKey });
      void queryClient.invalidateQueries({ queryKey: ['story', storyId, 'revisions'] });
      void queryClient.invalidateQueries({ queryKey: ['stories'] });
    },
  });
}
