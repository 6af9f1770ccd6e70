import type { EntityManager } from 'typeorm';
import type { AuditRow } from '../audit/audit.service.js';
import type { Inspection } from '../inspections/entities/inspection.entity.js';
import type { Lot } from '../lots/entities/lot.entity.js';

/**
 * What one push has already read or written, so that each operation costs only its own work.
 * Handlers change it only after their writes succeeded: a rejected op leaves it as it was.
 */
export class OpBatch {
  readonly lots = new Map<string, Lot>();
  /** Per lot: sample index → id of that sample's current record. */
  readonly samples = new Map<string, Map<number, string>>();
  /** Audit entries of applied ops, written in bulk once the ops are done. */
  readonly audit: AuditRow[] = [];
  /**
   * Sampled-part records of applied ops, checked but not yet written: they go in bulk before the
   * next op that writes on its own, and at the end of the batch.
   */
  readonly inspections: Inspection[] = [];
  /** Inspection ids this batch may not use: stored already, or taken by an earlier op. */
  readonly inspectionIds = new Set<string>();
}

/** Everything an operation handler needs besides its payload. */
export interface OpContext {
  manager: EntityManager;
  authorId: string;
  deviceId: string;
  recordedAt: Date;
  batch: OpBatch;
}

/** An operation that cannot be applied; the reason goes back to the tablet with 'rejected'. */
export class OpRejected extends Error {}
