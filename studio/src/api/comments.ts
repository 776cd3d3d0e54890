import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from './client';
import { revisionKey, type PersonRef, type RevisionView } from './revisions';

/** Character offsets into the panel's text as the revision shows it, with the words they cover. */
export interface CommentRange {
  from: number;
  to: number;
  quote: string;
}

export interface CommentView {
  id: number;
  revisionId: number;
  panelId: number | null;
  range: CommentRange | null;
  body: string;
  author: PersonRef;
  parentId: number | null;
  resolvedAt: string | null;
  resolvedBy: PersonRef | null;
  createdAt: string;
  carriedFromRevisionId: number | null;
}

export interface NewComment {
  panelId?: number;
  range?: CommentRange;
  body: string;
  parentId?: number;
}

/** Puts the server's copy of a comment into the open revision, new or changed. */
function useKeepComment(revisionId: number) {
  const queryClient = useQueryClient();
  return (comment: CommentView) =>
    queryClient.setQueryData<RevisionView>(revisionKey(revisionId), (current) =>
      current ? { ...current, comments: [...current.comments.filter((c) => c.id !== comment.id), comment] } : current,
    );
}

export function useAddComment(revisionId: number) {
  const keep = useKeepComment(revisionId);
  return useMutation({
    mutationFn: (comment: NewComment) => api<CommentView>(`/revisions/${revisionId}/comments`, { method: 'POST', body: comment }),
    onSuccess: keep,
  });
}

export function useResolveComment(revisionId: number) {
  const keep = useKeepComment(revisionId);
  return useMutation({
    mutationFn: ({ id, resolved }: { id: number; resolved: boolean }) => api<CommentView>(`/comments/${id}`, { method: 'PATCH', body: { resolved } }),
    onSuccess: keep,
  });
}
