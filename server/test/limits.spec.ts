import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { PasswordHasher } from '../src/users/password-hasher.js';
import { bearer, createPerson, createTestApp, signIn, TEST_PASSWORD, TestClock, uniqueEmail, type TestApp } from './test-app.js';

// Two server instances on one database and one clock, as behind a load balancer: every limit must hold across both.
const clock = new TestClock();
let one: TestApp;
let two: TestApp;
const PAIRING_STARTS = 10;
const ADDRESS_FAILURES = 6;

beforeAll(async () => {
  const env = { PAIRING_STARTS_PER_ADDRESS: String(PAIRING_STARTS), SIGN_IN_MAX_FAILURES_PER_ADDRESS: String(ADDRESS_FAILURES) };
  one = await createTestApp({ clock, env });
  two = await createTestApp({ clock, env });
});
afterAll(async () => {
  await one?.close();
  await two?.close();
});

/** Client addresses from IPv6's documentation prefix (RFC 3849), one per use, through the loopback proxy hop. */
let lastAddress = 0;
const newAddress = () => `2001:db8::${(lastAddress += 1).toString(16)}`;
const from = (address: string) => ({ 'X-Forwarded-For': address });
/** Request i goes to instance one or two in turn. */
const server = (i: number) => (i % 2 === 0 ? one : two).http;
const PARALLEL = 40;

const statuses = (answers: request.Response[]) =>
  answers.reduce<Record<number, number>>((counts, res) => ({ ...counts, [res.status]: (counts[res.status] ?? 0) + 1 }), {});

/** Counts password checks on both instances: each is one argon2 verification. */
function countPasswordChecks() {
  const spies = [one, two].map((t) => vi.spyOn(t.app.get(PasswordHasher), 'verify'));
  return { get count() { return spies.reduce((n, spy) => n + spy.mock.calls.length, 0); }, restore: () => spies.forEach((spy) => spy.mockRestore()) };
}

const login = (i: number, email: string, password: string, address: string) =>
  request(server(i)).post('/api/auth/login').set(from(address)).send({ email, password });

// Every password check is an argon2 hash of 64 MiB: these take a while on two cores.
describe('sign-in limits under parallel requests on two instances (OWASP ASVS 4.0.3 V2.2.1)', { timeout: 180_000 }, () => {
  it(`checks five of ${PARALLEL} parallel wrong passwords from one address, and the owner still signs in from another`, async () => {
    const person = await createPerson(one, { roles: ['curator'] });
    const address = newAddress();
    const checks = countPasswordChecks();
    try {
      const answers = await Promise.all(Array.from({ length: PARALLEL }, (_, i) => login(i, person.email, `wrong guess ${i}`, address)));
      expect(statuses(answers)).toEqual({ 401: 5, 429: PARALLEL - 5 });
      expect(checks.count).toBe(5);
    } finally {
      checks.restore();
    }
    expect((await login(1, person.email, TEST_PASSWORD, newAddress())).status).toBe(200);
  });

  it(`slows a guess spread over ${PARALLEL} addresses: ten checks at once, then one per doubling wait`, async () => {
    const person = await createPerson(one, { roles: ['educator'] });
    const checks = countPasswordChecks();
    try {
      const answers = await Promise.all(Array.from({ length: PARALLEL }, (_, i) => login(i, person.email, `wrong guess ${i}`, newAddress())));
      expect(statuses(answers)).toEqual({ 401: 10, 429: PARALLEL - 10 });
      expect(checks.count).toBe(10);
    } finally {
      checks.restore();
    }
    const early = await login(0, person.email, 'another guess', newAddress());
    expect(early.status).toBe(429);
    expect(early.headers['retry-after']).toBe('1');

    clock.advance(1000);
    expect((await login(1, person.email, 'another guess', newAddress())).status).toBe(401);
    clock.advance(1000);
    expect((await login(0, person.email, TEST_PASSWORD, newAddress())).status).toBe(429);
    clock.advance(1000);
    // The owner gets in once the wait is over, and that ends the slow-down.
    expect((await login(0, person.email, TEST_PASSWORD, newAddress())).status).toBe(200);
    expect((await login(1, person.email, 'a slip of the finger', newAddress())).status).toBe(401);
    expect((await login(0, person.email, TEST_PASSWORD, newAddress())).status).toBe(200);
  });

  it(`gives a successful sign-in back to its address: more than ${ADDRESS_FAILURES} sign-ins from one office address all get in`, async () => {
    const address = newAddress();
    const people = await Promise.all(Array.from({ length: 4 }, () => createPerson(one, { roles: ['translator'] })));
    for (let round = 0; round < 2; round += 1) {
      const answers = await Promise.all(people.map((person, i) => login(i, person.email, TEST_PASSWORD, address)));
      expect(statuses(answers)).toEqual({ 200: people.length });
    }
  });
});

describe('password reset limits', () => {
  it(`queues three of ${PARALLEL} parallel requests for one account, from anywhere`, async () => {
    const person = await createPerson(one, { roles: ['curator'] });
    const answers = await Promise.all(Array.from({ length: PARALLEL }, (_, i) =>
      request(server(i)).post('/api/auth/password-reset').set(from(newAddress())).send({ email: person.email })));
    expect(statuses(answers)).toEqual({ 202: 3, 429: PARALLEL - 3 });
    expect(answers.find((res) => res.status === 429)!.body.message).toMatch(/Too many password reset requests\. Try again in \d+ minutes\./);
  });

  it(`queues ten of ${PARALLEL} parallel requests from one address, whichever accounts`, async () => {
    const address = newAddress();
    const answers = await Promise.all(Array.from({ length: PARALLEL }, (_, i) =>
      request(server(i)).post('/api/auth/password-reset').set(from(address)).send({ email: uniqueEmail('reset-flood') })));
    expect(statuses(answers)).toEqual({ 202: 10, 429: PARALLEL - 10 });
  });
});

describe('pairing limits', () => {
  let station: { id: number };
  let technician: Record<string, string>;

  beforeAll(async () => {
    const admin = bearer((await signIn(one, (await createPerson(one, { roles: ['admin'] })).email)).accessToken);
    technician = bearer((await signIn(one, (await createPerson(one, { roles: ['technician'] })).email)).accessToken);
    const slug = `limits-${Math.random().toString(36).slice(2, 8)}`;
    const venue = await request(one.http).post('/api/venues').set(admin).send({ name: 'Limits venue', slug, sourceLocale: 'en', targetLocales: [] });
    const gallery = await request(one.http).post('/api/galleries').set(admin).send({ venueId: venue.body.id, name: 'Limits gallery' });
    const created = await request(one.http).post('/api/stations').set(admin).send({
      galleryId: gallery.body.id, name: 'Limits station', screenWidthPx: 1920, screenHeightPx: 1080, orientation: 'landscape', mountingHeightMm: 1000,
    });
    expect(created.status).toBe(201);
    station = created.body;
  });

  it(`checks five of ${PARALLEL} parallel wrong pairing codes for one station`, async () => {
    const answers = await Promise.all(Array.from({ length: PARALLEL }, (_, i) =>
      request(server(i)).post(`/api/stations/${station.id}/pair`).set(technician).set(from(newAddress())).send({ pairingCode: '222222' })));
    expect(statuses(answers)).toEqual({ 422: 5, 429: PARALLEL - 5 });
  });

  it(`hands out ${PAIRING_STARTS} of ${PARALLEL} parallel pairing codes asked for from one address, and still serves another address`, async () => {
    const address = newAddress();
    const answers = await Promise.all(Array.from({ length: PARALLEL }, (_, i) => request(server(i)).post('/api/kiosk/pair/start').set(from(address))));
    expect(statuses(answers)).toEqual({ 201: PAIRING_STARTS, 429: PARALLEL - PAIRING_STARTS });
    const refused = answers.find((res) => res.status === 429)!;
    expect(refused.body).toEqual({ statusCode: 429, message: expect.stringMatching(/^Too many pairing codes asked for from this address\. Try again in \d+ minutes\.$/) });
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    expect((await request(two.http).post('/api/kiosk/pair/start').set(from(newAddress()))).status).toBe(201);
  });
});
