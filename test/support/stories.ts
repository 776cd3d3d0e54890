import type { Audience, PanelView } from '@mantlepiece/shared';
import type { apiAs } from './browser';

type Api = Awaited<ReturnType<typeof apiAs>>;

/** A panel document of one paragraph per text, as the editor saves plain text. */
export const paragraphs = (...texts: string[]) => ({ type: 'doc', content: texts.map((text) => ({ type: 'paragraph', content: [{ type: 'text', text }] })) });

/** What a new story is given on the Stories page's New story dialog. */
export interface NewStory {
  title: string;
  audience?: Audience;
  exhibitId?: number;
  venueId?: number;
}

/**
 * A draft of the calling curator's with these panel documents in order (each with a 60-word budget), made
 * through the API as the Stories page and the panel strip make it, so a test starts from its own story.
 * Answers the story's id and its panels.
 */
export async function storyWithPanels(curator: Api, story: NewStory, docs: object[]): Promise<{ storyId: number; panels: PanelView[] }> {
  const { id } = await curator<{ id: number }>('POST', '/stories', { audience: 'family', ...story });
  const panels: PanelView[] = [];
  for (const [position, doc] of docs.entries()) panels.push(await curator<PanelView>('POST', `/stories/${id}/panels`, { doc, position, wordBudget: 60 }));
  return { storyId: id, panels };
}
