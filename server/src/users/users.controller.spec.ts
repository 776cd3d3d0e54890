import { getModelToken } from '@nestjs/sequelize';
import { randomBytes } from 'node:crypto';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../audit/models/audit-event.model.js';
import { bearer, createPerson, createTestApp, signIn } from '../../test/test-app.js';

const t = await createTestApp();
afterAll(() => t.close());
const admin = await createPerson(t, { roles: ['admin'], name: 'Aiyana Redcloud' });
const { accessToken } = await signIn(t, admin.email);

/** A name part only this suite's people share, so the list can be read whatever else is in the table. */
const tag = `Zx${randomBytes(3).toString('hex')}`;
const people = [
  await createPerson(t, { roles: ['curator'], name: `${tag} Bianca` }),
  await createPerson(t, { roles: ['translator'], locales: ['fr'], name: `${tag} Aurelio` }),
  await createPerson(t, { roles: ['curator', 'educator'], name: `${tag} Cyril`, active: false }),
];

const list = (query: string) => request(t.http).get(`/api/users?q=${tag}&${query}`).set(bearer(accessToken));
const names = (res: request.Response) => res.body.items.map((u: { name: string }) => u.name.replace(`${tag} `, ''));

describe('GET /api/users', () => {
  it('pages and sorts in the database', async () => {
    const first = await list('sort=name&pageSize=2&page=1');
    expect(first.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    expect(names(first)).toEqual(['Aurelio', 'Bianca']);
    expect(names(await list('sort=name&pageSize=2&page=2'))).toEqual(['Cyril']);
    expect(names(await list('sort=-name'))).toEqual(['Cyril', 'Bianca', 'Aurelio']);
  });

  it('filters by role, by active, and by part of the e-mail address', async () => {
    expect(names(await list('role=curator&sort=name'))).toEqual(['Bianca', 'Cyril']);
    expect(names(await list('role=curator&active=true'))).toEqual(['Bianca']);
    expect(names(await list('active=false'))).toEqual(['Cyril']);
    const byEmail = await request(t.http).get(`/api/users?q=${encodeURIComponent(people[1]!.email)}`).set(bearer(accessToken));
    expect(byEmail.body.items.map((u: { id: number }) => u.id)).toEqual([people[1]!.id]);
  });

  it('treats % and _ in the search as plain characters', async () => {
    // Scoped to this suite's tag, so people other suites made (hostile names included) do not count.
    const total = async (q: string) => (await request(t.http).get(`/api/users?q=${encodeURIComponent(q)}`).set(bearer(accessToken))).body.total;
    expect({ plain: await total(tag), percent: await total(`${tag}%`), underscore: await total(`${tag.slice(0, -1)}_`) })
      .toEqual({ plain: await total(tag), percent: 0, underscore: 0 });
    expect(await total(tag)).toBeGreaterThan(0);
  });

  it('refuses an unknown sort, role or page size with 400 naming the field', async () => {
    const res = await request(t.http).get('/api/users?sort=passwordHash&role=wizard&pageSize=1000').set(bearer(accessToken));
    expect(res.status).toBe(400);
    expect(res.body.errors.map((e: { path: string[] }) => e.path[0]).sort()).toEqual(['pageSize', 'role', 'sort']);
  });
});

describe('POST /api/users/invitations', () => {
  it('answers 409 for an address that already has an account', async () => {
    const res = await request(t.http).post('/api/users/invitations').set(bearer(accessToken))
      .send({ email: people[0]!.email.toUpperCase(), name: 'Again', roles: ['curator'], locales: [] });
    expect(res.status).toBe(409);
  });

  it('refuses unknown roles and locales that are not BCP 47 tags', async () => {
    const res = await request(t.http).post('/api/users/invitations').set(bearer(accessToken))
      .send({ email: 'new@suite.test', name: 'New', roles: ['wizard'], locales: ['French!'] });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual(expect.arrayContaining([
      expect.objectContaining({ path: ['roles'] }), expect.objectContaining({ path: ['locales'] }),
    ]));
  });

  it('stores a translator\'s locales in canonical BCP 47 form, as a venue\'s are (pt-br → pt-BR, Intl.getCanonicalLocales)', async () => {
    const person = await createPerson(t, { roles: ['translator'], locales: ['fr'], name: `${tag} Canonical` });
    const res = await request(t.http).patch(`/api/users/${person.id}`).set(bearer(accessToken)).send({ locales: ['pt-br', 'ZH-hant'] });
    expect({ status: res.status, locales: res.body.locales }).toEqual({ status: 200, locales: ['pt-BR', 'zh-Hant'] });
  });
});

describe('PATCH /api/users/:id', () => {
  const auditOf = async (id: number) =>
    (await t.app.get<typeof AuditEvent>(getModelToken(AuditEvent)).findAll({ where: { targetType: 'user', targetId: String(id) } }))
      .map((e) => ({ action: e.action, actorId: e.actorId, detail: e.detail }));

  it('changes roles, locales and active, and records who changed what', async () => {
    const person = people[0]!;
    const res = await request(t.http).patch(`/api/users/${person.id}`).set(bearer(accessToken))
      .send({ roles: ['curator', 'translator'], locales: ['es'], active: false });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: person.id, roles: ['curator', 'translator'], locales: ['es'], active: false });
    expect(await auditOf(person.id)).toEqual(expect.arrayContaining([
      { action: 'user.roles-changed', actorId: admin.id, detail: { from: ['curator'], to: ['curator', 'translator'] } },
      { action: 'user.locales-changed', actorId: admin.id, detail: { from: [], to: ['es'] } },
      { action: 'user.deactivated', actorId: admin.id, detail: {} },
    ]));
  });

  it('keeps an admin from removing their own admin access', async () => {
    for (const change of [{ active: false }, { roles: ['curator'] }]) {
      expect((await request(t.http).patch(`/api/users/${admin.id}`).set(bearer(accessToken)).send(change)).status).toBe(409);
    }
  });

  it('answers 404 for nobody and 400 for an id that is not a number', async () => {
    expect((await request(t.http).patch('/api/users/999999999').set(bearer(accessToken)).send({ active: true })).status).toBe(404);
    expect((await request(t.http).patch('/api/users/abc').set(bearer(accessToken)).send({ active: true })).status).toBe(400);
  });
});
