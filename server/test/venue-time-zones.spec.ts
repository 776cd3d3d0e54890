import { randomUUID } from 'node:crypto';
import { parse } from 'csv-parse/sync';
import sharp from 'sharp';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import type { InsightsView, PreflightEntry } from '@mantlepiece/shared';
import { galleryWithExhibit } from './authoring-fixtures.js';
import { prepareRenditions } from './media-fixtures.js';
import { pairedKiosk } from './release-fixtures.js';
import { imageDoc, member, storyWithPanels, type Headers } from './review-fixtures.js';
import { bearer, createTestApp, signIn } from './test-app.js';

const t = await createTestApp();
afterAll(() => t.close());

const HOUR_MS = 3_600_000;
const admin = await member(t, ['admin']);
const technician = await member(t, ['technician']);
const curator = await member(t, ['curator']);

/** A venue of the suite's own with its gallery and exhibit, set to `timeZone`, and a kiosk paired in the gallery. */
async function venueIn(timeZone: string, label: string) {
  const place = await galleryWithExhibit(t, admin.auth, label);
  const set = await request(t.http).patch(`/api/venues/${place.venue.id}`).set(admin.auth).send({ timeZone });
  expect(set.status, JSON.stringify(set.body)).toBe(200);
  return { ...place, kiosk: await pairedKiosk(t, admin.auth, technician.auth, place.gallery.id) };
}

/** Language choices at the given instants: events that name no story, so no release is needed for them to count. */
async function visitsAt(device: Headers, instants: string[]) {
  const events = instants.map((at) => ({ id: randomUUID(), type: 'language_chosen', locale: 'fr', at }));
  const res = await request(t.http).post('/api/kiosk/events').set(device).send({ events });
  expect(res.body).toEqual({ stored: instants.length, duplicates: 0, dropped: 0 });
}

const eventsOn = async (galleryId: number, from: string, to = from) => {
  const res = await request(t.http).get('/api/insights').query({ galleryId, from, to }).set(curator.auth);
  expect(res.status).toBe(200);
  return (res.body as InsightsView).totals.events;
};

describe("a venue's time zone", () => {
  it('is UTC until set, is stored as Intl spells it, and a name Intl does not know is refused with 400 naming timeZone', async () => {
    const { venue } = await galleryWithExhibit(t, admin.auth, 'zone-setting');
    expect(venue.timeZone).toBe('UTC');
    const set = await request(t.http).patch(`/api/venues/${venue.id}`).set(admin.auth).send({ timeZone: 'pacific/auckland' });
    expect(set.status).toBe(200);
    expect(set.body.timeZone).toBe('Pacific/Auckland');
    expect((await request(t.http).get(`/api/venues/${venue.id}`).set(curator.auth)).body.timeZone).toBe('Pacific/Auckland');

    for (const timeZone of ['Mars/Olympus_Mons', '+05:00', '', 42, 'Europe/London; DROP TABLE venues']) {
      const refused = await request(t.http).patch(`/api/venues/${venue.id}`).set(admin.auth).send({ timeZone });
      expect(refused.status, String(timeZone)).toBe(400);
      expect(refused.body).toMatchObject({ statusCode: 400, errors: [{ path: ['timeZone'], message: expect.stringMatching(/IANA time zone/) }] });
    }
    const created = await request(t.http).post('/api/venues').set(admin.auth)
      .send({ name: 'Nowhere Hall', slug: `nowhere-${randomUUID().slice(0, 8)}`, sourceLocale: 'en', targetLocales: [], timeZone: 'Atlantis/Central' });
    expect(created.status).toBe(400);
    expect(created.body.errors).toEqual([{ path: ['timeZone'], message: expect.any(String) }]);
    expect((await request(t.http).get(`/api/venues/${venue.id}`).set(curator.auth)).body.timeZone).toBe('Pacific/Auckland');
  });
});

// Kiritimati (Line Islands, Kiribati) has been at UTC+14 all year since the date line moved east of
// it at the end of 1994, with no daylight saving (tz database, `australasia` file).
describe('Insights days on the venue clock', () => {
  it('counts a visit at 23:30 local time on its local day, far east of UTC (UTC+14)', async () => {
    const { gallery, kiosk } = await venueIn('Pacific/Kiritimati', 'kiritimati');
    // 23:30 on 10 June local is 09:30 UTC that day; 00:30 on 11 June local is 10:30 UTC on 10 June.
    await visitsAt(kiosk.device, ['2026-06-10T09:30:00.000Z', '2026-06-10T10:30:00.000Z']);
    expect(await eventsOn(gallery.id, '2026-06-10')).toBe(1);
    expect(await eventsOn(gallery.id, '2026-06-11')).toBe(1);

    const csv = await request(t.http).get('/api/insights').query({ galleryId: gallery.id, from: '2026-06-10', to: '2026-06-10' }).set('Accept', 'text/csv').set(technician.auth);
    expect(parse(csv.text, { columns: true })).toEqual([expect.objectContaining({ figure: 'language_chosen', count: '1', from_day: '2026-06-10', to_day: '2026-06-10', time_zone: 'Pacific/Kiritimati' })]);
  });

  it("defaults to the 30 days up to the venue's today, which is ahead of UTC's from 10:00 UTC on", async () => {
    const { gallery } = await venueIn('Pacific/Kiritimati', 'kiritimati-today');
    const localToday = new Date(t.clock.now().getTime() + 14 * HOUR_MS).toISOString().slice(0, 10);
    const open = await request(t.http).get('/api/insights').query({ galleryId: gallery.id }).set(curator.auth);
    expect(open.body).toMatchObject({ to: localToday, timeZone: 'Pacific/Kiritimati' });
    expect(Date.parse(open.body.to) - Date.parse(open.body.from)).toBe(29 * 24 * HOUR_MS);
  });

  // New Zealand Daylight Time Order 2007: daylight time (UTC+13) ends at 03:00 on the first Sunday
  // of April and starts at 02:00 on the last Sunday of September. In 2026: Sunday 5 April, which
  // has 25 hours (11:00 UTC on the 4th to 12:00 UTC on the 5th), and Sunday 27 September, which
  // has 23 (12:00 UTC on the 26th to 11:00 UTC on the 27th).
  it('gives the day clocks go back its 25 hours and the day they go forward its 23 (Auckland, 2026)', async () => {
    const { gallery, kiosk } = await venueIn('Pacific/Auckland', 'auckland');
    await visitsAt(kiosk.device, [
      '2026-04-04T10:59:59.999Z', // 23:59:59.999 on Saturday 4 April, NZDT: the day before
      '2026-04-04T11:00:00.000Z', // 00:00 on Sunday 5 April, NZDT: its first moment
      '2026-04-05T11:30:00.000Z', // 23:30 on Sunday 5 April, NZST: 24.5 hours after its start
      '2026-04-05T12:00:00.000Z', // 00:00 on Monday 6 April, NZST: the day after
      '2026-09-26T11:59:59.999Z', // 23:59:59.999 on Saturday 26 September, NZST: the day before
      '2026-09-26T12:00:00.000Z', // 00:00 on Sunday 27 September, NZST
      '2026-09-27T10:30:00.000Z', // 23:30 on Sunday 27 September, NZDT: 22.5 hours after its start
      '2026-09-27T11:00:00.000Z', // 00:00 on Monday 28 September, NZDT: the day after
    ]);
    expect(await eventsOn(gallery.id, '2026-04-05')).toBe(2);
    expect(await eventsOn(gallery.id, '2026-04-04')).toBe(1);
    expect(await eventsOn(gallery.id, '2026-04-06')).toBe(1);
    expect(await eventsOn(gallery.id, '2026-09-27')).toBe(2);
    expect(await eventsOn(gallery.id, '2026-09-26', '2026-09-28')).toBe(4);
  });
});

describe('the audit CSV', () => {
  it("gives an event of a venue its moment on that venue's clock beside the UTC one", async () => {
    const { venue } = await venueIn('Pacific/Kiritimati', 'audit-clock');
    const res = await request(t.http).get('/api/audit').query({ venueId: venue.id, action: 'kiosk.paired' }).set('Accept', 'text/csv').set(admin.auth);
    expect(res.status).toBe(200);
    const [record, ...more] = parse(res.text, { columns: true }) as Record<string, string>[];
    expect(more).toEqual([]);
    // UTC+14 all year (see above): the same instant, fourteen hours on, to the second.
    const local = `${new Date(Date.parse(record!.at!) + 14 * HOUR_MS).toISOString().slice(0, 19)}+14:00`;
    expect(record).toMatchObject({ venue_id: String(venue.id), venue_time_zone: 'Pacific/Kiritimati', at_venue_time: local });
  });
});

describe('licence expiry on the venue clock', () => {
  it("lets an image's licence run to the end of its expiry day at the venue and blocks it from local midnight", async () => {
    const { venue, exhibit } = await venueIn('Pacific/Kiritimati', 'licence');
    // No planned end, so only "in force today" is judged.
    expect((await request(t.http).patch(`/api/exhibits/${exhibit.id}`).set(admin.auth).send({ plannedEnd: null })).status).toBe(200);
    // Today at the venue, and the moment it ends: local midnight at UTC+14 is 10:00 UTC of that same date.
    const expiresOn = new Date(t.clock.now().getTime() + 14 * HOUR_MS).toISOString().slice(0, 10);
    const localMidnight = Date.parse(`${expiresOn}T10:00:00Z`);

    const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 40, g: 90, b: 140 } } }).png().toBuffer();
    const upload = await request(t.http).post('/api/media').set(curator.auth).field('venueId', String(venue.id)).attach('file', png, 'licence-clock.png');
    expect(upload.status, JSON.stringify(upload.body)).toBe(201);
    const mediaId = upload.body[0].id as number;
    expect(await prepareRenditions(t, mediaId)).toBe('ready');
    const details = { credit: 'Map: Basalt Point', licence: { kind: 'spdx', id: 'CC-BY-4.0' }, licenceExpiresOn: expiresOn, alt: { en: 'A map of plate boundaries.' } };
    expect((await request(t.http).patch(`/api/media/${mediaId}`).set(curator.auth).send(details)).status).toBe(200);
    const { storyId } = await storyWithPanels(t, curator.auth, exhibit.id, [imageDoc(mediaId)]);

    const licenceCheck = async () => {
      const auth = bearer((await signIn(t, curator.person.email)).accessToken);
      const res = await request(t.http).get(`/api/stories/${storyId}/preflight`).set(auth);
      expect(res.status).toBe(200);
      return (res.body as PreflightEntry[]).find((entry) => entry.check === 'image-licence-expiry' && (entry.panelId !== undefined || entry.passed));
    };
    t.clock.advance(localMidnight - 60_000 - t.clock.now().getTime());
    expect(await licenceCheck()).toMatchObject({ passed: true });
    // A minute later it is the next day at the venue, while the UTC date is still the expiry date.
    t.clock.advance(60_000);
    expect(new Date(t.clock.now()).toISOString().slice(0, 10)).toBe(expiresOn);
    expect(await licenceCheck()).toMatchObject({ passed: false, message: expect.stringContaining(`ran out on ${expiresOn}`) });
  });
});
