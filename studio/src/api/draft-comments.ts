import { useRevision, useStoryRevisions } from './revisions';

/**
 * The comments that concern the draft: those of the story's newest revision, where every open
 * thread of earlier revisions has been carried by the server. Replies and resolutions go to that
 * revision, so the review page and the editor show the same threads.
 */
export function useDraftComments(storyId: number) {
  const revisions = useStoryRevisions(storyId);
  const newest = revisions.data?.reduce<(typeof revisions.data)[number] | undefined>((latest, revision) => (!latest || revision.number > latest.number ? revision : latest), undefined);
  const revision = useRevision(newest?.id ?? 0, newest !== undefined);
  return { revision: newest ? revision.data : undefined, isError: revisions.isError || revision.isError };
}
