import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CommentRange, CommentView, RevisionView } from '@mantlepiece/shared';
import { answerOf, client } from './client';
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
    mutationFn: (comment: NewComment) => answerOf(client.POST('/api/revisions/{id}/comments', { params: { path: { id: revisionId } }, body: comment })),
    onSuccess: keep,
  });
}

export function useResolveComment(revisionId: number) {
  const keep = useKeepComment(revisionId);
  return useMutation({
    mutationFn: ({ id, resolved }: { id: number; resolved: boolean }) => answerOf(client.PATCH('/api/comments/{id}', { params: { path: { id } }, body: { resolved } })),
    onSuccess: keep,
  });
}
