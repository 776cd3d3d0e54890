import { describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import type { MyWorkView } from '@mantlepiece/shared';
import { renderInStudio } from '../../test-utils';
import { MyWorkLists } from './MyWorkLists';

// Fluent's first render in jsdom is slow on a busy machine; the limit only bounds a hang.
const RENDER_LIMIT = 20_000;

/** What GET /api/me/work answers a curator who is also a translator and an admin, read at NOW. */
const NOW = Date.parse('2027-03-10T12:00:00Z');
const WORK: MyWorkView = {
  curator: {
    drafts: { items: [{ storyId: 4, title: 'Hot rock rises', link: '/stories/4', updatedAt: '2027-03-10T11:00:00Z' }], total: 3 },
    changesRequested: { items: [], total: 0 },
    openComments: { items: [{ storyId: 5, title: 'Ridges push', revisionId: 9, openComments: 2, latestAt: '2027-03-10T10:00:00Z', link: '/reviews/9' }], total: 1 },
  },
  translator: { translations: { items: [{ storyId: 6, title: 'Slabs sink', locale: 'fr', untranslated: 4, stale: 1, link: '/translations/6/fr' }], total: 1 } },
  admin: {
    invitations: { items: [], total: 0 },
    licences: {
      items: [
        { mediaId: 7, filename: 'ridge.png', expiresOn: '2027-03-01', daysLeft: -9, link: '/media/7' },
        { mediaId: 8, filename: 'trench.png', expiresOn: '2027-04-01', daysLeft: 22, link: '/media/8' },
      ],
      total: 2,
    },
  },
};
vi.mock('../../api/my-work', () => ({ useMyWork: () => ({ isPending: false, isError: false, data: WORK, dataUpdatedAt: NOW }) }));

/** Each list the page shows: its heading, its count badge, its items' links and details, and its "all" link. */
function listsShown() {
  return screen.getAllByRole('region').map((section) => ({
    heading: within(section).getByRole('heading').firstChild?.textContent,
    count: within(section).getByRole('heading').querySelector('[data-count]')?.textContent,
    items: within(section).queryAllByRole('listitem').map((item) => [within(item).getByRole('link').getAttribute('href'), item.textContent]),
    rest: within(section).queryAllByRole('link').filter((link) => !link.closest('li')).map((link) => [link.getAttribute('href'), link.textContent]),
    empty: within(section).queryByText('Nothing waiting.') !== null,
  }));
}

// Wording: the studio's English resources (studio/src/app/i18n/locales/en.ts); links: the studio's routes.
describe('the home page lists the work waiting for a role', () => {
  it('shows a curator their drafts, changes requested and open comments, each with its count and the way to the rest', async () => {
    await renderInStudio(<MyWorkLists role="curator" />);
    expect(listsShown()).toEqual([
      { heading: 'Your drafts', count: '3', items: [['/stories/4', expect.stringMatching(/^Hot rock rises ?changed /)]], rest: [['/stories', 'See all 3']], empty: false },
      { heading: 'Changes requested on your stories', count: '0', items: [], rest: [], empty: true },
      { heading: 'Open comments on your stories', count: '1', items: [['/reviews/9', expect.stringMatching(/^Ridges push ?open comments: 2 · latest /)]], rest: [], empty: false },
    ]);
  }, RENDER_LIMIT);

  it('shows a translator the texts to translate with their untranslated and stale units', async () => {
    await renderInStudio(<MyWorkLists role="translator" />);
    expect(listsShown()).toEqual([
      { heading: 'Texts to translate', count: '1', items: [['/translations/6/fr', 'Slabs sink · fruntranslated: 4 · stale: 1']], rest: [], empty: false },
    ]);
  }, RENDER_LIMIT);

  it('tells an admin which licence has ended and which ends soon, and says nothing for a role with no lists', async () => {
    const { unmount } = await renderInStudio(<MyWorkLists role="admin" />);
    expect(listsShown().map(({ heading, items }) => [heading, items.map(([, text]) => text)])).toEqual([
      ['Invitations not yet accepted', []],
      // Days read as the media table reads them, not as ISO text: CLDR's English medium date pattern "MMM d, y" (jsdom's browser language is en-US).
      ['Licences ending within 60 days', ['ridge.pnglicence ended Mar 1, 2027', 'trench.pnglicence ends Apr 1, 2027']],
    ]);
    unmount();
    await renderInStudio(<MyWorkLists role="educator" />);
    expect(screen.queryAllByRole('region')).toEqual([]);
  }, RENDER_LIMIT);
});
