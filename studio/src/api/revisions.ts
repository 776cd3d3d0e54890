import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { RevisionComparison, RevisionSummary, RevisionView, StoryDetailView, StoryView, SubmitRequest, SubmitResult } from '@mantlepiece/shared';
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

export function useRevision(id: number, enabled = true) {
  return useQuery({ queryKey: revisionKey(id), queryFn: () => api<RevisionView>(`/revisions/${id}`), enabled });
}

/** The revision beside the last approved one; the diff never changes, since both sides are frozen. */
export function useRevisionComparison(id: number) {
  return useQuery({
    queryKey: [...revisionKey(id), 'compare'],
    queryFn: () => api<RevisionComparison>(`/revisions/${id}/compare`),
    staleTime: Number.POSITIVE_INFINITY,
  });
}

/**
 * A review move answers with the story's state (and its approved revision and `can`); the open story
 * takes them without a reload of its panels. A move that does not answer `can` has the story read
 * again: what the person may do next is the server's to say, never guessed from the new state.
 */
function useStoryStateChange(storyId: number) {
  const queryClient = useQueryClient();
  return (change: Partial<Pick<StoryView, 'state' | 'approvedRevision' | 'can'>>) => {
    queryClient.setQueryData<StoryDetailView>(storyKey(storyId), (current) => (current ? { ...current, ...change } : current));
    if (!change.can) void queryClient.invalidateQueries({ queryKey: storyKey(storyId), exact: true });
    void queryClient.invalidateQueries({ queryKey: storyRevisionsKey(storyId) });
    void queryClient.invalidateQueries({ queryKey: ['stories'] });
    void queryClient.invalidateQueries({ queryKey: ['reviews'] });
  };
}

export function useSubmitStory(storyId: number) {
  const changeState = useStoryStateChange(storyId);
  return useMutation({
    mutationFn: (request: SubmitRequest) => api<SubmitResult>(`/stories/${storyId}/submit`, { method: 'POST', body: request }),
    onSuccess: (revision) => changeState({ state: revision.state }),
  });
}

/** Withdraw, revise and retire: each answers with the story as the Stories table shows it. */
function useStoryMove(storyId: number, move: 'withdraw' | 'revise' | 'retire') {
  const changeState = useStoryStateChange(storyId);
  return useMutation({
    mutationFn: () => api<StoryView>(`/stories/${storyId}/${move}`, { method: 'POST' }),
    onSuccess: (story) => changeState({ state: story.state, approvedRevision: story.approvedRevision, can: story.can }),
  });
}

export const useWithdrawSubmission = (storyId: number) => useStoryMove(storyId, 'withdraw');
export const useReviseStory = (storyId: number) => useStoryMove(storyId, 'revise');
export const useRetireStory = (storyId: number) => useStoryMove(storyId, 'retire');
