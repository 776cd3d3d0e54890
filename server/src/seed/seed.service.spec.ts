import { getModelToken } from '@nestjs/sequelize';
import { Test } from '@nestjs/testing';
import { afterAll, describe, expect, it } from 'vitest';
import { createPerson, createTestApp, uniqueEmail } from '../../test/test-app.js';
import { AuditEvent } from '../audit/models/audit-event.model.js';
import { User } from '../users/models/user.model.js';
import { PasswordHasher } from '../users/password-hasher.js';
import { SeedModule } from './seed.module.js';
import { SeedService } from './seed.service.js';

const t = await createTestApp();
const context = await Test.createTestingModule({ imports: [SeedModule] }).compile();
const seed = context.get(SeedService);
afterAll(async () => {
  await context.close();
  await t.close();
});

describe('SeedService', () => {
  it('leaves a database that already has people alone', async () => {
    await createPerson(t, { roles: ['curator'] });
    const before = await t.app.get<typeof User>(getModelToken(User)).count();
    expect(await seed.seedDemo('mantlepiece-demo')).toBe(false);
    expect(await t.app.get<typeof User>(getModelToken(User)).count()).toBe(before);
  });

  it('creates a first admin with an argon2id hash, records it, and refuses the same address twice', async () => {
    const email = uniqueEmail('first-admin');
    const admin = await seed.createAdmin(email.toUpperCase(), 'Farah Siddiqui', 'a long admin passphrase');
    expect(admin).toMatchObject({ email, roles: ['admin'], active: true });
    expect(admin.passwordHash).toMatch(/^\$argon2id\$/);
    expect(await t.app.get(PasswordHasher).verify(admin.passwordHash, 'a long admin passphrase')).toBe(true);
    const events = await t.app.get<typeof AuditEvent>(getModelToken(AuditEvent)).findAll({ where: { targetType: 'user', targetId: String(admin.id) } });
    expect(events.map((e) => [e.action, e.detail])).toEqual([['user.created', { via: 'cli', roles: ['admin'] }]]);
    await expect(seed.createAdmin(email, 'Again', 'a long admin passphrase')).rejects.toThrow(/already has an account/);
  });
});
