import type { StoryView } from '@mantlepiece/shared';
import type { Story } from './models/story.model.js';

/** The `approvedRevision` column, `id:number` or null. */
function approvedRevisionOf(story: Story): StoryView['approvedRevision'] {
  const column = story.get('approvedRevision');
  if (typeof column !== 'string') return null;
  const [id, number] = column.split(':').map(Number);
  return { id: id!, number: number! };
}

/** `story` as read by StoriesService, with its exhibit, author and the panelCount and approvedRevision columns. */
export const toStoryView = (story: Story): StoryView => ({
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
});
