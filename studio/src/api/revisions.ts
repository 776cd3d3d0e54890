import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { answerOf, client, type Schema } from './client';
import { storyKey } from './stories';

export const revisionKey = (id: number) => ['revision', id] as const;
const storyRevisionsKey = (storyId: number) => ['story', storyId, 'revisions'] as const;

export function useStoryRevisions(storyId: number) {
  return useQuery({
    queryKey: storyRevisionsKey(storyId),
    queryFn: () => answerOf(client.GET('/api/stories/{id}/revisions', { params: { path: { id: storyId } } })),
  });
}

export function useRevision(id: number, enabled = true) {
  return useQuery({ queryKey: revisionKey(id), queryFn: () => answerOf(client.GET('/api/revisions/{id}', { params: { path: { id } } })), enabled });
}

/** The revision beside the last approved one; the diff never changes, since both sides are frozen. */
export function useRevisionComparison(id: number) {
  return useQuery({
    queryKey: [...revisionKey(id), 'compare'],
    queryFn: () => answerOf(client.GET('/api/revisions/{id}/compare', { params: { path: { id } } })),
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
  return (change: Partial<Pick<Schema<'StoryView'>, 'state' | 'approvedRevision' | 'can'>>) => {
    queryClient.setQueryData<Schema<'StoryDetailView'>>(storyKey(storyId), (current) => (current ? { ...current, ...change } : current));
    if (!change.can) void queryClient.invalidateQueries({ queryKey: storyKey(storyId), exact: true });
    void queryClient.invalidateQueries({ queryKey: storyRevisionsKey(storyId) });
    void queryClient.invalidateQueries({ queryKey: ['stories'] });
    void queryClient.invalidateQueries({ queryKey: ['reviews'] });
  };
}

export function useSubmitStory(storyId: number) {
  const changeState = useStoryStateChange(storyId);
  return useMutation({
    mutationFn: (request: Schema<'SubmitForReviewDto'>) => answerOf(client.POST('/api/stories/{id}/submit', { params: { path: { id: storyId } }, body: request })),
    onSuccess: (revision) => changeState({ state: revision.state }),
  });
}

/** Withdraw, revise and retire: each answers with the story as the Stories table shows it. */
function useStoryMove(storyId: number, move: '/api/stories/{id}/withdraw' | '/api/stories/{id}/revise' | '/api/stories/{id}/retire') {
  const changeState = useStoryStateChange(storyId);
  return useMutation({
    mutationFn: () => answerOf(client.POST(move, { params: { path: { id: storyId } } })),
    onSuccess: (story) => changeState({ state: story.state, approvedRevision: story.approvedRevision, can: story.can }),
  });
}

export const useWithdrawSubmission = (storyId: number) => useStoryMove(storyId, '/api/stories/{id}/withdraw');
export const useReviseStory = (storyId: number) => useStoryMove(storyId, '/api/stories/{id}/revise');
export const useRetireStory = (storyId: number) => useStoryMove(storyId, '/api/stories/{id}/retire');
