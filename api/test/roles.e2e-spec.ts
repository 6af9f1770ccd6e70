import { randomUUID } from 'node:crypto';
import { ROLES, type Role } from '../src/users/entities/user.entity.js';
import { signIn, startApp, type Harness } from './harness.js';

/*
 * Who may call what, written out by hand: this table is the specification. The test reads the
 * routes the application actually serves and fails if one is missing here (or here but not
 * served), so a new route cannot go untested.
 */
const ANY = ROLES;
const EXPECTED: Record<string, 'public' | readonly Role[]> = {
  'GET /api/health': 'public',
  'POST /api/auth/login': 'public',
  'POST /api/auth/refresh': 'public',
  'POST /api/auth/logout': 'public',
  'GET /api/auth/me': ANY,
  'GET /api/users': ['admin'],
  'POST /api/users': ['admin'],
  'PATCH /api/users/:id/role': ['admin'],
  'POST /api/users/:id/deactivate': ['admin'],
  'GET /api/presses': ANY,
  'POST /api/presses': ['admin'],
  'PATCH /api/presses/:id': ['admin'],
  'GET /api/compounds': ANY,
  'GET /api/compounds/:id': ANY,
  'POST /api/compounds': ['quality'],
  'PATCH /api/compounds/:id': ['quality'],
  'POST /api/compounds/:id/test-sets': ['quality'],
  'POST /api/compounds/:id/fits': ['quality'],
  'POST /api/compounds/:id/fits/:fitId/publish': ['quality'],
  'GET /api/compounds/:id/aging': ANY,
  'POST /api/compounds/:id/aging': ['quality'],
  'GET /api/specs': ANY,
  'GET /api/specs/:id': ANY,
  'POST /api/specs': ['quality'],
  'POST /api/specs/:id/revisions': ['quality'],
  'PUT /api/specs/:id/revisions/:revisionId': ['quality'],
  'POST /api/specs/:id/revisions/:revisionId/release': ['quality'],
  'GET /api/lots': ANY,
  'GET /api/lots/:id': ANY,
  'POST /api/lots/:id/dispositions': ['supervisor', 'quality'],
  'POST /api/lots/:id/reopen': ['supervisor'],
  'GET /api/lots/:id/report': ['supervisor', 'quality'],
  'GET /api/lots/:id/report.csv': ['supervisor', 'quality'],
  'GET /api/trends/measurements': ['supervisor', 'quality'],
  'POST /api/sync/push': ['inspector', 'supervisor'],
  'GET /api/sync/pull': ANY,
  'PUT /api/photos/:sha256': ['inspector', 'supervisor', 'quality'],
  'GET /api/photos/:sha256': ANY,
  'GET /api/audit': ['admin', 'quality'],
  'GET /api/admin/mail': ['admin'],
  'GET /api/admin/mail/settings': ['admin'],
  'POST /api/admin/mail/test': ['admin'],
  'GET /api/admin/devices': ['admin'],
  'POST /api/admin/devices/:deviceId/revoke': ['admin'],
};

let h: Harness;
const tokens = new Map<Role, string>();
let served: string[];

beforeAll(async () => {
  h = await startApp();
  for (const role of ROLES) tokens.set(role, (await signIn(h, `${role}@demo.test`)).accessToken);
  // The routes as Express will dispatch them, not as anyone remembers them.
  const express = h.app.getHttpAdapter().getInstance() as {
    router: { stack: { route?: { path: string; methods: Record<string, boolean> } }[] };
  };
  served = express.router.stack.flatMap((layer) =>
    layer.route
      ? Object.keys(layer.route.methods)
          .filter((m) => m !== '_all')
          .map((m) => `${m.toUpperCase()} ${layer.route!.path}`)
      : [],
  );
});
afterAll(() => h.close());

test('the table covers exactly the routes the application serves', () => {
  expect([...served].sort()).toEqual(Object.keys(EXPECTED).sort());
});

const concrete = (path: string) =>
  path.replace(/:sha256/g, '0'.repeat(64)).replace(/:\w+/g, () => randomUUID());

describe.each(Object.entries(EXPECTED))('%s', (route, access) => {
  const [method, path] = route.split(' ') as [string, string];
  const call = (token?: string) => {
    const req = h.http()[method.toLowerCase() as 'get'](concrete(path));
    return (token ? req.auth(token, { type: 'bearer' }) : req).send({});
  };

  test.each(['no token', ...ROLES])('%s', async (who) => {
    const res = await call(who === 'no token' ? undefined : tokens.get(who as Role));
    expect(res.status).toBeLessThan(500);
    if (access === 'public') expect([401, 403]).not.toContain(res.status);
    else if (who === 'no token') expect(res.status).toBe(401);
    else if (access.includes(who as Role)) expect([401, 403]).not.toContain(res.status);
    else expect(res.status).toBe(403);
  });
});
