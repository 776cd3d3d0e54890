import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, createPerson, createTestApp, signIn } from '../../test/test-app.js';

const t = await createTestApp();
let token: string;

beforeAll(async () => {
  const educator = await createPerson(t, { roles: ['educator'] });
  token = (await signIn(t, educator.email)).accessToken;
});
afterAll(() => t.close());

const slope = { massKg: 10, angleDeg: 30, staticFriction: 0.85, kineticFriction: 0.6 };

describe('GET /api/widgets', () => {
  it('lists every widget type with JSON Schema generated from the shared zod schemas, and defaults', async () => {
    const res = await request(t.http).get('/api/widgets').set(bearer(token));
    expect(res.status).toBe(200);
    expect(res.body.items.map((item: { type: string }) => item.type)).toEqual(['slope-force', 'convection-cell', 'sea-floor-depth', 'plate-forces']);
    const [slopeForce, convection] = res.body.items;
    expect(slopeForce).toMatchObject({ version: 1, title: 'Slope force box', defaults: slope });
    expect(slopeForce.jsonSchema.properties.angleDeg).toMatchObject({ type: 'number', minimum: 0, maximum: 90, unit: '°' });
    expect(convection.jsonSchema.properties.overlay.enum).toEqual(['streamlines', 'particles', 'arrows', 'none']);
  });

  it('sends each type’s model card: equations, sources with DOIs, and its words in every UI language', async () => {
    const res = await request(t.http).get('/api/widgets').set(bearer(token));
    const seaFloor = res.body.items.find((item: { type: string }) => item.type === 'sea-floor-depth');
    expect(Object.keys(seaFloor.model.words).sort()).toEqual(['ar', 'en', 'es', 'fr']);
    expect(seaFloor.model.equations[1]).toBe('q = k·ΔT / √(πκt)');
    // Stein and Stein (1992), Nature 359, 123–129: the GDH1 plate model.
    expect(seaFloor.model.sources).toContainEqual(expect.objectContaining({ doi: '10.1038/359123a0' }));
    for (const item of res.body.items) expect(item.model.words.en.range.length).toBeGreaterThan(0);
  });

  it('computes plate forces on the server: ridge push on a 100 Myr plate about 3.9 × 10¹² N/m (Turcotte and Schubert, from memory)', async () => {
    const params = { ageMyr: 100, slabLengthKm: 700, slabDipDeg: 60, gravityMs2: 10, deltaTK: 1200 };
    const res = await request(t.http).post('/api/widgets/validate').set(bearer(token)).send({ type: 'plate-forces', params });
    expect(res.status).toBe(200);
    // By hand: 10 × 3300 × 3e-5 × 1200 × 1e-6 × 3.15576e15 × (1 + 237.6/(π × 2300)) = 3.8723e12 N/m.
    expect(res.body.result.ridgePushNPerM).toBeCloseTo(3.8723e12, -8);
  });

  it('needs a signed-in person', async () => {
    expect((await request(t.http).get('/api/widgets')).status).toBe(401);
  });
});

describe('POST /api/widgets/validate', () => {
  it('returns the params and the computed result for valid settings', async () => {
    const res = await request(t.http).post('/api/widgets/validate').set(bearer(token)).send({ type: 'slope-force', params: slope });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ ok: true, params: slope, result: { slides: false }, warnings: [] });
    // W = m·g0 = 10 kg × 9.80665 m/s² (standard gravity, 3rd CGPM 1901).
    expect(res.body.result.weightN).toBeCloseTo(98.0665, 10);
    // arctan 0.85 = 40.36° (Byerlee 1978 friction), computed on the server by the shared module.
    expect(res.body.result.criticalAngleDeg).toBeCloseTo(40.3645, 4);
  });

  it('returns the convection cell’s derived numbers, not a run', async () => {
    const params = { rayleigh: 1e4, aspectRatio: 1, nx: 64, nz: 64, playbackSpeed: 2, colourRamp: 'mantle-heat', overlay: 'streamlines', units: 'non-dimensional' };
    const res = await request(t.http).post('/api/widgets/validate').set(bearer(token)).send({ type: 'convection-cell', params });
    expect(res.status).toBe(200);
    expect(res.body.result).toMatchObject({ rayleigh: 1e4, aboveOnset: true });
    // Blankenbach et al. (1989) case 1a Nu = 4.884409, which the estimate is fitted to.
    expect(res.body.result.estimate.nusselt).toBeCloseTo(4.884409, 5);
  });

  it('refuses bad params with 422 and an error per field, each path leading into params', async () => {
    const res = await request(t.http)
      .post('/api/widgets/validate')
      .set(bearer(token))
      .send({ type: 'slope-force', params: { ...slope, massKg: -2, staticFriction: 0.3, kineticFriction: 0.5, colour: 'red' } });
    expect(res.status).toBe(422);
    expect(res.body).toEqual({
      statusCode: 422,
      message: 'The widget settings are not valid.',
      errors: [
        { path: ['params', 'massKg'], message: 'Mass must be a number more than 0 kg and at most 1,000,000 kg.' },
        { path: ['params', 'colour'], message: '"colour" is not a setting of the slope force box.' },
        // Every wrong setting at once: the wrong mass does not hide kinetic friction above static.
        { path: ['params', 'kineticFriction'], message: expect.stringContaining('cannot be more than static friction μs (0.3)') },
      ],
    });
  });

  it('refuses a grid too coarse for the boundary layer, saying what to pick', async () => {
    const params = { rayleigh: 1e5, aspectRatio: 1, nx: 64, nz: 32, playbackSpeed: 2, colourRamp: 'mantle-heat', overlay: 'none', units: 'non-dimensional' };
    const res = await request(t.http).post('/api/widgets/validate').set(bearer(token)).send({ type: 'convection-cell', params });
    expect(res.status).toBe(422);
    expect(res.body.errors).toEqual([{ path: ['params', 'nz'], message: expect.stringContaining('Pick nz = 64 or more.') }]);
  });

  it('refuses an unknown type with 422 naming the known ones', async () => {
    const res = await request(t.http).post('/api/widgets/validate').set(bearer(token)).send({ type: 'slab-pull', params: {} });
    expect(res.status).toBe(422);
    expect(res.body).toEqual({
      statusCode: 422,
      message: 'Unknown widget type "slab-pull"; the known types are slope-force, convection-cell, sea-floor-depth, plate-forces.',
      errors: [{ path: ['type'], message: 'Unknown widget type "slab-pull"; the known types are slope-force, convection-cell, sea-floor-depth, plate-forces.' }],
    });
  });

  it('refuses a body without a type as a 400 naming the field', async () => {
    const res = await request(t.http).post('/api/widgets/validate').set(bearer(token)).send({ params: slope });
    expect(res.status).toBe(400);
    expect(res.body.errors.map((error: { path: string[] }) => error.path)).toEqual([['type']]);
  });
});
