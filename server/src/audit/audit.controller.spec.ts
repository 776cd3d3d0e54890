import { getModelToken } from '@nestjs/sequelize';
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
      action: 'auth.signed-in', actor: { id: admin.id, name: 'Mateus Oliveira', email: admin.email },
      targetType: 'user', targetId: String(admin.id), createdAt: t.clock.now().toISOString(),
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
