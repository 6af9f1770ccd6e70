import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, renderHook, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { db, setMeta, type DevicePerson } from '../offline/db';
import { fakePlantServer, json } from '../testing/fakePlantServer';
import { useDevices, useRevokeDevice } from './admin';
import { ApiError } from './http';
import type { Device } from './types';

const ADA: DevicePerson = {
  userId: 'u-ada',
  name: 'Ada',
  email: 'admin@demo.test',
  role: 'admin',
  units: 'metric',
  failedPins: 0,
  accessToken: 'token-a',
  accessExpiresAt: Date.now() + 3_600_000,
  lastActiveAt: '2026-12-01T06:00:00.000Z',
};

const TABLET: Device = {
  deviceId: '4f1c2a9e-0b7d-4c3e-9a51-6d2f8e7b1c05',
  people: [{ userId: 'u-ines', name: 'Ines', email: 'inspector@demo.test' }],
  firstSeenAt: '2026-11-30T06:00:00.000Z',
  lastSignInAt: '2026-12-01T06:00:00.000Z',
  lastPushAt: '2026-12-01T07:30:00.000Z',
  appliedOps: 12,
  activeSessions: 2,
};

/** The admin routes of the plant server, for one tablet with two people signed in. */
function serveDevices() {
  const server = fakePlantServer();
  let signedIn = TABLET.activeSessions;
  server.interruptWith(({ method, path }) => {
    if (method === 'GET' && path === '/api/admin/devices') {
      return json(200, [{ ...TABLET, activeSessions: signedIn }]);
    }
    const revoke = /^\/api\/admin\/devices\/([^/]+)\/revoke$/.exec(path);
    if (method === 'POST' && revoke) {
      if (revoke[1] !== TABLET.deviceId) return json(404, { message: 'No such device' });
      const revoked = signedIn;
      signedIn = 0;
      return json(200, { deviceId: TABLET.deviceId, revoked });
    }
    return undefined;
  });
  vi.stubGlobal('fetch', server.fetch);
  return server;
}

function wrapper({ children }: { children: ReactNode }) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}

const renderAdmin = () =>
  renderHook(() => ({ devices: useDevices(), revoke: useRevokeDevice() }), { wrapper });

beforeEach(async () => {
  await Promise.all(db.tables.map((table) => table.clear()));
  await db.people.put(ADA);
  await setMeta('currentUserId', ADA.userId);
});
afterEach(() => vi.unstubAllGlobals());

describe('device administration', () => {
  it('lists the devices as the administrator signed in here', async () => {
    const server = serveDevices();
    const { result } = renderAdmin();
    await waitFor(() => expect(result.current.devices.data).toEqual([TABLET]));
    expect(server.requests[0]).toMatchObject({
      method: 'GET',
      path: '/api/admin/devices',
      token: 'token-a',
    });
  });

  it('signs a tablet out, then fetches the list again', async () => {
    const server = serveDevices();
    const { result } = renderAdmin();
    await waitFor(() => expect(result.current.devices.data?.[0]?.activeSessions).toBe(2));
    let answer: unknown;
    await act(async () => {
      answer = await result.current.revoke.mutateAsync(TABLET.deviceId);
    });
    expect(answer).toEqual({ deviceId: TABLET.deviceId, revoked: 2 });
    await waitFor(() => expect(result.current.devices.data?.[0]?.activeSessions).toBe(0));
    expect(server.requests.map((r) => `${r.method} ${r.path}`)).toEqual([
      'GET /api/admin/devices',
      `POST /api/admin/devices/${TABLET.deviceId}/revoke`,
      'GET /api/admin/devices',
    ]);
  });

  it("passes on the server's refusal", async () => {
    serveDevices();
    const { result } = renderAdmin();
    await waitFor(() => expect(result.current.devices.isSuccess).toBe(true));
    await act(() =>
      result.current.revoke
        .mutateAsync('9d8e7f60-1a2b-4c3d-8e9f-0a1b2c3d4e5f')
        .catch(() => undefined),
    );
    await waitFor(() => expect(result.current.revoke.error).toBeInstanceOf(ApiError));
    expect(result.current.revoke.error).toMatchObject({ status: 404, reason: 'No such device' });
  });
});
