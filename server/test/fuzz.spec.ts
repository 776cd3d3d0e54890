import { getModelToken } from '@nestjs/sequelize';
import fc from 'fast-check';
import { Op } from 'sequelize';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '@mantlepiece/shared';
import { Release } from '../src/releases/models/release.model.js';
import { User } from '../src/users/models/user.model.js';
import { approvedGallery, buildRelease, pairedKiosk, publish } from './release-fixtures.js';
import { createReviewApp, member, type Headers } from './review-fixtures.js';
import { ROLE_MATRIX, type Access } from './role-matrix.js';
import { createPerson } from './test-app.js';

/**
 * Property-based hostile input on every route of the app's own OpenAPI document, from every kind
 * of caller: whatever arrives, the answer is never a 5xx and never shows a stack trace, SQL or a
 * path on the server. FUZZ_SEED repeats a run; FUZZ_RUNS scales it (runs per route and caller
 * allowed to call it; a fifth of that, at least one, for callers the guard turns away).
 */
const SEED = Number(process.env.FUZZ_SEED ?? Math.floor(Math.random() * 2 ** 31));
const RUNS = Number(process.env.FUZZ_RUNS ?? 8);

const t = await createReviewApp();
const releases = t.app.get<typeof Release>(getModelToken(Release));
const releasesBefore = Number((await releases.max('id')) ?? 0);
const users = t.app.get<typeof User>(getModelToken(User));
const usersBefore = Number((await users.max('id')) ?? 0);
let sent = 0;
const statuses = new Map<number, number>();

afterAll(async () => {
  const tally = [...statuses].sort(([a], [b]) => a - b).map(([status, count]) => `${status}×${count}`).join(' ');
  console.log(`fuzz: ${sent} requests to ${operations.length} operations as ${CALLERS.length} callers (FUZZ_SEED=${SEED}, FUZZ_RUNS=${RUNS}); answers ${tally}`);
  // What the fuzz made stays in the shared database: releases it asked for would wait for a later
  // suite's worker, and people it gave roles and locales would get a later suite's mail.
  await releases.destroy({ where: { id: { [Op.gt]: releasesBefore }, state: 'building' } });
  await users.update({ active: false }, { where: { id: { [Op.gt]: usersBefore } } });
  await t.close();
});

// ---------------------------------------------------------------------------------------------
// Rows to aim at, so that requests get past "there is no such …" into the code behind it.

const g = await approvedGallery(t, 'fuzz');
const release = await buildRelease(t, g.technician.auth, g.gallery.id);
await publish(t, g.technician.auth, release.id);
const callerKiosk = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
const targetKiosk = await pairedKiosk(t, g.admin, g.technician.auth, g.gallery.id);
const translator = await member(t, ['translator'], {});
const victim = await createPerson(t, { roles: ['curator'] });
const comment = await request(t.http).post(`/api/revisions/${g.revisionId}/comments`).set(g.educator.auth).send({ body: 'Is “grip” clearer?' });
const units = await request(t.http).get(`/api/stories/${g.story.storyId}/translations/fr/units`).set(g.curator.auth);
const manifest = await request(t.http).get('/api/kiosk/manifest').set(callerKiosk.device);
const liveFile = manifest.status === 200 ? (JSON.parse(manifest.body.manifest).files[0]?.sha256 as string | undefined) : undefined;

/** The row a path parameter names, by its own name or the collection before it (`/api/stories/{id}`). */
const ROWS: Record<string, string> = {
  users: String(victim.id),
  venues: String(g.venue.id),
  galleries: String(g.gallery.id),
  stations: String(targetKiosk.station.id),
  exhibits: String(g.exhibit.id),
  stories: String(g.story.storyId),
  storyId: String(g.story.storyId),
  panels: String(g.story.panelIds[0]),
  media: String(g.imageId),
  revisions: String(g.revisionId),
  comments: String(comment.body.id ?? 1),
  releases: String(release.id),
  kiosks: String(targetKiosk.credential.kioskId),
  locale: 'fr',
  unitId: encodeURIComponent(units.body.items?.[0]?.unitId ?? 'p1'),
  sha256: liveFile ?? '0'.repeat(64),
};

// ---------------------------------------------------------------------------------------------
// Callers

type Caller = 'nobody' | 'kiosk' | Role;
const CALLERS: Caller[] = ['nobody', 'kiosk', ...ROLES];
const people: Partial<Record<Role, Headers>> = { admin: g.admin, curator: g.curator.auth, educator: g.educator.auth, technician: g.technician.auth, translator: translator.auth };
for (const role of ROLES) people[role] ??= (await member(t, [role])).auth;

/** Someone without a credential also tries made-up ones. */
const credentialsOf = (caller: Caller): fc.Arbitrary<Headers> => {
  if (caller === 'kiosk') return fc.constant(callerKiosk.device);
  if (caller !== 'nobody') return fc.constant(people[caller]!);
  return fc.constantFrom<Headers>(
    {}, { Authorization: 'Bearer ' }, { Authorization: 'Bearer not.a.token' }, { Authorization: `Bearer mpk_${'A'.repeat(43)}` },
    { Authorization: 'Basic YWRtaW46YWRtaW4=' }, { Authorization: `Bearer ${'x'.repeat(8000)}` }, { Cookie: 'mp_refresh=forged; mp_refresh=again' },
  );
};

function isAllowed(access: Access | undefined, caller: Caller): boolean {
  if (access === undefined || access === 'public') return true;
  if (caller === 'nobody') return false;
  if (access === 'kiosk') return caller === 'kiosk';
  if (caller === 'kiosk') return false;
  return access === 'signed-in' || access.includes(caller);
}

// ---------------------------------------------------------------------------------------------
// The OpenAPI document, as the app serves it

interface Schema {
  $ref?: string;
  allOf?: Schema[];
  type?: string;
  format?: string;
  enum?: unknown[];
  example?: unknown;
  nullable?: boolean;
  properties?: Record<string, Schema>;
  required?: string[];
  items?: Schema;
}
interface Parameter {
  name: string;
  in: 'path' | 'query' | 'header';
  schema?: Schema;
}
interface Operation {
  parameters?: Parameter[];
  requestBody?: { content: Record<string, { schema?: Schema }> };
}
interface OpenApiDocument {
  paths: Record<string, Record<string, Operation>>;
  components: { schemas: Record<string, Schema> };
}

const docs = await request(t.http).get('/api/docs-json');
const openApi = docs.body as OpenApiDocument;

function resolve(schema: Schema | undefined): Schema {
  if (!schema) return {};
  if (schema.$ref) return resolve(openApi.components.schemas[schema.$ref.split('/').pop()!]);
  if (schema.allOf?.length === 1) return { ...resolve(schema.allOf[0]), nullable: schema.nullable };
  return schema;
}

const operations = Object.entries(openApi.paths).flatMap(([path, methods]) =>
  Object.entries(methods).map(([method, operation]) => ({ method: method.toUpperCase(), path, operation, label: `${method.toUpperCase()} ${path}` })),
);

// ---------------------------------------------------------------------------------------------
// JSON text, written by hand so that keys such as __proto__ stay own keys and numbers can be
// written the way no JSON.stringify would (1e400, 30 digits)

class Raw {
  constructor(readonly text: string) {}
}
class Obj {
  constructor(readonly entries: [string, unknown][]) {}
}
const OMIT = Symbol('left out');

function toJson(value: unknown): string {
  if (value instanceof Raw) return value.text;
  if (value instanceof Obj) return `{${value.entries.filter(([, v]) => v !== OMIT).map(([k, v]) => `${JSON.stringify(k)}:${toJson(v)}`).join(',')}}`;
  if (Array.isArray(value)) return `[${value.map(toJson).join(',')}]`;
  return JSON.stringify(value) ?? 'null';
}

// ---------------------------------------------------------------------------------------------
// Hostile values

const SQL_LIKE = [
  "' OR '1'='1", '1; DROP TABLE users; --', '" OR ""="', "name'; SELECT 1; --", '-id; DELETE FROM stories', 'title DESC, (SELECT SLEEP(5))',
  "%' UNION SELECT password_hash FROM users --", '1) OR (1=1', '%', '_', '\\', '\\%', "'", '"', ';', '--', '/*', 'id', '-id',
  'passwordHash', 'password_hash', '-createdAt,id', 'name ASC', 'NULL', 'sort',
];
const NUMBER_TEXTS = [
  '0', '-0', '-1', '1.5', '1e3', '1e308', '1e400', '-1e400', '0x10', '0b1', '1_000', '99999999999999999999', '2147483648', '4294967296',
  '9007199254740993', 'NaN', 'Infinity', '-Infinity', '', ' ', ' 1', '1 ', '+1', '01', '1,2',
];
const TEXTS = [
  '', ' ', '\u0000', '\ud800', 'a\udfffb', '\udc00\ud800', '\ufeff', '\u202e', 'e\u0301', '🌋', 'null', 'undefined', 'true', '[]', '{}',
  '../../../etc/passwd', '..\\..\\windows\\win.ini', '<script>alert(1)</script>', '{{7*7}}', '${7*7}', '__proto__', 'constructor',
  'x'.repeat(90_000), ...SQL_LIKE, ...NUMBER_TEXTS,
];
const MEGABYTE = 'm'.repeat(1_048_576);
const HOSTILE_KEYS = ['__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', '', ' ', '\ud800', 'id', 'createdById', 'passwordHash', 'state', 'a.b', '$where', '0'];

const loneSurrogates = fc.string({ unit: fc.integer({ min: 0xd800, max: 0xdfff }).map((c) => String.fromCharCode(c)), minLength: 1, maxLength: 3 });
const hostileText = fc.oneof(fc.constantFrom(...TEXTS), fc.string({ unit: 'binary', maxLength: 40 }), loneSurrogates, fc.string({ maxLength: 40 }));

const hostileNumber = fc.oneof(
  fc.constantFrom<unknown>(0, -0, -1, 1.5, -1.5, 0.1, 2 ** 31 - 1, 2 ** 31, 2 ** 32 - 1, 2 ** 32, 2 ** 53 - 1, 2 ** 53, 2 ** 63, 2 ** 64, 1e308, -1e308, 5e-324, Number.MIN_SAFE_INTEGER),
  fc.constantFrom(new Raw('1e400'), new Raw('-1e400'), new Raw('123456789012345678901234567890'), new Raw('1.0'), new Raw('-0.0'), new Raw('1E+2'), new Raw('NaN'), new Raw('-Infinity')),
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
);

const deepNesting = fc.tuple(fc.integer({ min: 50, max: 5000 }), fc.constantFrom('[', '{"a":')).map(([depth, open]) =>
  new Raw(open.repeat(depth) + (open === '[' ? '' : '1') + (open === '[' ? ']' : '}').repeat(depth)));

const hostileValue: fc.Arbitrary<unknown> = fc.letrec<{ value: unknown }>((tie) => ({
  value: fc.oneof(
    { weight: 3, arbitrary: hostileText },
    { weight: 3, arbitrary: hostileNumber },
    { weight: 2, arbitrary: fc.constantFrom<unknown>(null, true, false, [], [[]], [null], new Obj([]), new Raw('{"__proto__":{"admin":true}}')) },
    { weight: 1, arbitrary: fc.constant(MEGABYTE) },
    { weight: 1, arbitrary: deepNesting },
    { weight: 1, arbitrary: fc.array(tie('value'), { maxLength: 3, depthIdentifier: 'hostile' }) },
    { weight: 1, arbitrary: fc.array(fc.tuple(fc.constantFrom(...HOSTILE_KEYS), tie('value')), { maxLength: 3, depthIdentifier: 'hostile' }).map((entries) => new Obj(entries)) },
  ),
})).value;

/** A plausible value for a schema: enough of a request is right that the rest reaches the code. */
function plausible(schemaOrRef: Schema | undefined, depth = 0): fc.Arbitrary<unknown> {
  const schema = resolve(schemaOrRef);
  const nullable = schema.nullable ? [fc.constant(null)] : [];
  if (schema.enum?.length) return fc.constantFrom(...schema.enum);
  if (schema.properties) return depth > 3 ? fc.constant(new Obj([])) : objectFor(schema, depth + 1);
  switch (schema.type) {
    case 'integer':
    case 'number':
      return fc.oneof(fc.integer({ min: 0, max: 5 }), fc.constantFrom(...Object.values(ROWS).map(Number).filter(Number.isSafeInteger)), ...nullable);
    case 'boolean':
      return fc.boolean();
    case 'array':
      return fc.array(depth > 3 ? fc.constant(1) : fieldValue(schema.items, depth + 1), { maxLength: 3 });
    case 'string':
      if (schema.format === 'date-time') return fc.date({ min: new Date('2000-01-01'), max: new Date('2100-01-01'), noInvalidDate: true }).map((d) => d.toISOString());
      if (schema.format === 'uuid') return fc.uuid();
      return fc.oneof(
        ...(schema.example !== undefined ? [{ weight: 4, arbitrary: fc.constant(schema.example) }] : []),
        { weight: 1, arbitrary: fc.string({ maxLength: 20 }) },
        { weight: 1, arbitrary: fc.constantFrom('fr', 'en', '2027-06-30', 'someone@example.org', 'A plain name') },
      );
    default:
      return fc.oneof(...(schema.example !== undefined ? [fc.constant(schema.example)] : []), fc.integer({ min: 1, max: 5 }), fc.string({ maxLength: 10 }), ...nullable);
  }
}

/** Mostly plausible, sometimes hostile. */
const fieldValue = (schema: Schema | undefined, depth = 0): fc.Arbitrary<unknown> =>
  fc.oneof({ weight: 4, arbitrary: plausible(schema, depth) }, { weight: 1, arbitrary: hostileValue });

/**
 * An object of the schema's properties, plausible but for (usually) one hostile value or key:
 * with every field wrong at once, validation would stop nearly every request at the door.
 */
function objectFor(schema: Schema, depth = 0): fc.Arbitrary<Obj> {
  const required = new Set(schema.required ?? []);
  const properties = Object.entries(schema.properties ?? {}).map(([name, property]) =>
    fc.tuple(fc.constant(name), required.has(name) ? plausible(property, depth) : fc.option(plausible(property, depth), { nil: OMIT as unknown, freq: 3 })));
  const extra = fc.tuple(fc.oneof(fc.constantFrom(...HOSTILE_KEYS), fc.string({ maxLength: 10 })), hostileValue);
  return fc.tuple(fc.tuple(...properties), fc.nat(), hostileValue, fc.option(extra, { freq: 5 }), fc.boolean()).map(([own, at, hostile, more, spoil]) => {
    const entries = own.map(([name, value]) => [name, value] as [string, unknown]);
    if (spoil && entries.length > 0) entries[at % entries.length]![1] = hostile;
    return new Obj(more ? [...entries, more] : entries);
  });
}

interface Body {
  contentType: string;
  text: string | Buffer;
}

/** The body: mostly JSON of the operation's schema, sometimes no object at all, or not JSON. */
function bodyFor(operation: Operation): fc.Arbitrary<Body | null> {
  const content = operation.requestBody?.content ?? {};
  const json = content['application/json']?.schema;
  const asJson = (value: unknown): Body => ({ contentType: 'application/json', text: toJson(value) });
  const object = json ? objectFor(resolve(json)) : fc.array(fc.tuple(fc.constantFrom(...HOSTILE_KEYS), hostileValue), { maxLength: 3 }).map((e) => new Obj(e));
  const others = Object.keys(content).filter((type) => type !== 'application/json');
  return fc.oneof(
    { weight: 8, arbitrary: object.map(asJson) },
    { weight: 2, arbitrary: hostileValue.map(asJson) },
    { weight: 1, arbitrary: fc.constant(null) },
    {
      weight: 2,
      arbitrary: fc.constantFrom<Body>(
        { contentType: 'application/json', text: '{"a":' },
        { contentType: 'application/json', text: '' },
        { contentType: 'application/json', text: `{"x":"${MEGABYTE}"}` },
        { contentType: 'application/json; charset=utf-16', text: Buffer.from(`{"a":${'['.repeat(150)}${']'.repeat(150)}}`, 'utf16le') },
        { contentType: 'application/json; charset=utf-16', text: Buffer.from('{"email":"\u225b\u225b","password":"x"}', 'utf16le') },
        { contentType: 'application/json; charset=latin1', text: '{"a":1}' },
        { contentType: 'application/json; charset=utf-32', text: '[[[[[[]]]]]]' },
        { contentType: 'text/plain', text: '{"a":1}' },
        { contentType: 'application/x-www-form-urlencoded', text: `a${'[b]'.repeat(200)}=1&__proto__[admin]=1&constructor[prototype][x]=1` },
        { contentType: 'application/x-www-form-urlencoded', text: Array.from({ length: 2000 }, (_, i) => `k${i}=v`).join('&') },
        { contentType: 'multipart/form-data; boundary=zz', text: '--zz\r\nContent-Disposition: form-data; name="file"; filename="../../x.png"\r\n\r\nnot a png\r\n--zz--' },
        { contentType: 'application/xml', text: '<!DOCTYPE x [<!ENTITY e SYSTEM "file:///etc/passwd">]><x>&e;</x>' },
        ...others.map((contentType) => ({ contentType, text: '<xliff version="2.0"><file id="f"><unit id="u"><segment><source>a</source></segment></unit></file></xliff>' })),
      ),
    },
  );
}

// ---------------------------------------------------------------------------------------------
// URLs

const HOSTILE_SEGMENTS = [
  '0', '-1', '1.5', '1e308', '99999999999999999999', '2147483648', '9007199254740993', 'NaN', 'Infinity', 'null', 'undefined', 'true',
  '__proto__', 'constructor', 'prototype', "1'%20OR%20'1'%3D'1", '1%3B%20DROP%20TABLE%20users', '..%2F..%2F..%2Fetc%2Fpasswd', '%2e%2e',
  '%00', '%ED%A0%80', '%FF', '%', '%%', 'a'.repeat(5000), '%F0%9F%8C%8B', '%20', '[]', '%7B%7D', '1,2', '1;2', 'x'.repeat(255),
];

/** Percent-encodes a string byte by byte: a lone surrogate becomes the UTF-8 of U+FFFD, as a browser sends it. */
const encode = (text: string) => Array.from(Buffer.from(text, 'utf8'), (byte) => (/[A-Za-z0-9_.~-]/.test(String.fromCharCode(byte)) ? String.fromCharCode(byte) : `%${byte.toString(16).padStart(2, '0').toUpperCase()}`)).join('');

function rowFor(path: string, name: string): string {
  const segments = path.split('/');
  const collection = segments[segments.indexOf(`{${name}}`) - 1] ?? '';
  return ROWS[name === 'id' ? collection : name] ?? ROWS[collection] ?? '1';
}

const segmentFor = (path: string, name: string): fc.Arbitrary<string> =>
  fc.oneof(
    { weight: 4, arbitrary: fc.constant(rowFor(path, name)) },
    { weight: 3, arbitrary: fc.constantFrom(...HOSTILE_SEGMENTS) },
    { weight: 1, arbitrary: hostileText.map(encode).filter((s) => s.length > 0) },
  );

function queryFor(parameters: Parameter[]): fc.Arbitrary<string> {
  const pairs = parameters.filter((p) => p.in === 'query').map((parameter) => {
    const value = fc.oneof(
      { weight: 3, arbitrary: plausible(parameter.schema).map((v) => [`${encode(parameter.name)}=${encode(String(v))}`]) },
      { weight: 2, arbitrary: fc.oneof(fc.constantFrom(...NUMBER_TEXTS, ...SQL_LIKE), hostileText).map((v) => [`${encode(parameter.name)}=${encode(v)}`]) },
      { weight: 1, arbitrary: fc.constantFrom(['%ED%A0%80'], ['%FF'], ['1', '2'], ['[a]=1'], ['[__proto__][x]=1'], [''], ['=']).map((v) => v.map((s) => (s.startsWith('[') || s.startsWith('=') ? `${parameter.name}${s}` : `${parameter.name}=${s}`))) },
    );
    return fc.option(value, { nil: [] as string[], freq: 2 });
  });
  const extra = fc.option(fc.constantFrom('__proto__[x]=1', 'constructor[prototype][x]=1', 'unknown=1', 'sort=-passwordHash', 'page=1&page=2', `q=${'q'.repeat(10_000)}`), { nil: undefined, freq: 3 });
  return fc.tuple(fc.tuple(...pairs), extra).map(([own, more]) => [...own.flat(), ...(more ? [more] : [])].join('&'));
}

// ---------------------------------------------------------------------------------------------
// What no answer may show

const LEAKS: [string, RegExp][] = [
  ['a stack trace', /\n\s+at \S|\bat (?:async )?[\w$.<>]+ \((?:file:\/\/)?\/|Error: .*\n/],
  ['a source location', /\.(?:[cm]?js|ts):\d+:\d+/],
  ['a path on the server', /node_modules|\/(?:work|home|root|srv|usr|opt|var|tmp)\/[\w.-]+\//],
  ['SQL', /\b(?:SELECT|INSERT INTO|UPDATE|DELETE FROM)\b[^\n]*`|\bER_[A-Z_]{4,}|\bsql(?:Message|State)\b|Sequelize\w*Error|\bmysql2?\b|MariaDB/i],
];

function problemsOf(res: request.Response): string[] {
  const problems: string[] = [];
  if (res.status >= 500) problems.push(`answered ${res.status}`);
  const text = res.text ?? '';
  for (const [what, pattern] of LEAKS) if (pattern.test(text)) problems.push(`the body shows ${what}`);
  if (res.status >= 400 && /json/.test(String(res.headers['content-type'])) && (res.body?.statusCode !== res.status || typeof res.body?.message !== 'string')) {
    problems.push('the error body is not {statusCode, message}');
  }
  return problems;
}

const clip = (text: string | Buffer) =>
  typeof text !== 'string' ? `<${text.length} bytes>` : text.length > 300 ? `${text.slice(0, 300)}… (${text.length} characters)` : text;

// ---------------------------------------------------------------------------------------------

/** Someone the route lets in, or null for a route the matrix does not know. */
const allowedCaller = (access: Access | undefined): Caller | null => (access === undefined ? null : CALLERS.find((caller) => isAllowed(access, caller)) ?? null);

const urlWithRows = (path: string) => path.replace(/\{(\w+)\}/g, (_match, name: string) => rowFor(path, name));

describe('null in a body', () => {
  const fields = operations.flatMap(({ method, path, operation, label }) => {
    const schema = resolve(operation.requestBody?.content['application/json']?.schema);
    return Object.entries(schema.properties ?? {})
      .filter(([, property]) => !resolve(property).nullable && !property.nullable)
      .map(([field]) => ({ method, path, field, label: `${label} ${field}` }));
  });

  // Validation runs after the guard and before the route's code, so the one request shows the rule.
  it.each(fields)('is refused for $label, which the document does not mark nullable', async ({ method, path, field }) => {
    const caller = allowedCaller(ROLE_MATRIX[`${method} ${path.replace(/\{(\w+)\}/g, ':$1')}`]);
    // A route the matrix does not declare yet fails the role-matrix suite, which names it.
    if (caller === null) return;
    const credentials = caller === 'kiosk' ? callerKiosk.device : caller === 'nobody' ? {} : people[caller]!;
    const res = await request(t.http)[method.toLowerCase() as 'post'](urlWithRows(path)).set(credentials).set('X-Forwarded-For', '198.51.100.255').send({ [field]: null });
    sent += 1;
    expect({ status: res.status, named: (res.body.errors ?? []).some((e: { path: unknown[] }) => e.path[0] === field) }).toEqual({ status: 400, named: true });
  });
});

describe('hostile input on every route of the OpenAPI document', () => {
  it('reads a document with the routes in it', () => {
    expect(operations.length).toBeGreaterThan(50);
  });

  describe.each(operations)('$label', ({ method, path, operation }) => {
    const access = ROLE_MATRIX[`${method} ${path.replace(/\{(\w+)\}/g, ':$1')}`];
    const parameters = operation.parameters ?? [];
    const names = parameters.filter((p) => p.in === 'path').map((p) => p.name);
    const hasBody = !['GET', 'HEAD', 'DELETE'].includes(method);

    it('answers every caller without a 5xx and without showing its insides', async () => {
      const failures: string[] = [];
      for (const [index, caller] of CALLERS.entries()) {
        const request$ = fc.record({
          credentials: credentialsOf(caller),
          segments: fc.tuple(...names.map((name) => segmentFor(path, name))),
          query: queryFor(parameters),
          body: hasBody ? bodyFor(operation) : fc.constant(null),
          address: fc.integer({ min: 1, max: 254 }),
        });
        const result = await fc.check(
          fc.asyncProperty(request$, async ({ credentials, segments, query, body, address }) => {
            let url = path;
            names.forEach((name, i) => { url = url.replace(`{${name}}`, segments[i]!); });
            if (query) url += `?${query}`;
            // Throttles count this address (RFC 5737 documentation range), never the loopback the other suites use.
            let req = request(t.http)[method.toLowerCase() as 'get'](url).set(credentials).set('X-Forwarded-For', `198.51.100.${address}`);
            if (body) req = req.set('Content-Type', body.contentType).send(body.text);
            sent += 1;
            const res = await req;
            statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
            const problems = problemsOf(res);
            if (problems.length > 0) {
              throw new Error(`${caller}: ${method} ${clip(url)}${body ? ` ${body.contentType} ${clip(body.text)}` : ''}\n  → ${res.status} ${clip(res.text ?? '')}\n  ${problems.join('; ')}`);
            }
          }),
          { numRuns: isAllowed(access, caller) ? RUNS : Math.max(1, Math.round(RUNS / 5)), seed: SEED + index, endOnFailure: true },
        );
        if (result.failed) failures.push((result.errorInstance as Error | undefined)?.message ?? JSON.stringify(result.counterexample));
      }
      expect(failures).toEqual([]);
    }, 120_000);
  });
});
