import { db, type OutboxOp } from './db';
import { recordId } from './recordId';

export interface NewOperation {
  type: string;
  payload: unknown;
  authorId: string;
  recordId: string;
}

/**
 * Queues an operation. Call it inside the same Dexie transaction that writes the local
 * record, so a record is never stored without its operation or the other way round.
 */
export async function enqueue(operation: NewOperation): Promise<OutboxOp> {
  const op: OutboxOp = {
    ...operation,
    opId: recordId(),
    state: 'waiting',
    createdAt: new Date().toISOString(),
  };
  op.seq = await db.outbox.add(op);
  return op;
}

/** Operations still to push, oldest first: the server sees them in the order they were made. */
export function waitingOps(): Promise<OutboxOp[]> {
  return db.outbox.where('state').equals('waiting').sortBy('seq');
}

export async function markSent(opIds: string[]): Promise<void> {
  const sentAt = new Date().toISOString();
  await db.outbox.where('opId').anyOf(opIds).modify({ state: 'sent', sentAt, reason: undefined });
}

export async function markRejected(opId: string, reason: string): Promise<void> {
  await db.outbox.where('opId').equals(opId).modify({ state: 'rejected', reason });
}

/**
 * Puts a refused operation back in line under the same opId: the server applied nothing for
 * it, so it may be sent again — e.g. once the lot it names has reached the server.
 */
export async function sendAgain(opId: string): Promise<void> {
  await db.outbox.where('opId').equals(opId).modify({ state: 'waiting', reason: undefined });
}
