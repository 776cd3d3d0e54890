import { describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import { renderInStudio } from '../../test-utils';
import { SettingsDialog } from './SettingsDialog';

// Fluent's first render in jsdom is slow on a busy machine; the limit only bounds a hang.
const RENDER_LIMIT = 20_000;

const VENUES = { items: [{ id: 1, name: 'Harbour Hall', slug: 'harbour-hall', sourceLocale: 'en', targetLocales: [] }], total: 1 };
vi.mock('../../api/settings', () => ({
  useVenues: () => ({ data: VENUES }),
  useGalleries: () => ({ data: { items: [], total: 0 } }),
  useSaveSetting: () => ({ isPending: false, error: null, mutate: vi.fn() }),
}));

// Wording: the studio's English resources (studio/src/app/i18n/locales/authoring.en.ts).
describe('the gallery dialog', () => {
  it('asks for the venue of a new gallery', async () => {
    await renderInStudio(<SettingsDialog collection="galleries" editing={null} onClose={() => {}} />);
    const venue = screen.getByRole<HTMLSelectElement>('combobox', { name: /^Venue/ });
    expect([venue.disabled, venue.required]).toEqual([false, true]);
  }, RENDER_LIMIT);

  it('shows a gallery’s venue as fixed when changing it, and says why, since the server takes no new venue', async () => {
    await renderInStudio(<SettingsDialog collection="galleries" editing={{ id: 5, venueId: 1, name: 'Lava Room' }} onClose={() => {}} />);
    const venue = screen.getByRole<HTMLSelectElement>('combobox', { name: /^Venue/ });
    expect([venue.disabled, venue.required, venue.selectedOptions[0]?.textContent]).toEqual([true, false, 'Harbour Hall']);
    const description = venue.getAttribute('aria-describedby')?.split(' ').map((id) => document.getElementById(id)?.textContent).join(' ');
    expect(description).toBe('Chosen when this was created; it cannot be changed.');
  }, RENDER_LIMIT);
});
