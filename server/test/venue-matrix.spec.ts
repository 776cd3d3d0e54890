import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '@mantlepiece/shared';
import { approvedGallery, buildRelease, pairedKiosk, publish } from './release-fixtures.js';
import { storyWithPanels, submit, createReviewApp, type Headers } from './review-fixtures.js';
import { ROLE_MATRIX, venueReach, type VenueObject } from './role-matrix.js';
import type { TestApp } from './test-app.js';
import { memberAt } from './venue-fixtures.js';

/**
 * The role matrix with a second venue: every route, called by a person of each role who belongs to
 * one venue only, about their own venue's objects and about another venue's. Another venue's object
 * must answer exactly as a missing one (status and body: its existence is not revealed), a list must
 * not show another venue's rows, and the organisation's routes refuse a venue admin.
 */

let t: TestApp;
/** The id of one object of each kind at the caller's venue (`own`) and at the other venue (`other`). */
const objects: Record<'own' | 'other', Record<VenueObject, number>> = { own: {} as never, other: {} as never };
/** Words only the other venue's rows carry: a list that shows one of them leaks. */
let otherVenueMarks: string[] = [];
const callers = {} as Record<Role, Headers>;
const MISSING_ID = 2147483647;

async function venueWorld(label: string): Promise<Record<VenueObject, number>> {
  const world = await approvedGallery(t, label);
  const release = await buildRelease(t, world.technician.auth, world.gallery.id);
  await publish(t, world.technician.auth, release.id);
  const kiosk = await pairedKiosk(t, world.admin, world.technician.auth, world.gallery.id);
  // A second story under review, so there is an open revision to comment on.
  const talk = await storyWithPanels(t, world.curator.auth, world.exhibit.id);
  const { revisionId } = await submit(t, world.curator.auth, talk.storyId);
  const comment = await request(t.http).post(`/api/revisions/${revisionId}/comments`).set(world.educator.auth)
    .send({ panelId: talk.panelIds[0], range: { from: 0, to: 8, quote: 'Hot rock' }, body: `Question at ${label}` }).expect(201);
  const person = await memberAt(t, world.venue.id, ['curator']);
  return {
    venue: world.venue.id, gallery: world.gallery.id, station: kiosk.station.id, exhibit: world.exhibit.id,
    story: world.story.storyId, panel: world.story.panelIds[0]!, media: world.imageId, revision: world.revisionId,
    comment: comment.body.id, release: release.id, kiosk: kiosk.credential.kioskId, person: person.user.id,
  };
}

beforeAll(async () => {
  t = await createReviewApp();
  const label = `far-${Math.random().toString(36).slice(2, 8)}`;
  objects.own = await venueWorld(`near-${Math.random().toString(36).slice(2, 8)}`);
  objects.other = await venueWorld(label);
  otherVenueMarks = [label, `Question at ${label}`];
  for (const role of ROLES) callers[role] = (await memberAt(t, objects.own.venue, [role], role === 'translator' ? ['fr'] : [])).headers;
}, 120_000);
afterAll(() => t?.close());

/** The path with its object named by `id`, and any other parameter fixed. */
function pathOf(route: string, id: number | string): string {
  return route.split(' ')[1]!
    .replace(/:(id|storyId)\b/, String(id))
    .replace(':locale', 'fr')
    .replace(/:\w+/g, 'x');
}

function call(route: string, caller: Headers, id: number | string) {
  const method = route.split(' ')[0]!.toLowerCase() as 'get';
  const req = request(t.http)[method](pathOf(route, id)).set(caller);
  return method === 'get' ? req : req.send({});
}

const allows = (route: string, role: Role) => {
  const access = ROLE_MATRIX[route]!;
  return typeof access !== 'string' && access.includes(role);
};

const answer = (res: request.Response) => ({ status: res.status, body: res.body });

const routes = Object.keys(ROLE_MATRIX).filter((route) => venueReach(route) !== 'any venue');

describe('role matrix with a second venue', () => {
  describe.each(routes)('%s', (route) => {
    const reach = venueReach(route);

    it.each([...ROLES])('called by a member of one venue holding %s', async (role) => {
      const caller = callers[role];
      if (!allows(route, role) || reach === 'organisation') {
        expect({ role, status: (await call(route, caller, objects.own[reach as VenueObject] ?? 1)).status }).toEqual({ role, status: 403 });
        return;
      }
      if (reach === 'own venues') {
        const res = await call(route, caller, 1);
        expect(res.status).toBeLessThan(500);
        if (route.startsWith('GET ')) {
          const text = JSON.stringify(res.body);
          expect(otherVenueMarks.filter((mark) => text.includes(mark))).toEqual([]);
        }
        return;
      }
      const kind = reach as VenueObject; // 'any venue' routes are not walked
      const missing = answer(await call(route, caller, MISSING_ID));
      // Deleting the own venue's object would take it from the routes after this one; a delete
      // of one's own is each feature suite's business, a delete of another venue's is checked here.
      if (!route.startsWith('DELETE ')) {
        const own = answer(await call(route, caller, objects.own[kind]));
        // The route found the object: refused for its input or state perhaps, never as missing or forbidden.
        expect({ role, own: own.status >= 500 || [401, 403].includes(own.status) ? own : 'reached' }).toEqual({ role, own: 'reached' });
        if (own.status === 404) expect(own.body).not.toEqual(missing.body);
      }
      const other = answer(await call(route, caller, objects.other[kind]));
      expect({ role, other }).toEqual({ role, other: missing });
    });
  });
});
