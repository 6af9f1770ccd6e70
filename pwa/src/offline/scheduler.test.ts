import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { db, getMeta } from './db';
import { SYNC_STATUS_KEY, SyncScheduler, type SyncStatus } from './scheduler';
import { NetworkError } from '../api/http';

const report = { sent: 0, rejected: 0, photos: 0, pulled: 0 };
const options = { intervalMs: 30_000, backoffMs: 2_000, maxBackoffMs: 16_000, settleMs: 1_000 };

async function flush() {
  // Let the pass's IndexedDB writes finish between timer steps.
  for (let i = 0; i < 5; i++) await vi.advanceTimersByTimeAsync(0);
}

describe('SyncScheduler', () => {
  let scheduler: SyncScheduler | undefined;

  beforeEach(async () => {
    await db.meta.clear();
    vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout', 'setInterval', 'clearInterval'] });
    vi.spyOn(Math, 'random').mockReturnValue(1); // no jitter: waits are exactly the backoff
  });

  afterEach(() => {
    scheduler?.stop();
    vi.useRealTimers();
    vi.restoreAllMocks();
  });

  it('backs off 2, 4, 8, 16, 16 s after failures and records the error', async () => {
    const run = vi.fn().mockRejectedValue(new NetworkError('Failed to fetch'));
    scheduler = new SyncScheduler(run, options);
    scheduler.start();
    await flush();
    expect(run).toHaveBeenCalledTimes(1);
    for (const [wait, calls] of [
      [2_000, 2],
      [4_000, 3],
      [8_000, 4],
      [16_000, 5],
      [16_000, 6],
    ] as const) {
      await vi.advanceTimersByTimeAsync(wait - 1);
      expect(run).toHaveBeenCalledTimes(calls - 1);
      await vi.advanceTimersByTimeAsync(1);
      await flush();
      expect(run).toHaveBeenCalledTimes(calls);
    }
    const status = await getMeta<SyncStatus>(SYNC_STATUS_KEY);
    expect(status).toMatchObject({ running: false, failures: 6 });
    expect(status?.error).toMatch(/No connection/);
  });

  it('syncs as soon as the connection returns, whatever the backoff', async () => {
    const run = vi
      .fn()
      .mockRejectedValueOnce(new NetworkError('offline'))
      .mockResolvedValue(report);
    scheduler = new SyncScheduler(run, { ...options, backoffMs: 60_000 });
    scheduler.start();
    await flush();
    window.dispatchEvent(new Event('online'));
    await flush();
    expect(run).toHaveBeenCalledTimes(2);
    const status = await getMeta<SyncStatus>(SYNC_STATUS_KEY);
    expect(status?.error).toBeUndefined();
    expect(status?.lastSyncAt).toBeDefined();
  });

  it('syncs on its interval while healthy', async () => {
    const run = vi.fn().mockResolvedValue(report);
    scheduler = new SyncScheduler(run, options);
    scheduler.start();
    await flush();
    await vi.advanceTimersByTimeAsync(30_000);
    await flush();
    await vi.advanceTimersByTimeAsync(30_000);
    await flush();
    expect(run).toHaveBeenCalledTimes(3);
  });

  it('runs one more pass, not several, when asked during a pass', async () => {
    let finish: () => void = () => undefined;
    const run = vi.fn(
      () => new Promise<typeof report>((resolve) => (finish = () => resolve(report))),
    );
    scheduler = new SyncScheduler(run, options);
    const first = scheduler.syncNow();
    void scheduler.syncNow();
    void scheduler.syncNow();
    await flush();
    finish();
    await flush();
    finish();
    await first;
    expect(run).toHaveBeenCalledTimes(2);
  });
});
