import type { StoryView } from '@mantlepiece/shared';
import type { Person } from '../auth/policy.js';
import type { Story } from './models/story.model.js';
import { storyCan } from './story-policy.js';

/** The `approvedRevision` column, `id:number` or null. */
function approvedRevisionOf(story: Story): StoryView['approvedRevision'] {
  const column = story.get('approvedRevision');
  if (typeof column !== 'string') return null;
  const [id, number] = column.split(':').map(Number);
  return { id: id!, number: number! };
}

/** The open submission as the `openApprovals` column tells it (-1: none); only how many approvals it has decides a withdrawal. */
function openRevisionOf(story: Story) {
  const approvals = Number(story.get('openApprovals') ?? -1);
  return approvals < 0 ? null : { authorId: 0, approvals: Array.from({ length: approvals }, () => ({ educatorId: 0 })) };
}

/**
 * `story` as read by StoriesService, with its exhibit, author and the panelCount, approvedRevision
 * and openApprovals columns, and what `person` may do to it.
 */
export const toStoryView = (story: Story, person: Person): StoryView => ({
  id: story.id,
  title: story.title,
  audience: story.audience,
  sourceLocale: story.sourceLocale,
  state: story.state,
  exhibitId: story.exhibitId ?? null,
  exhibitName: story.exhibit?.name ?? null,
  panelCount: Number(story.get('panelCount') ?? 0),
  createdAt: story.createdAt.toISOString(),
  updatedAt: story.updatedAt.toISOString(),
  createdBy: story.createdBy ? { id: story.createdBy.id, name: story.createdBy.name } : null,
  approvedRevision: approvedRevisionOf(story),
  can: storyCan(person, {
    state: story.state,
    releasedAt: story.releasedAt ?? null,
    panelCount: Number(story.get('panelCount') ?? 0),
    openRevision: openRevisionOf(story),
  }),
});
