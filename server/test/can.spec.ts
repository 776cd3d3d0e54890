import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CAN_ACTIONS, ROLES, type CanKind, type Role } from '@mantlepiece/shared';
import { paragraphDoc } from './authoring-fixtures.js';
import { approve, approvedGallery, buildRelease, pairedKiosk } from './release-fixtures.js';
import { createReviewApp, member, storyWithPanels, submit, type Headers } from './review-fixtures.js';
import { ROLE_MATRIX } from './role-matrix.js';
import { bearer, createPerson, signIn, type TestApp } from './test-app.js';

/**
 * `can` against the declared role matrix (server/test/role-matrix.ts, written by hand from the
 * brief's roles, not from the policies): for every role on every object kind, an action is offered
 * exactly when the matrix lets the role call its route and the object's state allows it (the
 * workflow of the brief), and every action offered succeeds while every one withheld is refused.
 */

let t: TestApp;
let g: Awaited<ReturnType<typeof approvedGallery>>;
const people = {} as Record<Role, Headers>;

beforeAll(async () => {
  t = await createReviewApp();
  g = await approvedGallery(t, 'can');
  for (const role of ROLES) people[role] = (await member(t, [role])).auth;
  // The gallery's own curator wrote the stories below; "curator" here is a colleague, who may act on them as well.
  people.curator = g.curator.auth;
}, 120_000);
afterAll(() => t.close());

/** Whether the role matrix lets `role` call `route` at all. */
function matrixAllows(route: string, role: Role): boolean {
  const access = ROLE_MATRIX[route];
  if (access === undefined) throw new Error(`the role matrix has no ${route}`);
  return Array.isArray(access) ? access.includes(role) : access === 'signed-in' || access === 'public';
}

/** The answer to an action is a success exactly when `can` said so; a refusal is 403 (role) or 409 (state). */
async function expectOutcome(kind: CanKind, action: string, role: Role, offered: boolean, res: request.Response) {
  const seen = { kind, action, role, succeeded: res.status >= 200 && res.status < 300, refused: res.status === 403 || res.status === 409 };
  expect(seen, `${res.status} ${JSON.stringify(res.body)}`).toEqual({ kind, action, role, succeeded: offered, refused: !offered });
}

const get = async (path: string, who: Headers) => {
  const res = await request(t.http).get(path).set(who);
  if (res.status !== 200) throw new Error(`GET ${path}: expected 200, got ${res.status} ${JSON.stringify(res.body)}`);
  return res.body;
};

const expectCanKeys = (kind: CanKind, can: Record<string, boolean>) => expect(Object.keys(can).sort()).toEqual([...CAN_ACTIONS[kind]].sort());

type StoryState = 'draft' | 'in_review' | 'approved';

/** A story of the gallery's curator in `state`, with one panel. */
async function storyIn(state: StoryState): Promise<number> {
  const { storyId } = await storyWithPanels(t, g.curator.auth, g.exhibit.id, [paragraphDoc('Hot rock rises and cool rock sinks.')]);
  if (state === 'in_review') await submit(t, g.curator.auth, storyId);
  if (state === 'approved') await approve(t, g.curator.auth, g.educator.auth, storyId);
  return storyId;
}

/** The route each story action calls, and how. */
const STORY_ACTIONS: Record<string, { route: string; states: readonly StoryState[]; act: (storyId: number, who: Headers) => Promise<request.Response> }> = {
  edit: {
    route: 'PUT /api/panels/:id',
    states: ['draft'],
    act: async (storyId, who) => {
      const panel = (await get(`/api/stories/${storyId}`, g.curator.auth)).panels[0];
      return request(t.http).put(`/api/panels/${panel.id}`).set(who).send({ doc: paragraphDoc('Hot rock rises; cool rock sinks.'), version: panel.version });
    },
  },
  delete: { route: 'DELETE /api/stories/:id', states: ['draft', 'in_review', 'approved'], act: (id, who) => request(t.http).delete(`/api/stories/${id}`).set(who) },
  submit: { route: 'POST /api/stories/:id/submit', states: ['draft', 'in_review'], act: (id, who) => request(t.http).post(`/api/stories/${id}/submit`).set(who) },
  withdraw: { route: 'POST /api/stories/:id/withdraw', states: ['in_review'], act: (id, who) => request(t.http).post(`/api/stories/${id}/withdraw`).set(who) },
  revise: { route: 'POST /api/stories/:id/revise', states: ['approved'], act: (id, who) => request(t.http).post(`/api/stories/${id}/revise`).set(who) },
  retire: { route: 'POST /api/stories/:id/retire', states: ['approved'], act: (id, who) => request(t.http).post(`/api/stories/${id}/retire`).set(who) },
};

describe('a story’s can', () => {
  for (const state of ['draft', 'in_review', 'approved'] as const) {
    it(`in ${state} offers each role what the role matrix and the workflow allow, and the server agrees`, async () => {
      const shown = await storyIn(state);
      for (const role of ROLES) {
        const { can } = await get(`/api/stories/${shown}`, people[role]);
        expectCanKeys('story', can);
        const listed = (await get(`/api/stories?q=${encodeURIComponent((await get(`/api/stories/${shown}`, people[role])).title)}`, people[role])).items[0];
        expect(listed.can).toEqual(can);
        for (const [action, { route, states, act }] of Object.entries(STORY_ACTIONS)) {
          expect({ state, role, action, can: can[action] }).toEqual({ state, role, action, can: matrixAllows(route, role) && states.includes(state) });
          await expectOutcome('story', action, role, can[action], await act(await storyIn(state), people[role]));
        }
      }
    }, 240_000);
  }

  it('answers a panel edit on a story In review or Approved with 409 naming the state, and the story list offers New story only to curators', async () => {
    const story = await get(`/api/stories/${await storyIn('in_review')}`, g.curator.auth);
    const res = await request(t.http).put(`/api/panels/${story.panels[0].id}`).set(g.curator.auth).send({ doc: paragraphDoc('A typo fixed.'), version: story.panels[0].version });
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ statusCode: 409, message: expect.stringMatching(/In review.*Withdraw/), errors: [{ path: ['state'] }] });
    const renamed = await request(t.http).patch(`/api/stories/${story.id}`).set(g.curator.auth).send({ title: 'Renamed in review' });
    expect(renamed.status).toBe(409);
    for (const role of ROLES) {
      const { can } = await get('/api/stories?pageSize=1', people[role]);
      expect({ role, can }).toEqual({ role, can: { create: matrixAllows('POST /api/stories', role), review: matrixAllows('GET /api/reviews/queue', role) } });
      const created = await request(t.http).post('/api/stories').set(people[role]).send({ title: `Made by ${role}`, venueId: g.venue.id });
      await expectOutcome('stories', 'create', role, can.create, created);
    }
  });
});

describe('a revision’s and a comment’s can', () => {
  it('offers verdicts to educators other than the author on the open revision only, and comments to curators and educators', async () => {
    for (const role of ROLES) {
      const storyId = await storyIn('in_review');
      const { revisionId } = await submit(t, g.curator.auth, storyId);
      const revision = await get(`/api/revisions/${revisionId}`, people[role]);
      expectCanKeys('revision', revision.can);
      expect({ role, can: revision.can }).toEqual({
        role,
        can: { approve: matrixAllows('POST /api/revisions/:id/reviews', role), requestChanges: matrixAllows('POST /api/revisions/:id/reviews', role), comment: matrixAllows('POST /api/revisions/:id/comments', role) },
      });
      const comment = await request(t.http).post(`/api/revisions/${revisionId}/comments`).set(people[role]).send({ body: `A note from a ${role}.` });
      await expectOutcome('revision', 'comment', role, revision.can.comment, comment);
      await expectOutcome('revision', 'requestChanges', role, revision.can.requestChanges,
        await request(t.http).post(`/api/revisions/${revisionId}/reviews`).set(people[role]).send({ verdict: 'request_changes', note: 'Name the plates.' }));

      // Once closed, a revision takes no verdict from anyone.
      const closed = await get(`/api/revisions/${revisionId}`, people.educator);
      if (revision.can.requestChanges) expect(closed.can).toMatchObject({ approve: false, requestChanges: false });

      const { revisionId: next } = await submit(t, g.curator.auth, await storyIn('draft'));
      const open = await get(`/api/revisions/${next}`, people[role]);
      await expectOutcome('revision', 'approve', role, open.can.approve, await request(t.http).post(`/api/revisions/${next}/reviews`).set(people[role]).send({ verdict: 'approve' }));

      const thread = (await request(t.http).post(`/api/revisions/${next}/comments`).set(g.educator.auth).send({ body: 'Which plates?' })).body;
      const { comments } = await get(`/api/revisions/${next}`, people[role]);
      const shown = comments.find((c: { id: number }) => c.id === thread.id);
      expectCanKeys('comment', shown.can);
      // An educator's comment is resolved by its author or a reviewer of the revision, not by any commenter (issue 13).
      const reviewer = matrixAllows('POST /api/revisions/:id/reviews', role);
      expect({ role, can: shown.can }).toEqual({ role, can: { reply: matrixAllows('POST /api/revisions/:id/comments', role), resolve: matrixAllows('PATCH /api/comments/:id', role) && reviewer } });
      await expectOutcome('comment', 'reply', role, shown.can.reply, await request(t.http).post(`/api/revisions/${next}/comments`).set(people[role]).send({ body: 'These two.', parentId: thread.id }));
      await expectOutcome('comment', 'resolve', role, shown.can.resolve, await request(t.http).patch(`/api/comments/${thread.id}`).set(people[role]).send({ resolved: true }));
    }
  }, 240_000);

  it('withholds approval from the revision’s own author, who is also an educator', async () => {
    const both = await member(t, ['curator', 'educator']);
    const { storyId } = await storyWithPanels(t, both.auth, g.exhibit.id);
    const { revisionId } = await submit(t, both.auth, storyId);
    const { can } = await get(`/api/revisions/${revisionId}`, both.auth);
    expect(can).toEqual({ approve: false, requestChanges: true, comment: true });
    await expectOutcome('revision', 'approve', 'educator', false, await request(t.http).post(`/api/revisions/${revisionId}/reviews`).set(both.auth).send({ verdict: 'approve' }));
  });
});

describe('media, release, station and kiosk can', () => {
  it('offers uploads and changes to the media library’s keepers, and no delete of an image a panel shows', async () => {
    for (const role of ROLES) {
      const library = await get('/api/media?pageSize=1', people[role]);
      expect({ role, can: library.can }).toEqual({ role, can: { upload: matrixAllows('POST /api/media', role) } });
      const used = await get(`/api/media/${g.imageId}`, people[role]);
      expectCanKeys('media', used.can);
      expect({ role, can: used.can }).toEqual({ role, can: { edit: matrixAllows('PATCH /api/media/:id', role), delete: false } });
      await expectOutcome('media', 'delete', role, false, await request(t.http).delete(`/api/media/${g.imageId}`).set(people[role]));
      await expectOutcome('media', 'edit', role, used.can.edit, await request(t.http).patch(`/api/media/${g.imageId}`).set(people[role]).send({ credit: 'Drawing: Tomás Reyes' }));
    }
  });

  it('offers publishing a Ready release, and building one, to technicians and admins', async () => {
    for (const role of ROLES) {
      // Approving again makes each role's release differ from the Live one.
      await approve(t, g.curator.auth, g.educator.auth, g.story.storyId);
      const release = await buildRelease(t, g.technician.auth, g.gallery.id);
      const { can } = await get(`/api/releases/${release.id}`, people[role]);
      expectCanKeys('release', can);
      expect({ role, can }).toEqual({ role, can: { publish: matrixAllows('POST /api/releases/:id/publish', role) } });
      const list = await get(`/api/galleries/${g.gallery.id}/releases?pageSize=1`, people[role]);
      expect({ role, can: list.can }).toEqual({ role, can: { build: matrixAllows('POST /api/galleries/:id/releases', role) } });
      expect(list.items[0].can).toEqual(can);
      await expectOutcome('release', 'publish', role, can.publish, await request(t.http).post(`/api/releases/${release.id}/publish`).set(people[role]));
      const live = await get(`/api/releases/${release.id}`, people[role]);
      if (can.publish) expect(live.can).toEqual({ publish: false });
    }
  }, 240_000);

  it('offers pairing at a station to the fleet’s keepers and changing it to admins; revoking a kiosk once', async () => {
    for (const [index, role] of ROLES.entries()) {
      const { station, credential } = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
      const shown = await get(`/api/stations/${station.id}`, people[role]);
      expectCanKeys('station', shown.can);
      expect({ role, can: shown.can }).toEqual({ role, can: { pair: matrixAllows('POST /api/stations/:id/pair', role), edit: matrixAllows('PATCH /api/stations/:id', role) } });
      if (!matrixAllows('GET /api/kiosks/:id', role)) {
        await expectOutcome('kiosk', 'revoke', role, false, await request(t.http).post(`/api/kiosks/${credential.kioskId}/revoke`).set(people[role]));
      } else {
        const kiosk = await get(`/api/kiosks/${credential.kioskId}`, people[role]);
        expectCanKeys('kiosk', kiosk.can);
        expect({ role, can: kiosk.can }).toEqual({ role, can: { revoke: matrixAllows('POST /api/kiosks/:id/revoke', role) } });
        await expectOutcome('kiosk', 'revoke', role, kiosk.can.revoke, await request(t.http).post(`/api/kiosks/${credential.kioskId}/revoke`).set(people[role]));
        // Revoked once, a kiosk offers no second revoke, and the server refuses one.
        const revoked = await get(`/api/kiosks/${credential.kioskId}`, people[role]);
        expect(revoked.can).toEqual({ revoke: false });
        await expectOutcome('kiosk', 'revoke', role, false, await request(t.http).post(`/api/kiosks/${credential.kioskId}/revoke`).set(people[role]));
      }
      await expectOutcome('station', 'edit', role, shown.can.edit, await request(t.http).patch(`/api/stations/${station.id}`).set(people[role]).send({ name: `Station renamed ${index}` }));
      const started = (await request(t.http).post('/api/kiosk/pair/start').set({ 'X-Forwarded-For': `2001:db8:ca17::${index + 1}` })).body;
      await expectOutcome('station', 'pair', role, shown.can.pair, await request(t.http).post(`/api/stations/${station.id}/pair`).set(people[role]).send({ pairingCode: started.pairingCode }));
    }
  }, 240_000);
});

describe('a translation target’s can', () => {
  /** The route each translation action calls, and how; `xliff` is a file of the story in French to import. */
  const TRANSLATION_ACTIONS: Record<string, { route: string; act: (storyId: number, who: Headers, xliff: string) => Promise<request.Response> }> = {
    translate: {
      route: 'PUT /api/stories/:id/translations/:locale/units/:unitId',
      act: async (storyId, who) => {
        const [unit] = (await get(`/api/stories/${storyId}/translations/fr/units?pageSize=1`, g.curator.auth)).items;
        return request(t.http).put(`/api/stories/${storyId}/translations/fr/units/${unit.unitId}`).set(who).send({ text: 'La roche chaude monte.', version: unit.version });
      },
    },
    export: { route: 'GET /api/stories/:id/translations/:locale/xliff', act: (storyId, who) => request(t.http).get(`/api/stories/${storyId}/translations/fr/xliff`).set(who) },
    import: {
      route: 'PUT /api/stories/:id/translations/:locale/xliff',
      act: (storyId, who, xliff) => request(t.http).put(`/api/stories/${storyId}/translations/fr/xliff`).set(who).set('Content-Type', 'application/xliff+xml').send(xliff),
    },
  };

  it('offers translating and importing into French to a translator of French only, and the download to every reader of French', async () => {
    // The venue's target locale is French; a translator works only in locales they were given.
    const translator = await createPerson(t, { roles: ['translator'], locales: ['fr'] });
    const readers: Record<Role, Headers> = { ...people, translator: bearer((await signIn(t, translator.email)).accessToken) };
    for (const role of ROLES) {
      const storyId = await storyIn('draft');
      const xliff = (await request(t.http).get(`/api/stories/${storyId}/translations/fr/xliff`).set(g.curator.auth)).text;
      const reads = matrixAllows('GET /api/stories/:id/translations', role);
      const expected = Object.fromEntries(Object.entries(TRANSLATION_ACTIONS).map(([action, { route }]) => [action, matrixAllows(route, role)]));
      let can = { translate: false, import: false, export: false } as Record<string, boolean>;
      if (reads) {
        const [target] = await get(`/api/stories/${storyId}/translations`, readers[role]);
        expectCanKeys('translation', target.can);
        can = target.can;
        expect({ role, locale: target.locale, can }).toEqual({ role, locale: 'fr', can: expected });
        expect((await get(`/api/stories/${storyId}/translations/fr/units?pageSize=1`, readers[role])).can).toEqual(can);
        const title = (await get(`/api/stories/${storyId}`, g.curator.auth)).title;
        const worklist = await get(`/api/translations/stories?q=${encodeURIComponent(title)}`, readers[role]);
        expect({ role, list: worklist.can, item: worklist.items[0]?.can, offersFrench: worklist.locales.includes('fr') }).toEqual({ role, list: { translate: role === 'translator' }, item: can, offersFrench: true });
      } else {
        expect((await request(t.http).get(`/api/stories/${storyId}/translations`).set(readers[role])).status).toBe(403);
      }
      for (const [action, { act }] of Object.entries(TRANSLATION_ACTIONS)) {
        await expectOutcome('translation', action, role, can[action]!, await act(storyId, readers[role], xliff));
      }
    }
  }, 240_000);

  it('offers nothing in French to a translator of Spanish only, and the server refuses them', async () => {
    const spanish = await createPerson(t, { roles: ['translator'], locales: ['es'] });
    const auth = bearer((await signIn(t, spanish.email)).accessToken);
    const storyId = await storyIn('draft');
    expect(await get(`/api/stories/${storyId}/translations`, auth)).toEqual([]);
    const worklist = await get('/api/translations/stories', auth);
    expect({ can: worklist.can, offersFrench: worklist.locales.includes('fr') }).toEqual({ can: { translate: true }, offersFrench: false });
    await expectOutcome('translation', 'translate', 'translator', false, await TRANSLATION_ACTIONS.translate!.act(storyId, auth, ''));
  });
});

describe('the OpenAPI document', () => {
  it('describes the `can` each route answers with, action by action, as the answers carry it', async () => {
    const docs = (await request(t.http).get('/api/docs-json')).body;
    type Schema = Record<string, unknown> & { $ref?: string; allOf?: Schema[]; properties?: Record<string, Schema>; items?: Schema; required?: string[] };
    const resolve = (schema: Schema | undefined): Schema | undefined => {
      if (schema?.$ref) return resolve(docs.components.schemas[schema.$ref.split('/').pop()!]);
      return schema?.allOf?.length === 1 ? resolve(schema.allOf[0]) : schema;
    };
    /** The schema `steps` down from a route's success answer (`[]` an array's items), following each reference on the way. */
    const described = (path: string, method: string, ...steps: string[]) => {
      const responses = docs.paths[path]?.[method]?.responses ?? {};
      let schema = resolve((responses['200'] ?? responses['201'])?.content?.['application/json']?.schema);
      for (const step of steps) schema = resolve(step === '[]' ? schema?.items : schema?.properties?.[step]);
      return schema;
    };
    const canOf = (path: string, method: string, ...steps: string[]) => described(path, method, ...steps, 'can')?.required;
    expect(canOf('/api/stories/{id}', 'get')?.sort()).toEqual(Object.keys((await get(`/api/stories/${g.story.storyId}`, people.curator)).can).sort());
    expect(canOf('/api/stories', 'get')?.sort()).toEqual(Object.keys((await get('/api/stories?pageSize=1', people.curator)).can).sort());
    const shown = await get(`/api/revisions/${g.revisionId}`, people.curator);
    expect(canOf('/api/revisions/{id}', 'get')?.sort()).toEqual(Object.keys(shown.can).sort());
    expect(canOf('/api/revisions/{id}', 'get', 'comments', '[]')?.sort()).toEqual([...CAN_ACTIONS.comment].sort());
    expect({ list: canOf('/api/translations/stories', 'get')?.sort(), item: canOf('/api/translations/stories', 'get', 'items', '[]')?.sort() })
      .toEqual({ list: [...CAN_ACTIONS.translations].sort(), item: [...CAN_ACTIONS.translation].sort() });
    expect(canOf('/api/stories/{id}/translations', 'get', '[]')?.sort()).toEqual([...CAN_ACTIONS.translation].sort());
    for (const [path, method] of [['/api/stories/{id}/translations/{locale}/units', 'get'], ['/api/media/{id}', 'get'], ['/api/releases/{id}', 'get'], ['/api/stations/{id}', 'get'], ['/api/kiosks/{id}', 'get'], ['/api/comments/{id}', 'patch']]) {
      expect({ path, can: described(path!, method!, 'can')?.type }).toEqual({ path, can: 'object' });
    }
  });
});
