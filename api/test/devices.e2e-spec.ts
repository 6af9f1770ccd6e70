import { randomUUID } from 'node:crypto';
import { signIn, startApp, type Harness } from './harness.js';
import { lotOpen, released, tablet } from './ops.js';

interface Device {
  deviceId: string;
  people: { userId: string; name: string; email: string }[];
  firstSeenAt: string;
  lastSignInAt: string;
  lastPushAt: string | null;
  appliedOps: number;
  activeSessions: number;
}

let h: Harness;
let admin: { accessToken: string; user: { id: string } };
beforeAll(async () => {
  h = await startApp();
  admin = await signIn(h, 'admin@demo.test');
});
afterAll(() => h.close());

async function devices(): Promise<Device[]> {
  const res = await h
    .http()
    .get('/api/admin/devices')
    .auth(admin.accessToken, { type: 'bearer' })
    .expect(200);
  return res.body;
}

const revoke = (deviceId: string) =>
  h
    .http()
    .post(`/api/admin/devices/${deviceId}/revoke`)
    .auth(admin.accessToken, { type: 'bearer' });

/** The sign-in an access token belongs to: its `sid` claim. */
function sessionOf(accessToken: string): string {
  const payload = Buffer.from(accessToken.split('.')[1]!, 'base64url').toString();
  return (JSON.parse(payload) as { sid: string }).sid;
}

const me = (token: string) => h.http().get('/api/auth/me').auth(token, { type: 'bearer' });

test('a tablet is listed with who signed in on it and what it pushed, latest activity first', async () => {
  const first = await tablet(h, 'inspector@demo.test');
  const second = await tablet(h, 'supervisor@demo.test');
  await signIn(h, 'supervisor@demo.test', { deviceId: first.deviceId });

  let listed = (await devices()).find((d) => d.deviceId === first.deviceId)!;
  expect(listed.people.map((p) => p.email)).toEqual([
    'supervisor@demo.test',
    'inspector@demo.test',
  ]);
  expect(listed.people[1]).toEqual({
    userId: first.userId,
    name: expect.any(String),
    email: 'inspector@demo.test',
  });
  expect(listed).toMatchObject({ lastPushAt: null, appliedOps: 0, activeSessions: 2 });
  expect(Date.parse(listed.firstSeenAt)).toBeLessThan(Date.parse(listed.lastSignInAt));

  const pushedFrom = Date.now();
  const { op } = lotOpen(second, await released(h, second.token));
  expect((await second.push([op])).body.results[0]!.status).toBe('applied');
  const list = await devices();
  listed = list.find((d) => d.deviceId === second.deviceId)!;
  expect(listed.appliedOps).toBe(1);
  expect(Date.parse(listed.lastPushAt!)).toBeGreaterThanOrEqual(pushedFrom - 1000);
  // Signed in on last, the first tablet was ahead until the second one pushed.
  expect(list.map((d) => d.deviceId).slice(0, 2)).toEqual([second.deviceId, first.deviceId]);
});

test('signing a tablet out ends every sign-in on it, and nothing else', async () => {
  const deviceId = randomUUID();
  const inspector = await signIn(h, 'inspector@demo.test', { deviceId });
  const supervisor = await signIn(h, 'supervisor@demo.test', { deviceId });
  const ended = await signIn(h, 'inspector@demo.test', { deviceId });
  await h.http().post('/api/auth/logout').send({ refreshToken: ended.refreshToken }).expect(204);
  const elsewhere = await tablet(h, 'inspector@demo.test');

  const res = await revoke(deviceId).expect(200);
  expect(res.body).toEqual({ deviceId, revoked: 2 });

  await me(inspector.accessToken).expect(401);
  await me(supervisor.accessToken).expect(401);
  await h
    .http()
    .post('/api/auth/refresh')
    .send({ refreshToken: inspector.refreshToken })
    .expect(401);
  await me(elsewhere.token).expect(200);
  await me(admin.accessToken).expect(200);
  expect((await devices()).find((d) => d.deviceId === deviceId)?.activeSessions).toBe(0);

  // Signing out is not a ban: a password still signs in on it.
  const again = await signIn(h, 'inspector@demo.test', { deviceId });
  await me(again.accessToken).expect(200);
});

test('the audit log says who signed the tablet out and which sign-ins it ended', async () => {
  const deviceId = randomUUID();
  const inspector = await signIn(h, 'inspector@demo.test', { deviceId });
  await revoke(deviceId).expect(200);
  const audit = (query: Record<string, string>) =>
    h.http().get('/api/audit').query(query).auth(admin.accessToken, { type: 'bearer' }).expect(200);

  const device = await audit({ entity: 'device', entityId: deviceId });
  expect(device.body).toEqual([
    expect.objectContaining({
      actorId: admin.user.id,
      action: 'device.revoke',
      after: { revoked: 1 },
    }),
  ]);
  const session = await audit({ entity: 'session', entityId: sessionOf(inspector.accessToken) });
  expect(session.body[0]).toMatchObject({
    actorId: admin.user.id,
    action: 'auth.device-revoked',
    after: { revokeReason: 'device-revoked' },
  });
});

test('a device no one signed in on is a 404; an id that is not a UUID is a 400', async () => {
  const unknown = randomUUID();
  const missing = await revoke(unknown).expect(404);
  expect(missing.body.message).toBe(`No one has signed in on device ${unknown}`);
  const bad = await revoke('tablet-7').expect(400);
  expect(bad.body.field).toBe('deviceId');
  expect(bad.body.message).toMatch(/deviceId must be a UUID/);
});
