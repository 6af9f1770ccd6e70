import { getMeta, setMeta } from './db';
import { describeSyncError, syncOnce, type SyncReport } from './sync';

/** What the status strip shows about syncing; kept in the device store so every tab sees it. */
export interface SyncStatus {
  running: boolean;
  /** The end of the last pass that completed without an error. */
  lastSyncAt?: string;
  lastAttemptAt?: string;
  error?: string;
  /** When the next automatic attempt may run after failures. */
  nextRetryAt?: string;
  failures: number;
}

export const SYNC_STATUS_KEY = 'syncStatus';

export interface SchedulerOptions {
  intervalMs: number;
  /** First wait after a failure; doubled on each further failure up to maxBackoffMs. */
  backoffMs: number;
  maxBackoffMs: number;
  /** Short pause after a local write, so a burst of entries goes out as one batch. */
  settleMs: number;
}

const DEFAULTS: SchedulerOptions = {
  intervalMs: 30_000,
  backoffMs: 2_000,
  maxBackoffMs: 5 * 60_000,
  settleMs: 1_500,
};

/**
 * Decides when to sync: at start, when the connection returns, on an interval, shortly after
 * a local write, and when someone asks. Only one pass runs at a time; a request during a pass
 * runs one more pass after it. Failures back off exponentially with jitter so that a hall of
 * tablets coming back online does not hit the server in step.
 */
export class SyncScheduler {
  private status: SyncStatus = { running: false, failures: 0 };
  private restored = false;
  private current?: Promise<void>;
  private again = false;
  private readonly timers = new Set<ReturnType<typeof setTimeout>>();
  private interval?: ReturnType<typeof setInterval>;
  private readonly options: SchedulerOptions;

  constructor(
    private readonly run: () => Promise<SyncReport> = syncOnce,
    options: Partial<SchedulerOptions> = {},
  ) {
    this.options = { ...DEFAULTS, ...options };
  }

  start(): void {
    window.addEventListener('online', this.onOnline);
    this.interval = setInterval(this.onTick, this.options.intervalMs);
    void this.syncNow();
  }

  stop(): void {
    window.removeEventListener('online', this.onOnline);
    clearInterval(this.interval);
    this.timers.forEach(clearTimeout);
    this.timers.clear();
  }

  /** On demand: ignores any backoff. Resolves when the pass (and any queued one) is over. */
  syncNow(): Promise<void> {
    if (this.current) {
      this.again = true;
      return this.current;
    }
    this.current = this.loop().finally(() => {
      this.current = undefined;
    });
    return this.current;
  }

  /** After a local write: wait a moment for more, then sync if the device is online. */
  syncSoon(): void {
    this.syncIfOnlineIn(this.options.settleMs);
  }

  private syncIfOnlineIn(ms: number): void {
    const timer = setTimeout(() => {
      this.timers.delete(timer);
      if (navigator.onLine) void this.syncNow();
    }, ms);
    this.timers.add(timer);
  }

  private readonly onOnline = () => {
    this.status = { ...this.status, failures: 0, nextRetryAt: undefined };
    void this.syncNow();
  };

  private readonly onTick = () => {
    if (!navigator.onLine) return;
    const retryAt = this.status.nextRetryAt ? Date.parse(this.status.nextRetryAt) : 0;
    if (Date.now() >= retryAt) void this.syncNow();
  };

  private async loop(): Promise<void> {
    do {
      this.again = false;
      await this.pass();
    } while (this.again);
  }

  private async pass(): Promise<void> {
    if (!this.restored) {
      // Keep the last sync time across reloads; a pass left "running" by a closed tab is over.
      const stored = await getMeta<SyncStatus>(SYNC_STATUS_KEY);
      this.status = { ...this.status, ...stored, running: false };
      this.restored = true;
    }
    const startedAt = new Date().toISOString();
    await this.publish({ ...this.status, running: true, lastAttemptAt: startedAt });
    try {
      await this.run();
      await this.publish({
        running: false,
        lastSyncAt: new Date().toISOString(),
        lastAttemptAt: startedAt,
        failures: 0,
      });
    } catch (error) {
      const failures = this.status.failures + 1;
      const wait = Math.min(
        this.options.maxBackoffMs,
        this.options.backoffMs * 2 ** (failures - 1),
      );
      const jittered = wait * (0.5 + Math.random() / 2);
      await this.publish({
        ...this.status,
        running: false,
        error: describeSyncError(error),
        failures,
        nextRetryAt: new Date(Date.now() + jittered).toISOString(),
      });
      this.syncIfOnlineIn(jittered);
    }
  }

  private async publish(status: SyncStatus): Promise<void> {
    this.status = status;
    await setMeta(SYNC_STATUS_KEY, status);
  }
}

export const syncScheduler = new SyncScheduler();
