import { getModelToken } from '@nestjs/sequelize';
import { parse } from 'csv-parse/sync';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { bearer, createPerson, createTestApp, signIn } from '../../test/test-app.js';
import { AuditEvent } from './models/audit-event.model.js';

const t = await createTestApp();
afterAll(() => t.close());

describe('audit trail', () => {
  it('lists events newest first, paged, with who did them', async () => {
    // Other suites move their own clocks; a year on, this sign-in is the newest in the shared table.
    t.clock.advance(365 * 86_400_000);
    const admin = await createPerson(t, { roles: ['admin'], name: 'Mateus Oliveira' });
    const { accessToken } = await signIn(t, admin.email);
    const res = await request(t.http).get('/api/audit?action=auth.signed-in&pageSize=1').set(bearer(accessToken));
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ page: 1, pageSize: 1, total: expect.any(Number) });
    expect(res.body.items).toEqual([expect.objectContaining({
      action: 'auth.signed-in', actor: { id: admin.id, name: 'Mateus Oliveira' },
      target: { type: 'user', id: String(admin.id) }, at: t.clock.now().toISOString(),
    })]);
  });

  it('refuses to change or delete a recorded event', async () => {
    const events = t.app.get<typeof AuditEvent>(getModelToken(AuditEvent));
    const event = await events.findOne({ order: [['id', 'DESC']] });
    const recorded = event!.action;
    await expect(event!.update({ action: 'auth.password-reset' })).rejects.toThrow(/append-only/);
    await expect(event!.destroy()).rejects.toThrow(/append-only/);
    await expect(events.destroy({ where: { id: event!.id } })).rejects.toThrow(/append-only/);
    expect((await events.findByPk(event!.id))!.action).toBe(recorded);
  });
});

describe('audit filters and CSV export', () => {
  it('narrows by actor, action and a date range, a date-only "to" covering its whole day', async () => {
    t.clock.advance(30 * 86_400_000);
    const day = t.clock.now().toISOString().slice(0, 10);
    const admin = await createPerson(t, { roles: ['admin'], name: 'Priya Raman' });
    const { accessToken } = await signIn(t, admin.email);
    const other = await createPerson(t, { roles: ['curator'] });
    await signIn(t, other.email);
    const res = await request(t.http).get(`/api/audit?actorId=${admin.id}&action=auth.signed-in&from=${day}&to=${day}`).set(bearer(accessToken));
    expect(res.status).toBe(200);
    expect(res.body.items.map((item: { actor: { id: number } }) => item.actor.id)).toEqual([admin.id]);
    const before = await request(t.http).get(`/api/audit?actorId=${admin.id}&to=2000-01-01`).set(bearer(accessToken));
    expect(before.body.total).toBe(0);
  });

  it('refuses a "from" that is not a date, naming the field', async () => {
    const admin = await createPerson(t, { roles: ['admin'] });
    const { accessToken } = await signIn(t, admin.email);
    const res = await request(t.http).get('/api/audit?from=last-tuesday').set(bearer(accessToken));
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ path: ['from'], message: expect.stringMatching(/YYYY-MM-DD/) }]);
  });

  it('exports the same filter as CSV that a general-purpose parser reads back, formula-like text defused', async () => {
    const admin = await createPerson(t, { roles: ['admin'], name: '=HYPERLINK("x") "Quoted", Name' });
    const { accessToken } = await signIn(t, admin.email);
    const res = await request(t.http).get(`/api/audit?actorId=${admin.id}`).set(bearer(accessToken)).set('Accept', 'text/csv');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?audit-trail\.csv"?$/);
    const records: Record<string, string>[] = parse(res.text, { columns: true });
    expect(records).toEqual([expect.objectContaining({
      actor_id: String(admin.id), actor_name: `'=HYPERLINK("x") "Quoted", Name`, action: 'auth.signed-in', target_type: 'user', target_id: String(admin.id),
    })]);
    expect(records[0]!.at).toBe(t.clock.now().toISOString());
  });
});
