import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { RevisionComparison, RevisionSummary, RevisionView, StoryDetailView, StoryState, StoryView, SubmitResult } from '@mantlepiece/shared';
import { api } from './client';
import { storyKey } from './stories';

export const revisionKey = (id: number) => ['revision', id] as const;
const storyRevisionsKey = (storyId: number) => ['story', storyId, 'revisions'] as const;

export function useStoryRevisions(storyId: number) {
  return useQuery({
    queryKey: storyRevisionsKey(storyId),
    queryFn: () => api<RevisionSummary[]>(`/stories/${storyId}/revisions`),
  });
}

export function useRevision(id: number) {
  return useQuery({ queryKey: revisionKey(id), queryFn: () => api<RevisionView>(`/revisions/${id}`) });
}

/** The revision beside the last approved one; the diff never changes, since both sides are frozen. */
export function useRevisionComparison(id: number) {
  return useQuery({
    queryKey: [...revisionKey(id), 'compare'],
    queryFn: () => api<RevisionComparison>(`/revisions/${id}/compare`),
    staleTime: Number.POSITIVE_INFINITY,
  });
}

/** The story's state comes back with submit and retire; the open story takes it without a reload of its panels. */
function useStoryStateChange(storyId: number) {
  const queryClient = useQueryClient();
  return (state: StoryState) => {
    queryClient.setQueryData<StoryDetailView>(storyKey(storyId), (current) => (current ? { ...current, state } : current));
    void queryClient.invalidateQueries({ queryKey: storyRevisionsKey(storyId) });
    void queryClient.invalidateQueries({ queryKey: ['stories'] });
    void queryClient.invalidateQueries({ queryKey: ['reviews'] });
  };
}

export function useSubmitStory(storyId: number) {
  const changeState = useStoryStateChange(storyId);
  return useMutation({
    mutationFn: () => api<SubmitResult>(`/stories/${storyId}/submit`, { method: 'POST' }),
    onSuccess: (revision) => changeState(revision.state),
  });
}

export function useRetireStory(storyId: number) {
  const changeState = useStoryStateChange(storyId);
  return useMutation({
    mutationFn: () => api<StoryView>(`/stories/${storyId}/retire`, { method: 'POST' }),
    onSuccess: (story) => changeState(story.state),
  });
}
