import { METHODS } from 'node:http';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '@mantlepiece/shared';
import { KIOSK_UNPAIRED_MESSAGE } from '../src/kiosks/device-token.guard.js';
import { PUBLIC_PATH_PREFIXES, ROLE_MATRIX, type Access } from './role-matrix.js';
import { createPerson, createTestApp, signIn } from './test-app.js';

interface ExpressLayer {
  route?: { path: string; methods: Record<string, boolean> };
}

const t = await createTestApp();
afterAll(() => t.close());

/**
 * Every route the running app answers, read from Express's router after Nest registered them.
 * A layer answering every HTTP method is Nest's not-found handler for a path outside the prefix.
 */
const registered = ((t.app.getHttpAdapter().getInstance() as { router: { stack: ExpressLayer[] } }).router.stack)
  .flatMap(({ route }) => {
    if (!route) return [];
    const methods = Object.keys(route.methods).map((m) => m.toUpperCase());
    return METHODS.every((m) => methods.includes(m)) ? [] : methods.map((m) => `${m} ${route.path}`);
  });
const apiRoutes = registered.filter((route) => !PUBLIC_PATH_PREFIXES.some((prefix) => route.split(' ')[1]!.startsWith(prefix)));

const tokens = Object.fromEntries(
  await Promise.all(ROLES.map(async (role) => [role, (await signIn(t, (await createPerson(t, { roles: [role] })).email)).accessToken])),
) as Record<Role, string>;

type Caller = Role | 'nobody';
const callers: Caller[] = ['nobody', ...ROLES];

function expected(access: Access, caller: Caller): 'allowed' | 401 | 403 {
  if (access === 'public') return 'allowed';
  if (caller === 'nobody') return 401;
  // Kiosk routes refuse every person's sign-in; the kiosk suite calls them with device tokens.
  if (access === 'kiosk') return 403;
  if (access === 'signed-in') return 'allowed';
  return access.includes(caller) ? 'allowed' : 403;
}

/** Whether the guard let the call through; the route itself may still answer 4xx about its input. */
function outcome(res: request.Response): 'allowed' | 401 | 403 {
  if (res.status === 401 && [KIOSK_UNPAIRED_MESSAGE, 'Sign in to continue.'].includes(res.body.message)) return 401;
  if (res.status === 403) return 403;
  return 'allowed';
}

function call(route: string, caller: Caller) {
  const [method, path] = route.split(' ') as [string, string];
  // Any value will do for path parameters: the guard decides before the route looks them up.
  const req = request(t.http)[method.toLowerCase() as 'get'](path.replace(/:\w+/g, '1'));
  if (caller !== 'nobody') req.set('Authorization', `Bearer ${tokens[caller]}`);
  return method === 'GET' ? req : req.send({});
}

describe('role matrix', () => {
  it('declares every registered route, and only those', () => {
    expect(apiRoutes.filter((route) => !(route in ROLE_MATRIX))).toEqual([]);
    expect(Object.keys(ROLE_MATRIX).filter((route) => !registered.includes(route))).toEqual([]);
  });

  it('keeps the OpenAPI page public', async () => {
    const docs = registered.filter((route) => !apiRoutes.includes(route) && route.startsWith('GET '));
    expect(docs).toContain('GET /api/docs-json');
    for (const route of docs) expect(outcome(await call(route, 'nobody'))).toBe('allowed');
  });

  // An undeclared route fails the first test, which names it; the walk covers the declared ones.
  describe.each(apiRoutes.filter((route) => route in ROLE_MATRIX))('%s', (route) => {
    it.each(callers)('called by %s', async (caller) => {
      const res = await call(route, caller);
      // Whatever a route thinks of an empty body and a made-up id, a crash is never the answer.
      expect({ caller, outcome: outcome(res), crashed: res.status >= 500 ? `${res.status} ${JSON.stringify(res.body)}` : false })
        .toEqual({ caller, outcome: expected(ROLE_MATRIX[route]!, caller), crashed: false });
    });
  });
});
