import { randomUUID } from 'node:crypto';
import { parse } from 'csv-parse/sync';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import type { InsightsView, KioskEvent } from '@mantlepiece/shared';
import { galleryWithExhibit, paragraphDoc } from '../../test/authoring-fixtures.js';
import { approve, buildRelease, pairedKiosk, publish } from '../../test/release-fixtures.js';
import { member, storyWithPanels } from '../../test/review-fixtures.js';
import { createTestApp } from '../../test/test-app.js';

const t = await createTestApp();
afterAll(() => t.close());

const admin = await member(t, ['admin']);
const technician = await member(t, ['technician']);
const curator = await member(t, ['curator']);
const educator = await member(t, ['educator']);
const { venue, gallery, exhibit } = await galleryWithExhibit(t, admin.auth, 'insights');
const other = await galleryWithExhibit(t, admin.auth, 'elsewhere');
const plates = await storyWithPanels(t, curator.auth, exhibit.id, [paragraphDoc('Plates move.'), paragraphDoc('A few centimetres a year.')]);
const ridge = await storyWithPanels(t, curator.auth, exhibit.id, [paragraphDoc('New sea floor.')]);
const [p1, p2] = plates.panelIds as [number, number];
const [p3] = ridge.panelIds as [number];
// A kiosk's events count only for stories and panels a published release of its gallery carries.
await request(t.http).patch(`/api/venues/${venue.id}`).set(admin.auth).send({ fallbackToSource: true });
for (const story of [plates, ridge]) await approve(t, curator.auth, educator.auth, story.storyId);
await publish(t, technician.auth, (await buildRelease(t, technician.auth, gallery.id)).id);
const kiosk = await pairedKiosk(t, admin.auth, technician.auth, gallery.id);
const elsewhere = await pairedKiosk(t, admin.auth, technician.auth, other.gallery.id);

type Fixture = Omit<KioskEvent, 'id' | 'at'> & { at?: string };
const inRange = (n: number) => `2025-05-1${n % 3}T10:${String(n % 60).padStart(2, '0')}:00.000Z`;
const events = (fixtures: Fixture[]): KioskEvent[] => fixtures.map((f, n) => ({ id: randomUUID(), at: inRange(n), ...f }) as KioskEvent);
const times = (count: number, event: Fixture) => Array.from({ length: count }, () => event);

const fixture = events([
  ...times(3, { type: 'story_opened', storyId: plates.storyId, locale: 'en' }),
  ...times(1, { type: 'story_opened', storyId: ridge.storyId, locale: 'fr' }),
  // The range's last millisecond is in; the moments either side of it are out.
  { type: 'story_opened', storyId: ridge.storyId, at: '2025-05-12T23:59:59.999Z' },
  { type: 'story_opened', storyId: plates.storyId, at: '2025-05-09T23:59:59.999Z' },
  { type: 'story_opened', storyId: plates.storyId, at: '2025-05-13T00:00:00.000Z' },
  ...[4000, 12000, 6000].map((dwellMs) => ({ type: 'panel_viewed' as const, storyId: plates.storyId, panelId: p1, dwellMs })),
  ...[3000, 9000, 5000, 1000].map((dwellMs) => ({ type: 'panel_viewed' as const, storyId: plates.storyId, panelId: p2, dwellMs })),
  ...[7001, 2500].map((dwellMs) => ({ type: 'panel_viewed' as const, storyId: ridge.storyId, panelId: p3, dwellMs })),
  ...times(3, { type: 'widget_touched', storyId: plates.storyId, panelId: p1, widgetType: 'slope-force', param: 'angleDeg' }),
  ...times(1, { type: 'widget_touched', storyId: plates.storyId, panelId: p1, widgetType: 'slope-force', param: 'staticFriction' }),
  ...times(1, { type: 'widget_touched', storyId: plates.storyId, panelId: p1, widgetType: 'slope-force' }),
  ...times(2, { type: 'widget_touched', storyId: ridge.storyId, panelId: p3, widgetType: 'convection-cell', param: 'rayleigh' }),
  ...times(2, { type: 'language_chosen', locale: 'fr' }),
  ...times(1, { type: 'language_chosen', locale: 'es' }),
  ...times(2, { type: 'switch_used', switch: 'large_text' }),
  ...times(1, { type: 'switch_used', switch: 'reduced_motion' }),
]);

/**
 * Worked by hand from the fixture, 10 to 12 May 2025. Opens: plates 3, ridge 1 + the last
 * millisecond = 2 (the 9 May and 13 May opens fall outside). Dwell medians: panel 1 sorted
 * 4000, 6000, 12000 → 6000 (odd count, the middle); panel 2 sorted 1000, 3000, 5000, 9000 →
 * (3000 + 5000) / 2 = 4000; panel 3 (2500 + 7001) / 2 = 4750.5 (even counts, the mean of the
 * middle two). Events: 5 opens + 9 views + 7 touches + 3 languages + 3 switches = 27.
 */
const expected: Omit<InsightsView, 'stories' | 'panels'> & { stories: unknown[]; panels: unknown[] } = {
  galleryId: gallery.id,
  from: '2025-05-10',
  to: '2025-05-12',
  timeZone: 'UTC',
  totals: { events: 27, storyOpens: 5, panelViews: 9, widgetTouches: 7, demoEvents: 0 },
  stories: [{ storyId: plates.storyId, title: expect.any(String), opens: 3 }, { storyId: ridge.storyId, title: expect.any(String), opens: 2 }],
  panels: [
    { panelId: p2, storyId: plates.storyId, storyTitle: expect.any(String), position: 2, views: 4, medianDwellMs: 4000 },
    { panelId: p1, storyId: plates.storyId, storyTitle: expect.any(String), position: 1, views: 3, medianDwellMs: 6000 },
    { panelId: p3, storyId: ridge.storyId, storyTitle: expect.any(String), position: 1, views: 2, medianDwellMs: 4750.5 },
  ],
  widgets: [
    { widgetType: 'slope-force', touches: 5, params: [{ param: 'angleDeg', touches: 3 }, { param: 'staticFriction', touches: 1 }, { param: null, touches: 1 }] },
    { widgetType: 'convection-cell', touches: 2, params: [{ param: 'rayleigh', touches: 2 }] },
  ],
  languages: [{ locale: 'fr', chosen: 2 }, { locale: 'es', chosen: 1 }],
  switches: [{ switch: 'large_text', used: 2 }, { switch: 'reduced_motion', used: 1 }],
};

const range = { galleryId: gallery.id, from: '2025-05-10', to: '2025-05-12' };

describe('kiosk event upload', () => {
  it('stores each event once when a batch is uploaded twice', async () => {
    const first = await request(t.http).post('/api/kiosk/events').set(kiosk.device).send({ events: fixture });
    expect(first.status).toBe(200);
    expect(first.body).toEqual({ stored: fixture.length, duplicates: 0, dropped: 0 });
    const again = await request(t.http).post('/api/kiosk/events').set(kiosk.device).send({ events: [...fixture.slice(0, 5), ...events([{ type: 'language_chosen', locale: 'fr', at: '2025-05-20T10:00:00.000Z' }])] });
    expect(again.body).toEqual({ stored: 1, duplicates: 5, dropped: 0 });
    // A story no release of another gallery carries is not that gallery's: its kiosk's events naming it are dropped and counted.
    const away = await request(t.http).post('/api/kiosk/events').set(elsewhere.device).send({ events: events(times(4, { type: 'story_opened', storyId: plates.storyId, at: '2025-05-11T09:00:00.000Z' })) });
    expect(away.body).toEqual({ stored: 0, duplicates: 0, dropped: 4 });
  });
});

describe('insights', () => {
  it('matches the hand computation of the fixture: opens, exact median dwell per panel, widget use, languages and switches', async () => {
    const res = await request(t.http).get('/api/insights').query(range).set(curator.auth);
    expect(res.status).toBe(200);
    expect(res.body).toEqual(expected);
    const titles = new Map((res.body as InsightsView).stories.map((s) => [s.storyId, s.title]));
    expect(titles.get(plates.storyId)).toMatch(/^Review story /);
  });

  it('names no visitor and no kiosk in its answer', async () => {
    const res = await request(t.http).get('/api/insights').query(range).set(curator.auth);
    const text = JSON.stringify(res.body);
    expect(text).not.toMatch(/kiosk|station|device|"id"/i);
  });

  it('gives the same figures as CSV that a general-purpose CSV parser reads', async () => {
    const res = await request(t.http).get('/api/insights').query(range).set('Accept', 'text/csv').set(technician.auth);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toMatch(new RegExp(`^attachment; filename="?insights-gallery-${gallery.id}-2025-05-10_to_2025-05-12\\.csv"?$`));
    const records = parse(res.text, { columns: true }) as Record<string, string>[];
    expect(Object.keys(records[0]!)).toEqual([
      'figure', 'story_id', 'story_title', 'panel_id', 'panel_position', 'widget_type', 'param', 'locale', 'switch', 'count', 'median_dwell_ms', 'from_day', 'to_day', 'time_zone',
    ]);
    expect(new Set(records.map((r) => `${r.from_day} ${r.to_day} ${r.time_zone}`))).toEqual(new Set(['2025-05-10 2025-05-12 UTC']));
    const of = (figure: string) => records.filter((r) => r.figure === figure);
    expect(of('story_opens').map((r) => [Number(r.story_id), Number(r.count)])).toEqual([[plates.storyId, 3], [ridge.storyId, 2]]);
    expect(of('panel_views').map((r) => [Number(r.panel_id), Number(r.panel_position), Number(r.count), Number(r.median_dwell_ms)])).toEqual([[p2, 2, 4, 4000], [p1, 1, 3, 6000], [p3, 1, 2, 4750.5]]);
    expect(of('widget_touches').map((r) => [r.widget_type, r.param, Number(r.count)])).toEqual([
      ['slope-force', 'angleDeg', 3], ['slope-force', 'staticFriction', 1], ['slope-force', '', 1], ['convection-cell', 'rayleigh', 2],
    ]);
    expect(of('language_chosen').map((r) => [r.locale, Number(r.count)])).toEqual([['fr', 2], ['es', 1]]);
    expect(of('switch_used').map((r) => [r.switch, Number(r.count)])).toEqual([['large_text', 2], ['reduced_motion', 1]]);
  });

  it('defaults to the 30 days up to today and refuses a range that ends before it starts', async () => {
    const today = t.clock.now().toISOString().slice(0, 10);
    const open = await request(t.http).get('/api/insights').query({ galleryId: gallery.id }).set(curator.auth);
    expect(open.status).toBe(200);
    expect(open.body.to).toBe(today);
    expect(Date.parse(open.body.to) - Date.parse(open.body.from)).toBe(29 * 86_400_000);

    const backwards = await request(t.http).get('/api/insights').query({ galleryId: gallery.id, from: '2025-05-12', to: '2025-05-10' }).set(curator.auth);
    expect(backwards.status).toBe(400);
    expect(backwards.body.errors).toEqual([{ path: ['to'], message: 'The range ends before it starts.' }]);
    const badDate = await request(t.http).get('/api/insights').query({ galleryId: gallery.id, from: '2025-02-30' }).set(curator.auth);
    expect(badDate.status).toBe(400);
    expect(badDate.body.errors).toEqual([{ path: ['from'], message: 'Use a date written YYYY-MM-DD.' }]);
    expect((await request(t.http).get('/api/insights').query({ galleryId: 999999 }).set(curator.auth)).status).toBe(404);
  });
});
