import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CommentRange, CommentView, RevisionView } from '@mantlepiece/shared';
import { api } from './client';
import { revisionKey } from './revisions';

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
