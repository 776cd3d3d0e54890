import { describe, expect, it } from 'vitest';
import { checkPanelDocument, panelText, wordCount, type MediaView, type Page, type StoryDetailView, type StoryView } from '@mantlepiece/shared';
import { DEMO_SECOND_EXHIBIT, DEMO_SECOND_STORY } from '../src/seed/demo-second-venue.js';
import { DEMO_EXHIBIT } from '../src/seed/demo-stories.js';
import { demoPassword, runningServerUrl } from './running-server.js';

const server = runningServerUrl();

async function as(email: string, path: string): Promise<{ status: number; body: unknown }> {
  const login = await fetch(`${server}/api/auth/login`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: demoPassword }),
  });
  const { accessToken } = (await login.json()) as { accessToken: string };
  const res = await fetch(`${server}${path}`, { headers: { Authorization: `Bearer ${accessToken}` } });
  return { status: res.status, body: await res.json() };
}

const asCurator = async <T>(path: string): Promise<T> => (await as('curator@demo.test', path)).body as T;

describe('the seeded demo stories on the running server', () => {
  it('holds three short family stories in the demo exhibit, approved by the demo educator, every panel a valid document within its word budget', async () => {
    const stories = await asCurator<Page<StoryView>>('/api/stories?sort=title');
    const demo = stories.items.filter((story) => story.exhibitName === DEMO_EXHIBIT.name);
    expect(demo.map((story) => [story.audience, story.state])).toEqual([['family', 'approved'], ['family', 'approved'], ['family', 'approved']]);
    for (const summary of demo) {
      const story = await asCurator<StoryDetailView>(`/api/stories/${summary.id}`);
      expect(story.panels.length).toBeGreaterThanOrEqual(2);
      for (const panel of story.panels) {
        expect(checkPanelDocument(panel.doc).ok).toBe(true);
        // Museum practice (common practice): tens of words a panel, not hundreds.
        expect(wordCount(panelText(panel.doc))).toBeLessThanOrEqual(panel.wordBudget);
      }
    }
  });

  it('credits every demo image, with a CC-BY-4.0 licence that outlasts the exhibit and alt text in en, fr and es', async () => {
    const media = await asCurator<Page<MediaView>>('/api/media?q=Basalt%20Point');
    expect(media.total).toBe(3);
    for (const asset of media.items) {
      expect(asset).toMatchObject({ credit: 'Illustration: Basalt Point Earth Science Centre', licence: { kind: 'spdx', id: 'CC-BY-4.0' } });
      expect(asset.licenceExpiresOn! > DEMO_EXHIBIT.plannedEnd).toBe(true);
      expect(Object.keys(asset.alt).sort()).toEqual(['en', 'es', 'fr']);
      expect(asset.usedIn).toHaveLength(1);
    }
  });

  it('gives the second venue one approved story of its own, which its curator sees and the first venue\'s curator does not, not even by its id', async () => {
    const seen = (await as('curator2@demo.test', '/api/stories?sort=title')).body as Page<StoryView>;
    expect(seen.items.map((story) => [story.title, story.exhibitName, story.state]))
      .toEqual([[DEMO_SECOND_STORY.title, DEMO_SECOND_EXHIBIT.name, 'approved']]);
    const first = await asCurator<Page<StoryView>>('/api/stories?pageSize=100');
    expect(first.items.map((story) => story.title)).not.toContain(DEMO_SECOND_STORY.title);
    const direct = await as('curator@demo.test', `/api/stories/${seen.items[0]!.id}`);
    const missing = await as('curator@demo.test', '/api/stories/2147483647');
    expect(direct).toEqual(missing);
  });
});
