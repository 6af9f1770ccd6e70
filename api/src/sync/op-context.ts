import type { EntityManager } from 'typeorm';

/** Everything an operation handler needs besides its payload. */
export interface OpContext {
  manager: EntityManager;
  authorId: string;
  deviceId: string;
  recordedAt: Date;
}

/** An operation that cannot be applied; the reason goes back to the tablet with 'rejected'. */
export class OpRejected extends Error {}
