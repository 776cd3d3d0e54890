import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PanelDiff, PanelDocJSON, PreflightEntry, StoryDetailView, StoryState, StoryView } from '@mantlepiece/shared';
import { api } from './client';
import type { CommentView } from './comments';
import { storyKey } from './stories';

export type RevisionState = 'open' | 'approved' | 'changes_requested' | 'superseded';

export interface PersonRef {
  id: number;
  name: string;
}

export interface RevisionSummary {
  id: number;
  number: number;
  hash: string;
  state: RevisionState;
  submittedAt: string;
  submittedBy: PersonRef;
  approvals: number;
  blockers: number;
}

/** A panel as it was frozen into the revision: its document in every locale. */
export interface RevisionPanel {
  panelId: number;
  position: number;
  docs: Record<string, PanelDocJSON>;
  wordBudget: number;
}

export interface ReviewVerdictView {
  id: number;
  verdict: 'approve' | 'request_changes';
  note: string | null;
  reviewer: PersonRef;
  createdAt: string;
}

export interface RevisionView {
  id: number;
  storyId: number;
  storyTitle: string;
  number: number;
  hash: string;
  state: RevisionState;
  submittedAt: string;
  submittedBy: PersonRef;
  snapshot: RevisionPanel[];
  preflight: PreflightEntry[];
  reviews: ReviewVerdictView[];
  comments: CommentView[];
  previousApprovedRevisionId: number | null;
}

export interface RevisionComparison {
  base: RevisionView | null;
  diff: PanelDiff[];
}

export interface SubmittedRevision {
  revisionId: number;
  number: number;
  state: StoryState;
  preflight: PreflightEntry[];
}

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
    mutationFn: () => api<SubmittedRevision>(`/stories/${storyId}/submit`, { method: 'POST' }),
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
