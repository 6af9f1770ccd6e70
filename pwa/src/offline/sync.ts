/**
 * One sync pass: push the outbox (oldest first), upload photos whose defect the server has,
 * then pull what the server owns. Safe to interrupt at any point: every opId is applied at
 * most once by the server, photos are addressed by hash, and the pull cursor is stored in
 * the same transaction as the rows it delivered.
 */
import { callAs } from '../api/client';
import { ApiError, NetworkError, type RequestOptions } from '../api/http';
import type { PullAnswer, PushOperation, PushResult } from '../api/types';
import { SignInNeeded } from '../auth/tokens';
import { db, deviceId, getMeta, setMeta, type OutboxOp } from './db';
import { markRejected, markSent, waitingOps } from './outbox';

export const PUSH_BATCH = 200;
const PULL_PAGE = 500;

export interface SyncOptions {
  /** How long one request may go unanswered before the pass gives up and backs off. */
  timeoutMs: number;
  /** Photos are larger and a press-side link is slow: they get longer. */
  photoTimeoutMs: number;
}

const DEFAULT_OPTIONS: SyncOptions = { timeoutMs: 15_000, photoTimeoutMs: 60_000 };

export interface SyncReport {
  sent: number;
  rejected: number;
  photos: number;
  pulled: number;
}

/** Nothing could be sent because no one on this device has a usable sign-in. */
export class NoSignIn extends Error {
  constructor() {
    super('Sign in with a password to send what is waiting.');
    this.name = 'NoSignIn';
  }
}

/** The current person first, then anyone else signed in here: any of them may push. */
async function candidates(): Promise<string[]> {
  const current = await getMeta<string>('currentUserId');
  const people = await db.people.toArray();
  const withTokens = people
    .filter((p) => p.refreshToken || p.accessToken)
    .sort((a, b) => b.lastActiveAt.localeCompare(a.lastActiveAt))
    .map((p) => p.userId);
  return current && withTokens.includes(current)
    ? [current, ...withTokens.filter((id) => id !== current)]
    : withTokens;
}

/** Runs the request as someone signed in on this device, trying the next person when one is spent. */
async function authorized<T>(path: string, options: Omit<RequestOptions, 'token'>): Promise<T> {
  for (const userId of await candidates()) {
    try {
      return await callAs<T>(userId, path, options);
    } catch (error) {
      if (!(error instanceof SignInNeeded)) throw error;
    }
  }
  throw new NoSignIn();
}

/** `operations.3.payload.load` → 3: a validation error that names one op of the batch. */
function failingIndex(error: ApiError): number | undefined {
  const match = /^operations\.(\d+)\b/.exec(error.field ?? '');
  return match ? Number(match[1]) : undefined;
}

function asPushOperation(op: OutboxOp): PushOperation {
  return {
    opId: op.opId,
    type: op.type,
    authorId: op.authorId,
    recordedAt: op.createdAt,
    payload: op.payload,
  };
}

async function pushBatch(
  batch: OutboxOp[],
  device: string,
  options: SyncOptions,
): Promise<SyncReport> {
  const report: SyncReport = { sent: 0, rejected: 0, photos: 0, pulled: 0 };
  let pending = batch;
  while (pending.length > 0) {
    try {
      const { results } = await authorized<{ results: PushResult[] }>('/sync/push', {
        method: 'POST',
        body: { deviceId: device, operations: pending.map(asPushOperation) },
        timeoutMs: options.timeoutMs,
      });
      const sent = results.filter((r) => r.status !== 'rejected').map((r) => r.opId);
      await markSent(sent);
      for (const r of results.filter((result) => result.status === 'rejected')) {
        await markRejected(r.opId, r.reason ?? 'rejected by the server');
      }
      // Ops without an answer stay waiting for the next pass.
      report.sent += sent.length;
      report.rejected += results.length - sent.length;
      return report;
    } catch (error) {
      // A whole-batch refusal that names one op: set that op aside and send the rest again.
      const index = error instanceof ApiError && !error.retryable ? failingIndex(error) : undefined;
      const culprit = index === undefined ? undefined : pending[index];
      if (!culprit) throw error;
      await markRejected(culprit.opId, (error as ApiError).reason);
      report.rejected += 1;
      pending = pending.filter((op) => op !== culprit);
    }
  }
  return report;
}

export async function pushOutbox(options = DEFAULT_OPTIONS): Promise<SyncReport> {
  const total: SyncReport = { sent: 0, rejected: 0, photos: 0, pulled: 0 };
  const ops = await waitingOps();
  const device = await deviceId();
  for (let start = 0; start < ops.length; start += PUSH_BATCH) {
    const part = await pushBatch(ops.slice(start, start + PUSH_BATCH), device, options);
    total.sent += part.sent;
    total.rejected += part.rejected;
  }
  return total;
}

/** The defect's operation must be on the server first; otherwise the photo would be orphaned. */
async function defectArrived(defectId: string): Promise<boolean> {
  const ops = await db.outbox.where('recordId').equals(defectId).toArray();
  return ops.length > 0 && ops.every((op) => op.state === 'sent');
}

export async function uploadPhotos(options = DEFAULT_OPTIONS): Promise<number> {
  const waiting = await db.photos.where('state').equals('waiting').toArray();
  let uploaded = 0;
  for (const photo of waiting) {
    if (!(await defectArrived(photo.defectId))) continue;
    try {
      const form = new FormData();
      form.append('file', photo.blob, `${photo.sha256}.${photo.mime.split('/')[1] ?? 'bin'}`);
      await authorized(`/photos/${photo.sha256}`, {
        method: 'PUT',
        body: form,
        timeoutMs: options.photoTimeoutMs,
      });
    } catch (error) {
      if (error instanceof ApiError && !error.retryable) {
        await db.photos.update(photo.sha256, { state: 'rejected', reason: error.reason });
        continue;
      }
      throw error;
    }
    await db.photos.update(photo.sha256, { state: 'uploaded', reason: undefined });
    uploaded += 1;
  }
  return uploaded;
}

export async function pullChanges(options = DEFAULT_OPTIONS): Promise<number> {
  let pulled = 0;
  for (;;) {
    const since = (await getMeta<number | string>('pullCursor')) ?? 0;
    const answer = await authorized<PullAnswer>(
      `/sync/pull?since=${encodeURIComponent(since)}&limit=${PULL_PAGE}`,
      { timeoutMs: options.timeoutMs },
    );
    await db.transaction('rw', db.server, db.meta, async () => {
      // Later changes to the same id replace earlier ones, so a plain put in order is right.
      await db.server.bulkPut(answer.changes.map(({ kind, id, data }) => ({ kind, id, data })));
      await setMeta('pullCursor', answer.cursor);
    });
    pulled += answer.changes.length;
    if (!answer.more || answer.changes.length === 0) return pulled;
  }
}

export async function syncOnce(options: Partial<SyncOptions> = {}): Promise<SyncReport> {
  const all = { ...DEFAULT_OPTIONS, ...options };
  const report = await pushOutbox(all);
  report.photos = await uploadPhotos(all);
  report.pulled = await pullChanges(all);
  return report;
}

/** Words for the status strip: what went wrong, in terms an inspector can act on. */
export function describeSyncError(error: unknown): string {
  if (error instanceof NetworkError) return `No connection to the plant server (${error.reason}).`;
  if (error instanceof ApiError) return `The server answered ${error.status}: ${error.reason}`;
  if (error instanceof NoSignIn) return error.message;
  return error instanceof Error ? error.message : String(error);
}
