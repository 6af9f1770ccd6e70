// @vitest-environment node
// Node's own Blob and FormData survive IndexedDB's structured clone; jsdom's do not.
import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { DevicePerson } from './db';
import { db, setMeta } from './db';
import { openLot, recordDefect, recordPart, submitLot, type NewLot } from './records';
import {
  describeSyncError,
  NoSignIn,
  pullChanges,
  pushOutbox,
  syncOnce,
  uploadPhotos,
} from './sync';
import { fakePlantServer, json, type FakePlantServer } from '../testing/fakePlantServer';

const LOT: NewLot = {
  lotNumber: 'L-0001',
  specId: 'spec-1',
  specRevisionId: 'rev-1',
  pressId: 'press-1',
  cavity: 2,
  lotSize: 500,
  moldedAt: '2026-12-01T06:00:00.000Z',
  plan: { codeLetter: 'H', sampleSize: 50, accept: 1, reject: 2 },
};

function person(userId: string, token: string | undefined): DevicePerson {
  return {
    userId,
    name: userId,
    email: `${userId}@demo.test`,
    role: 'inspector',
    units: 'metric',
    failedPins: 0,
    accessToken: token,
    accessExpiresAt: token ? Date.now() + 600_000 : undefined,
    refreshToken: token ? `refresh-${userId}` : undefined,
    lastActiveAt: new Date().toISOString(),
  };
}

async function recordLotWithParts(parts: number, authorId = 'u-a') {
  const lot = await openLot(LOT, authorId);
  for (let i = 1; i <= parts; i++) {
    await recordPart(
      {
        lotId: lot.id,
        sampleIndex: i,
        measurements: { thickness: 10, load: 1900 },
        verdict: {
          status: 'within',
          conforming: true,
          characteristics: [],
          criticalDefects: 0,
          flags: [],
        },
        conforming: true,
      },
      authorId,
    );
  }
  return lot;
}

async function states() {
  return (await db.outbox.orderBy('seq').toArray()).map((op) => op.state);
}

let server: FakePlantServer;

beforeEach(async () => {
  await Promise.all(db.tables.map((table) => table.clear()));
  server = fakePlantServer();
  vi.stubGlobal('fetch', server.fetch);
  vi.stubGlobal('navigator', { onLine: true });
  await db.people.put(person('u-a', 'token-a'));
  await setMeta('currentUserId', 'u-a');
});

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('push', () => {
  it('sends lot, parts and submit in the order they were made, and each only once', async () => {
    const lot = await recordLotWithParts(2);
    await submitLot(lot.id, { verdict: 'pass', nonconforming: 0 }, 'u-a');

    const report = await pushOutbox();
    expect(report).toMatchObject({ sent: 4, rejected: 0 });
    const types = [...server.applied.values()].map((op) => op.type);
    expect(types).toEqual(['lot.open', 'inspection.record', 'inspection.record', 'lot.submit']);
    expect(await states()).toEqual(['sent', 'sent', 'sent', 'sent']);

    await pushOutbox();
    const pushes = server.requests.filter((r) => r.path === '/api/sync/push');
    expect(pushes).toHaveLength(1);
  });

  it('names the device and each operation’s author and time', async () => {
    await recordLotWithParts(0);
    await pushOutbox();
    const push = server.requests.find((r) => r.path === '/api/sync/push');
    const body = JSON.parse(String(push?.init.body)) as {
      deviceId: string;
      operations: { authorId: string; recordedAt: string }[];
    };
    expect(body.deviceId).toMatch(/^[0-9a-f-]{36}$/);
    expect(body.operations[0]).toMatchObject({ authorId: 'u-a' });
    expect(Date.parse(body.operations[0]?.recordedAt ?? '')).not.toBeNaN();
  });

  it('keeps everything waiting when fetch fails', async () => {
    await recordLotWithParts(1);
    vi.stubGlobal('fetch', () => Promise.reject(new TypeError('Failed to fetch')));
    const error = await pushOutbox().catch((e: unknown) => e);
    expect(describeSyncError(error)).toMatch(/No connection to the plant server/);
    expect(await states()).toEqual(['waiting', 'waiting']);
  });

  it('gives up on a request that never answers and keeps everything waiting', async () => {
    await recordLotWithParts(1);
    server.interruptWith(
      ({ init }) =>
        new Promise<Response>((_, reject) =>
          init.signal?.addEventListener('abort', () => reject(init.signal?.reason)),
        ),
    );
    const error = await syncOnce({ timeoutMs: 50 }).catch((e: unknown) => e);
    expect(describeSyncError(error)).toMatch(/no answer within 0.05 s/);
    expect(await states()).toEqual(['waiting', 'waiting']);
  });

  it('keeps everything waiting on a 500 and reports the server’s reason', async () => {
    await recordLotWithParts(1);
    server.interruptWith(() => json(500, { message: 'database is locked' }));
    const error = await pushOutbox().catch((e: unknown) => e);
    expect(describeSyncError(error)).toBe('The server answered 500: database is locked');
    expect(await states()).toEqual(['waiting', 'waiting']);
  });

  it('sets aside the one operation a 409 names and sends the rest', async () => {
    await recordLotWithParts(2);
    let refused = false;
    server.interruptWith(({ path }) => {
      if (path !== '/api/sync/push' || refused) return undefined;
      refused = true;
      return json(409, { message: 'sample 1 is already recorded', field: 'operations.1.payload' });
    });
    const report = await pushOutbox();
    expect(report).toMatchObject({ sent: 2, rejected: 1 });
    const ops = await db.outbox.orderBy('seq').toArray();
    expect(ops.map((op) => op.state)).toEqual(['sent', 'rejected', 'sent']);
    expect(ops[1]?.reason).toBe('sample 1 is already recorded');
  });

  it('keeps everything waiting when a 409 names no operation', async () => {
    await recordLotWithParts(1);
    server.interruptWith(() => json(409, { message: 'device is being re-registered' }));
    const error = await pushOutbox().catch((e: unknown) => e);
    expect(describeSyncError(error)).toBe('The server answered 409: device is being re-registered');
    expect(await states()).toEqual(['waiting', 'waiting']);
  });

  it('keeps the server’s reason beside a rejected record and sends the others', async () => {
    const lot = await recordLotWithParts(2);
    server.rejectWhen((op) =>
      (op.payload as { sampleIndex?: number }).sampleIndex === 2
        ? 'load 9000 N is outside the physical range'
        : undefined,
    );
    const report = await pushOutbox();
    expect(report).toMatchObject({ sent: 2, rejected: 1 });
    const part2 = await db.parts
      .where({ lotId: lot.id })
      .filter((p) => p.sampleIndex === 2)
      .first();
    const op = await db.outbox
      .where('recordId')
      .equals(part2?.id ?? '')
      .first();
    expect(op).toMatchObject({
      state: 'rejected',
      reason: 'load 9000 N is outside the physical range',
    });
  });

  it('sends nothing twice when the answer to an applied batch was lost', async () => {
    await recordLotWithParts(2);
    let lost = false;
    server.interruptWith(async (request) => {
      if (request.path !== '/api/sync/push' || lost) return undefined;
      lost = true;
      await server.fetch(request.path, request.init); // the server applies the batch…
      throw new TypeError('connection reset'); // …but the answer never reaches the tablet
    });
    await expect(pushOutbox()).rejects.toThrow(/connection reset/);
    expect(await states()).toEqual(['waiting', 'waiting', 'waiting']);

    await pushOutbox();
    expect(await states()).toEqual(['sent', 'sent', 'sent']);
    expect(server.applied.size).toBe(3);
  });

  it('refreshes an access token the server no longer takes, once, and goes on', async () => {
    await recordLotWithParts(1);
    server.revokeToken('token-a');
    await pushOutbox();
    expect(await states()).toEqual(['sent', 'sent']);
    const refreshes = server.requests.filter((r) => r.path === '/api/auth/refresh');
    expect(refreshes).toHaveLength(1);
    expect((await db.people.get('u-a'))?.accessToken).toBe('token-refreshed');
  });

  it('pushes a signed-out author’s records under another person’s token, still as theirs', async () => {
    await recordLotWithParts(1, 'u-a');
    await db.people.update('u-a', { accessToken: undefined, refreshToken: undefined });
    await db.people.put(person('u-b', 'token-b'));
    await setMeta('currentUserId', 'u-b');
    await pushOutbox();
    const push = server.requests.find((r) => r.path === '/api/sync/push');
    expect(push?.token).toBe('token-b');
    expect([...server.applied.values()].every((op) => op.authorId === 'u-a')).toBe(true);
  });

  it('says a sign-in is needed when no one on the device has a token', async () => {
    await recordLotWithParts(1);
    await db.people.update('u-a', { accessToken: undefined, refreshToken: undefined });
    await expect(pushOutbox()).rejects.toBeInstanceOf(NoSignIn);
    expect(await states()).toEqual(['waiting', 'waiting']);
  });
});

describe('photos', () => {
  const sha = 'ab'.repeat(32);
  const photo = {
    sha256: sha,
    blob: new Blob([new Uint8Array([0xff, 0xd8, 0xff])], { type: 'image/jpeg' }),
    mime: 'image/jpeg',
    width: 1600,
    height: 1200,
  };

  async function defectWithPhoto() {
    const lot = await openLot(LOT, 'u-a');
    return recordDefect(
      { lotId: lot.id, type: 'flash', location: 'sealing', severity: 'major' },
      photo,
      'u-a',
    );
  }

  it('keeps a photo on the device as a Blob until its defect is on the server', async () => {
    await defectWithPhoto();
    const stored = await db.photos.get(sha);
    expect(stored?.blob).toBeInstanceOf(Blob);
    expect(stored?.blob.size).toBe(3);
    expect(await uploadPhotos()).toBe(0);
    expect(server.photos.size).toBe(0);
  });

  it('uploads it by its hash after the defect, then marks it uploaded', async () => {
    await defectWithPhoto();
    const report = await syncOnce();
    expect(report.photos).toBe(1);
    expect(server.photos.get(sha)?.size).toBe(3);
    expect((await db.photos.get(sha))?.state).toBe('uploaded');
    const order = server.requests.map((r) => r.path).filter((p) => !p.includes('pull'));
    expect(order).toEqual(['/api/sync/push', `/api/photos/${sha}`]);
  });

  it('keeps the server’s reason when it refuses a photo, and retries on a 500', async () => {
    await defectWithPhoto();
    await pushOutbox();
    server.interruptWith(({ path }) =>
      path.startsWith('/api/photos') ? json(503, { message: 'busy' }) : undefined,
    );
    await expect(uploadPhotos()).rejects.toThrow(/busy/);
    expect((await db.photos.get(sha))?.state).toBe('waiting');

    server.interruptWith(({ path }) =>
      path.startsWith('/api/photos')
        ? json(415, { message: 'not a JPEG, PNG or WebP' })
        : undefined,
    );
    await uploadPhotos();
    expect(await db.photos.get(sha)).toMatchObject({
      state: 'rejected',
      reason: 'not a JPEG, PNG or WebP',
    });
  });
});

describe('pull', () => {
  it('pages through the change log and remembers the cursor', async () => {
    const changes = Array.from({ length: 1200 }, (_, i) => ({
      seq: i + 1,
      kind: 'press' as const,
      id: `press-${i % 4}`,
      data: { id: `press-${i % 4}`, name: `Press ${i + 1}` },
    }));
    server = fakePlantServer({ changes });
    vi.stubGlobal('fetch', server.fetch);

    expect(await pullChanges()).toBe(1200);
    const pulls = server.requests.filter((r) => r.path === '/api/sync/pull');
    expect(pulls).toHaveLength(3);
    // Later changes to an id replace earlier ones.
    const press0 = await db.server.get({ kind: 'press', id: 'press-0' });
    expect(press0?.data).toMatchObject({ name: 'Press 1197' });

    expect(await pullChanges()).toBe(0);
  });
});
