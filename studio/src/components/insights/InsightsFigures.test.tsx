import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import { describeWidgetTypes, type InsightsView } from '@mantlepiece/shared';
import { i18next } from '../../app/i18n';
import { renderInStudio } from '../../test-utils';
import { InsightsFigures } from './InsightsFigures';

// The canvas chart needs a real browser; the table beside it carries the same names and numbers.
vi.mock('./FigureChart', () => ({ FigureChart: () => null }));

// Fluent's first render in jsdom is slow on a busy machine; the limit only bounds a hang.
const RENDER_LIMIT = 20_000;

/** Touches of the settings visitors move on the slab story's widgets, as the server counts them. */
const INSIGHTS: InsightsView = {
  galleryId: 1,
  from: '2027-03-01',
  to: '2027-03-30',
  timeZone: 'America/Halifax',
  totals: { events: 40, storyOpens: 0, panelViews: 0, widgetTouches: 40, demoEvents: 0 },
  stories: [],
  panels: [],
  widgets: [
    { widgetType: 'sea-floor-depth', touches: 17, params: [{ param: 'ageMyr', touches: 12 }, { param: 'model', touches: 5 }] },
    { widgetType: 'plate-forces', touches: 23, params: [{ param: 'slabLengthKm', touches: 15 }, { param: 'ageMyr', touches: 8 }] },
  ],
  languages: [],
  switches: [],
};

beforeEach(() => {
  // The widget list as the server publishes it (GET /api/widgets), which gives each setting its unit.
  vi.stubGlobal('fetch', vi.fn(async () => new Response(JSON.stringify({ items: describeWidgetTypes() }), { headers: { 'Content-Type': 'application/json' } })));
});
afterEach(() => vi.unstubAllGlobals());

async function widgetRows(language: string): Promise<string[][]> {
  await renderInStudio(<InsightsFigures insights={INSIGHTS} />, { language });
  const table = screen.getByRole('table', { name: i18next.getFixedT(language)('insights.widgets.title') });
  // The units arrive with the widget list; wait for them so the names are final.
  await within(table).findAllByText(/\(km\)/);
  return within(table).getAllByRole('row').slice(1).map((row) => within(row).getAllByRole('cell').map((cell) => cell.textContent ?? ''));
}

describe('Insights names the new widgets and their settings', () => {
  it('in English, as the kiosk names the settings, with their units', async () => {
    expect(await widgetRows('en')).toEqual([
      ['Sea-floor depth', 'Age of the sea floor (Myr)', '12'],
      ['Sea-floor depth', 'Model', '5'],
      ['Plate forces', 'Length of the sinking slab (km)', '15'],
      ['Plate forces', 'Age of the plate at the trench (Myr)', '8'],
    ]);
  }, RENDER_LIMIT);

  it.each(['fr', 'es', 'ar'])('in %s, never by an internal key or an English name', async (language) => {
    const rows = await widgetRows(language);
    expect(rows).toHaveLength(4);
    const english = ['Sea-floor depth', 'Plate forces', 'Age of the sea floor', 'Model', 'Length of the sinking slab', 'Age of the plate at the trench'];
    for (const [widget, setting] of rows) {
      for (const name of [widget!, setting!]) {
        expect(name, 'an internal key').not.toMatch(/[a-z][A-Z]|[a-z]-[a-z]+-|^(model|ageMyr)$/);
        expect(english, `${name} is English`).not.toContain(name.replace(/ \(.*\)$/, ''));
      }
    }
  }, RENDER_LIMIT);

  it('in French, with the kiosk’s own words', async () => {
    const rows = await widgetRows('fr');
    expect(rows.map((row) => row[1])).toEqual(['Âge du fond marin (Myr)', 'Modèle', 'Longueur de la plaque plongeante (km)', 'Âge de la plaque à la fosse (Myr)']);
  }, RENDER_LIMIT);
});
