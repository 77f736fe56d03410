import request from 'supertest';
import { testApp, type TestApp } from '../testing/test-app';
import { bearerFor, type DemoRole } from '../testing/sign-in';
import { declaredRoutes, type DeclaredRoute } from './access';
import type { Principal } from './principal';

type Caller = { label: string; roles: Principal['roles'] | null; header?: [string, string]; readOnlyKey?: boolean };

// Parameters are filled with values that name nothing: the question here is only who gets past the door.
const PARAMETER_VALUES: Record<string, string> = { label: '1999.1', a: '1999.1', b: '1999.2' };
const fillPath = (path: string) => path.replace(/:(\w+)/g, (_m, name: string) => PARAMETER_VALUES[name] ?? '00000000-0000-4000-8000-000000000000');

function expectedOutcome(route: DeclaredRoute, caller: Caller, publicRead: boolean): 'allowed' | 401 | 403 {
  const { access } = route;
  if (access === 'public') return 'allowed';
  if (access === 'read') return publicRead || caller.roles ? 'allowed' : 401;
  if (!caller.roles) return 401;
  if (access === 'signed-in') return 'allowed';
  if (!access.roles.some((r) => caller.roles!.includes(r))) return 403;
  if (caller.readOnlyKey && route.method !== 'get') return 403;
  return 'allowed';
}

describe('route access matrix: every declared route × anonymous, each role and an API key', () => {
  let t: TestApp;
  const callers: Caller[] = [{ label: 'anonymous', roles: null }];

  beforeAll(async () => {
    t = await testApp();
    const demo: [DemoRole, Principal['roles']][] = [
      ['reader', ['reader']],
      ['steward', ['reader', 'steward']],
      ['reviewer', ['reader', 'reviewer']],
      ['editor', ['reader', 'editor']],
      ['admin', ['reader', 'admin']],
    ];
    for (const [who, roles] of demo) callers.push({ label: who, roles, header: ['Authorization', await bearerFor(t.app, who)] });
    const key = await request(t.app).post('/api/v1/api-keys').set('Authorization', await bearerFor(t.app, 'admin')).send({ name: `route matrix ${Date.now()}` }).expect(201);
    callers.push({ label: 'read-only API key (admin)', roles: ['reader', 'admin'], header: ['X-API-Key', key.body.secret], readOnlyKey: true });
  });

  it('covers the API: at least the accounts, audit and outbox routes are declared', () => {
    const paths = declaredRoutes.map((r) => `${r.method} ${r.path}`);
    expect(paths).toContain('post /auth/login');
    expect(paths).toContain('get /users');
    expect(paths).toContain('get /audit');
    expect(paths).toContain('get /dev/outbox');
  });

  it('answers each caller as the route declares (401 without sign-in, 403 without the role, past the door otherwise)', async () => {
    const mismatches: string[] = [];
    // Sign-out would end the sessions this matrix uses, so it is exercised in its own spec.
    const routes = declaredRoutes.filter((r) => r.path !== '/auth/logout');
    for (const route of routes) {
      for (const caller of callers) {
        const url = `/api/v1${fillPath(route.path)}`;
        let req = request(t.app)[route.method](url);
        if (caller.header) req = req.set(caller.header[0], caller.header[1]);
        if (route.method !== 'get' && route.method !== 'delete') req = req.send({});
        const res = await req;
        const expected = expectedOutcome(route, caller, t.config.publicRead);
        const ok = expected === 'allowed' ? res.status !== 403 && !(res.status === 401 && route.access !== 'public') : res.status === expected;
        if (!ok) mismatches.push(`${route.method.toUpperCase()} ${url} as ${caller.label}: expected ${expected}, got ${res.status} ${res.body?.message ?? ''}`);
      }
    }
    expect(mismatches).toEqual([]);
    expect(routes.length * callers.length).toBeGreaterThan(50);
  });
});
