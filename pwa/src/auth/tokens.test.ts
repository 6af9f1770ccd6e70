// @vitest-environment node
import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { db, getMeta } from '../offline/db';
import { openLot } from '../offline/records';
import { fakePlantServer, json } from '../testing/fakePlantServer';
import { INES, PAD_LOT } from '../testing/deviceFixtures';
import { accessTokenFor, SignInNeeded, signIn, signOut } from './tokens';

beforeEach(async () => {
  await Promise.all(db.tables.map((table) => table.clear()));
  vi.stubGlobal('navigator', { onLine: true });
});
afterEach(() => vi.unstubAllGlobals());

describe('tokens on the device', () => {
  it('signs in naming this device, and keeps what the server sent', async () => {
    const server = fakePlantServer();
    server.interruptWith(({ path, init }) =>
      path === '/api/auth/login'
        ? json(200, {
            accessToken: 'token-a',
            refreshToken: 'refresh-a',
            expiresIn: 900,
            user: {
              id: 'u-ines',
              name: 'Ines',
              email: 'i@demo.test',
              role: 'inspector',
              active: true,
            },
            echo: JSON.parse(String(init.body)),
          })
        : undefined,
    );
    vi.stubGlobal('fetch', server.fetch);
    const person = await signIn('i@demo.test', 'demo-password-1');
    expect(person).toMatchObject({ userId: 'u-ines', role: 'inspector', accessToken: 'token-a' });
    const body = JSON.parse(String(server.requests[0]?.init.body)) as { deviceId: string };
    expect(body.deviceId).toBe(await getMeta('deviceId'));
  });

  it('refreshes once for many callers: a spent refresh token would end the sign-in', async () => {
    const server = fakePlantServer();
    vi.stubGlobal('fetch', server.fetch);
    await db.people.put({ ...INES, accessToken: 'old', accessExpiresAt: 0, refreshToken: 'r1' });
    const tokens = await Promise.all([1, 2, 3, 4].map(() => accessTokenFor(INES.userId)));
    expect(new Set(tokens)).toEqual(new Set(['token-refreshed']));
    expect(server.requests.filter((r) => r.path === '/api/auth/refresh')).toHaveLength(1);
    expect((await db.people.get(INES.userId))?.refreshToken).toBe('refresh-2');
  });

  it('asks for a password once the server has revoked the sign-in', async () => {
    const server = fakePlantServer();
    server.interruptWith(() => json(401, { message: 'refresh token revoked' }));
    vi.stubGlobal('fetch', server.fetch);
    await db.people.put({ ...INES, accessToken: 'old', accessExpiresAt: 0, refreshToken: 'r1' });
    await expect(accessTokenFor(INES.userId)).rejects.toBeInstanceOf(SignInNeeded);
    expect((await db.people.get(INES.userId))?.refreshToken).toBeUndefined();
  });

  it('signs out without touching the person’s unsent records, even offline', async () => {
    vi.stubGlobal('fetch', () => Promise.reject(new TypeError('offline')));
    await db.people.put({ ...INES, accessToken: 't', refreshToken: 'r', pinHash: '$2b$10$x' });
    await openLot(PAD_LOT, INES.userId);
    await signOut(INES.userId);
    const after = await db.people.get(INES.userId);
    expect(after).toMatchObject({ userId: INES.userId, name: 'Ines' });
    expect(after?.accessToken ?? after?.refreshToken ?? after?.pinHash).toBeUndefined();
    expect(await db.outbox.where('authorId').equals(INES.userId).count()).toBe(1);
    expect(await db.lots.count()).toBe(1);
  });
});
