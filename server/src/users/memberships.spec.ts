import { getModelToken } from '@nestjs/sequelize';
import { randomBytes } from 'node:crypto';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import type { UserView } from '@mantlepiece/shared';
import { AuditEvent } from '../audit/models/audit-event.model.js';
import { Venue } from '../venues/models/venue.model.js';
import { bearer, createPerson, createTestApp, linkTokenMailedTo, signIn, uniqueEmail } from '../../test/test-app.js';
import { memberAt } from '../../test/venue-fixtures.js';
import { VenueMembership } from './models/venue-membership.model.js';

const t = await createTestApp();
afterAll(() => t.close());

/** This suite's own venues and people, tagged so the People list can be read whatever else is in the table. */
const tag = `Vm${randomBytes(3).toString('hex')}`;
const newVenue = (name: string) =>
  t.app.get<typeof Venue>(getModelToken(Venue)).create({ name: `${tag} ${name}`, slug: `${tag}-${name}`.toLowerCase(), sourceLocale: 'en', targetLocales: ['fr'] });
const [north, south] = [await newVenue('North'), await newVenue('South')];

const orgAdmin = await createPerson(t, { roles: ['admin'], name: `${tag} Org Admin` });
const asOrgAdmin = bearer((await signIn(t, orgAdmin.email)).accessToken);
const named = async (name: string, venueId: number, roles: VenueMembership['roles']) => {
  const member = await memberAt(t, venueId, roles, []);
  await member.user.update({ name: `${tag} ${name}` });
  return member;
};
const northAdmin = await named('North Admin', north.id, ['admin']);
const northCurator = await named('North Curator', north.id, ['curator']);
const southCurator = await named('South Curator', south.id, ['curator']);
/** Educator at both venues: the North admin may see them, but not their South membership. */
const bothEducator = await named('Both Educator', north.id, ['educator']);
await memberAt(t, south.id, ['educator'], [], bothEducator.user);

const memberships = t.app.get<typeof VenueMembership>(getModelToken(VenueMembership));
const auditOf = async (id: number) =>
  (await t.app.get<typeof AuditEvent>(getModelToken(AuditEvent)).findAll({ where: { targetType: 'user', targetId: String(id) }, order: [['id', 'ASC']] }))
    .map((e) => ({ action: e.action, actorId: e.actorId, venueId: e.venueId, detail: e.detail }));
const put = (headers: Record<string, string>, userId: number, venueId: number, body: object) =>
  request(t.http).put(`/api/users/${userId}/memberships/${venueId}`).set(headers).send(body);
const names = (res: request.Response) => (res.body.items as UserView[]).map((u) => u.name.replace(`${tag} `, '')).sort();

describe('PUT and DELETE /api/users/:id/memberships/:venueId by the organisation admin', () => {
  it('grants, changes and ends a membership, recording each change with its venue', async () => {
    const person = await createPerson(t, { roles: [], name: `${tag} Newcomer` });
    const granted = await put(asOrgAdmin, person.id, south.id, { roles: ['translator'], locales: ['pt-br'] });
    expect({ status: granted.status, memberships: granted.body.memberships })
      .toEqual({ status: 200, memberships: [{ venueId: south.id, roles: ['translator'], locales: ['pt-BR'] }] });

    const changed = await put(asOrgAdmin, person.id, south.id, { roles: ['translator', 'educator'], locales: ['pt-BR'] });
    expect(changed.body.memberships).toEqual([{ venueId: south.id, roles: ['translator', 'educator'], locales: ['pt-BR'] }]);

    const ended = await request(t.http).delete(`/api/users/${person.id}/memberships/${south.id}`).set(asOrgAdmin);
    expect({ status: ended.status, memberships: ended.body.memberships }).toEqual({ status: 200, memberships: [] });
    expect(await memberships.count({ where: { userId: person.id } })).toBe(0);

    expect(await auditOf(person.id)).toEqual([
      { action: 'user.roles-changed', actorId: orgAdmin.id, venueId: south.id, detail: { from: [], to: ['translator'] } },
      { action: 'user.locales-changed', actorId: orgAdmin.id, venueId: south.id, detail: { from: [], to: ['pt-BR'] } },
      { action: 'user.roles-changed', actorId: orgAdmin.id, venueId: south.id, detail: { from: ['translator'], to: ['translator', 'educator'] } },
      { action: 'user.roles-changed', actorId: orgAdmin.id, venueId: south.id, detail: { from: ['translator', 'educator'], to: [] } },
      { action: 'user.locales-changed', actorId: orgAdmin.id, venueId: south.id, detail: { from: ['pt-BR'], to: [] } },
    ]);
  });

  it('answers 404 for an unknown person or venue, 400 for ids that are not numbers or an empty role list', async () => {
    expect((await put(asOrgAdmin, 999_999_999, north.id, { roles: ['curator'], locales: [] })).status).toBe(404);
    const noVenue = await put(asOrgAdmin, northCurator.user.id, 999_999_999, { roles: ['curator'], locales: [] });
    expect({ status: noVenue.status, message: noVenue.body.message }).toEqual({ status: 404, message: 'There is no such venue.' });
    expect((await request(t.http).delete(`/api/users/abc/memberships/${north.id}`).set(asOrgAdmin)).status).toBe(400);
    const empty = await put(asOrgAdmin, northCurator.user.id, north.id, { roles: [], locales: [] });
    expect({ status: empty.status, paths: empty.body.errors.map((e: { path: string[] }) => e.path[0]) }).toEqual({ status: 400, paths: ['roles'] });
  });

  it('keeps one membership row when many changes to it arrive at once, each answered', async () => {
    const person = await createPerson(t, { roles: [], name: `${tag} Busy` });
    const choices = [['curator'], ['educator'], ['curator', 'educator'], ['technician'], ['translator'], ['admin'], ['educator', 'technician'], ['curator']];
    const answers = await Promise.all(choices.map((roles) => put(asOrgAdmin, person.id, north.id, { roles, locales: [] })));
    expect(answers.map((res) => res.status)).toEqual(choices.map(() => 200));
    const rows = await memberships.findAll({ where: { userId: person.id } });
    expect(rows).toHaveLength(1);
    // Each change saw the one before it: the audit trail chains from nothing to the row's roles.
    const trail = (await auditOf(person.id)).filter((e) => e.action === 'user.roles-changed').map((e) => e.detail as { from: string[]; to: string[] });
    expect(trail[0]!.from).toEqual([]);
    trail.slice(1).forEach((step, i) => expect(step.from).toEqual(trail[i]!.to));
    expect(trail.at(-1)!.to).toEqual(rows[0]!.roles);
  });

  it('is the only one who changes roles held at every venue, and may narrow a person to their memberships', async () => {
    const person = await createPerson(t, { roles: ['curator'], name: `${tag} Narrowed` });
    await put(asOrgAdmin, person.id, north.id, { roles: ['curator'], locales: [] });
    const narrowed = await request(t.http).patch(`/api/users/${person.id}`).set(asOrgAdmin).send({ roles: [] });
    expect({ status: narrowed.status, roles: narrowed.body.roles, memberships: narrowed.body.memberships })
      .toEqual({ status: 200, roles: [], memberships: [{ venueId: north.id, roles: ['curator'], locales: [] }] });
    expect((await request(t.http).patch(`/api/users/${person.id}`).set(northAdmin.headers).send({ roles: ['curator'] })).status).toBe(403);
  });
});

describe('a venue admin', () => {
  const listAs = (headers: Record<string, string>, query = '') => request(t.http).get(`/api/users?q=${tag}&pageSize=100${query}`).set(headers);

  it('lists the members of their venues only, with their venues\' memberships only, and counts no one else', async () => {
    const res = await listAs(northAdmin.headers);
    expect(res.status).toBe(200);
    expect(names(res)).toEqual(expect.arrayContaining(['Both Educator', 'North Admin', 'North Curator']));
    expect(names(res)).not.toEqual(expect.arrayContaining(['South Curator']));
    expect(names(res)).not.toContain('Org Admin');
    expect(res.body.total).toBe(res.body.items.length);
    const both = (res.body.items as UserView[]).find((u) => u.id === bothEducator.user.id)!;
    expect(both.memberships).toEqual([{ venueId: north.id, roles: ['educator'], locales: [] }]);

    expect(names(await listAs(northAdmin.headers, '&role=curator'))).not.toContain('South Curator');
    expect((await listAs(northAdmin.headers, `&venueId=${south.id}`)).body).toMatchObject({ total: 0, items: [] });
    // The organisation admin sees both venues' people, and a person's every membership.
    const all = await listAs(asOrgAdmin, `&role=curator&venueId=${south.id}`);
    expect(names(all)).toContain('South Curator');
    expect(names(all)).not.toContain('North Curator');
  });

  it('manages memberships at their venue, and another venue\'s person or venue answers 404', async () => {
    const granted = await put(northAdmin.headers, northCurator.user.id, north.id, { roles: ['curator', 'educator'], locales: [] });
    expect({ status: granted.status, memberships: granted.body.memberships })
      .toEqual({ status: 200, memberships: [{ venueId: north.id, roles: ['curator', 'educator'], locales: [] }] });

    const otherPerson = await put(northAdmin.headers, southCurator.user.id, north.id, { roles: ['curator'], locales: [] });
    expect({ status: otherPerson.status, message: otherPerson.body.message }).toEqual({ status: 404, message: 'There is no such person.' });
    const unknownPerson = await put(northAdmin.headers, 999_999_999, north.id, { roles: ['curator'], locales: [] });
    expect(unknownPerson.body).toEqual(otherPerson.body);
    expect((await request(t.http).patch(`/api/users/${southCurator.user.id}`).set(northAdmin.headers).send({ active: false })).status).toBe(404);

    const otherVenue = await put(northAdmin.headers, bothEducator.user.id, south.id, { roles: ['curator'], locales: [] });
    expect({ status: otherVenue.status, message: otherVenue.body.message }).toEqual({ status: 404, message: 'There is no such venue.' });
    expect((await request(t.http).delete(`/api/users/${bothEducator.user.id}/memberships/${south.id}`).set(northAdmin.headers)).status).toBe(404);
    expect(await memberships.count({ where: { userId: bothEducator.user.id } })).toBe(2);
  });

  it('deactivates someone who works at their venues alone, not someone who also works elsewhere', async () => {
    const only = await named('North Only', north.id, ['technician']);
    expect((await request(t.http).patch(`/api/users/${only.user.id}`).set(northAdmin.headers).send({ active: false })).body).toMatchObject({ active: false });
    const elsewhere = await request(t.http).patch(`/api/users/${bothEducator.user.id}`).set(northAdmin.headers).send({ active: false });
    expect(elsewhere.status).toBe(403);
    expect((await request(t.http).patch(`/api/users/${only.user.id}`).set(northAdmin.headers).send({ locales: ['fr'] })).status).toBe(403);
  });

  it('cannot remove their own admin access at their venue', async () => {
    const me = northAdmin.user.id;
    expect((await put(northAdmin.headers, me, north.id, { roles: ['curator'], locales: [] })).status).toBe(409);
    expect((await request(t.http).delete(`/api/users/${me}/memberships/${north.id}`).set(northAdmin.headers)).status).toBe(409);
    expect((await request(t.http).patch(`/api/users/${me}`).set(northAdmin.headers).send({ active: false })).status).toBe(409);
    expect((await put(northAdmin.headers, me, north.id, { roles: ['admin', 'curator'], locales: [] })).status).toBe(200);
  });

  it('invites to their venue, and the accepted invitation is a membership there only', async () => {
    const email = uniqueEmail('venue-invite');
    const invited = await request(t.http).post('/api/users/invitations').set(northAdmin.headers)
      .send({ email, name: 'Ana Lucía Torres', roles: ['translator'], locales: ['es'] });
    expect({ status: invited.status, venueId: invited.body.venueId }).toEqual({ status: 201, venueId: north.id });
    const token = await linkTokenMailedTo(t, email, 'invitation');
    const accepted = await request(t.http).post('/api/auth/invitations/accept').send({ token, name: 'Ana Lucía Torres', password: 'a long enough password' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.user).toMatchObject({ roles: [], locales: [], memberships: [{ venueId: north.id, roles: ['translator'], locales: ['es'] }] });

    const elsewhere = await request(t.http).post('/api/users/invitations').set(northAdmin.headers)
      .send({ email: uniqueEmail('venue-invite'), name: 'Elsewhere', roles: ['curator'], locales: [], venueId: south.id });
    expect({ status: elsewhere.status, paths: elsewhere.body.errors?.map((e: { path: string[] }) => e.path[0]) }).toEqual({ status: 422, paths: ['venueId'] });
  });

  it('invites to the venue the organisation admin names, or, naming none, to every venue', async () => {
    const email = uniqueEmail('org-invite');
    const invited = await request(t.http).post('/api/users/invitations').set(asOrgAdmin)
      .send({ email, name: 'Kofi Mensah', roles: ['educator'], locales: [], venueId: south.id });
    expect(invited.body.venueId).toBe(south.id);
    const token = await linkTokenMailedTo(t, email, 'invitation');
    const accepted = await request(t.http).post('/api/auth/invitations/accept').send({ token, name: 'Kofi Mensah', password: 'a long enough password' });
    expect(accepted.body.user).toMatchObject({ roles: [], memberships: [{ venueId: south.id, roles: ['educator'], locales: [] }] });
    const wide = await request(t.http).post('/api/users/invitations').set(asOrgAdmin)
      .send({ email: uniqueEmail('org-invite'), name: 'Wide', roles: ['curator'], locales: [] });
    expect({ status: wide.status, venueId: wide.body.venueId }).toEqual({ status: 201, venueId: null });
  });
});
