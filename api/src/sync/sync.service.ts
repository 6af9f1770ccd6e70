import { ForbiddenException, Injectable, Logger } from '@nestjs/common';
import { In, type EntityManager } from 'typeorm';
import type { AuthUser } from '../auth/access.js';
import { AuditService } from '../audit/audit.service.js';
import { AuthService, vouchesFor } from '../auth/auth.service.js';
import { errorBody } from '../common/error.filter.js';
import { insertRows } from '../database/insert-rows.js';
import { storedKeys } from '../database/stored-keys.js';
import { Transactions } from '../database/transactions.js';
import { InspectionsService } from '../inspections/inspections.service.js';
import { LotsService } from '../lots/lots.service.js';
import { MailService } from '../mail/mail.service.js';
import { User } from '../users/entities/user.entity.js';
import type {
  DefectRecordPayload,
  InspectionRecordPayload,
  LotOpenPayload,
  LotSubmitPayload,
} from './dto/operations.dto.js';
import type { OperationDto, OperationType, PushRequest } from './dto/push.dto.js';
import { AppliedOp } from './entities/applied-op.entity.js';
import { OpBatch, OpRejected, type OpContext } from './op-context.js';

export interface OpResult {
  opId: string;
  status: 'applied' | 'duplicate' | 'rejected';
  reason?: string;
}

// Devices keep their own clocks; allow a little drift before calling a time "in the future".
const CLOCK_SLACK_MS = 5 * 60 * 1000;
const AUTHOR_ROLES = new Set(['inspector', 'supervisor']);
// Handlers that only queue their rows on the batch (written in bulk later) and refuse before they
// queue anything: they need no savepoint of their own.
const QUEUED = new Set<OperationType>(['inspection.record']);

@Injectable()
export class SyncService {
  private readonly logger = new Logger('Sync');
  /** Each handler applies one op and returns the id of the lot it touched. */
  private readonly handlers: Record<
    OperationType,
    (ctx: OpContext, payload: object) => Promise<string>
  >;

  constructor(
    private readonly transactions: Transactions,
    private readonly auth: AuthService,
    private readonly audit: AuditService,
    private readonly lots: LotsService,
    private readonly inspections: InspectionsService,
    private readonly mail: MailService,
  ) {
    this.handlers = {
      'lot.open': (ctx, p) => this.lots.open(ctx, p as LotOpenPayload),
      'inspection.record': (ctx, p) => this.inspections.record(ctx, p as InspectionRecordPayload),
      'defect.record': (ctx, p) => this.inspections.recordDefect(ctx, p as DefectRecordPayload),
      'lot.submit': (ctx, p) => this.lots.submit(ctx, p as LotSubmitPayload),
    };
  }

  /**
   * Applies a batch in one transaction, each operation that writes on its own in its own
   * savepoint: a rejected one leaves nothing behind and the rest go on. Queued records are
   * written before such an operation and at the end. Applied opIds are kept for good, so a retry
   * of the same batch answers 'duplicate' for each and changes nothing. Then every lot the batch
   * touched is judged again.
   */
  async push(
    user: AuthUser,
    { deviceId, operations, problems }: PushRequest,
  ): Promise<{ results: OpResult[] }> {
    if (user.deviceId !== deviceId) {
      throw new ForbiddenException(
        'deviceId is not the device this sign-in was made on; sign in with this deviceId',
      );
    }
    const results = await this.transactions.run(async (manager) => {
      const done = await storedKeys(
        manager,
        AppliedOp,
        'opId',
        operations.map((op) => op.opId),
      );
      const refusal = await this.authorRule(manager, operations, deviceId);
      const batch = new OpBatch();
      await this.inspections.reserve(
        manager,
        batch,
        operations
          .filter((op, i) => op.type === 'inspection.record' && !problems[i] && !done.has(op.opId))
          .map((op) => (op.payload as InspectionRecordPayload).id),
      );
      const applied: AppliedOp[] = [];
      const touched = new Set<string>();
      const out: OpResult[] = [];
      for (const [index, op] of operations.entries()) {
        if (done.has(op.opId)) {
          out.push({ opId: op.opId, status: 'duplicate' });
          continue;
        }
        const recordedAt = new Date(op.recordedAt);
        const reason = problems[index] ?? refusal(op.authorId, recordedAt);
        if (reason) {
          out.push({ opId: op.opId, status: 'rejected', reason });
          continue;
        }
        const ctx: OpContext = { manager, authorId: op.authorId, deviceId, recordedAt, batch };
        const apply = () => this.handlers[op.type](ctx, op.payload);
        const queued = QUEUED.has(op.type);
        if (!queued) await this.inspections.flush(manager, batch);
        const outcome = queued
          ? await this.refusing(apply)
          : await this.inSavepoint(manager, apply);
        if (typeof outcome === 'object') {
          out.push({ opId: op.opId, status: 'rejected', reason: outcome.reason });
          continue;
        }
        touched.add(outcome);
        done.add(op.opId);
        applied.push({
          opId: op.opId,
          deviceId,
          type: op.type,
          authorId: op.authorId,
          appliedAt: new Date(),
        });
        out.push({ opId: op.opId, status: 'applied' });
      }
      await this.inspections.flush(manager, batch);
      await insertRows(manager, AppliedOp, applied);
      await this.audit.recordMany(manager, batch.audit);
      for (const lotId of touched) await this.lots.recount(manager, lotId);
      return out;
    });
    void this.mail.flush();
    return { results };
  }

  /**
   * The rule of sync/README.md "Who wrote it": the author is active, may record, and had signed
   * in on this device when the op was recorded. Returns a checker that gives the refusal, if any.
   */
  private async authorRule(manager: EntityManager, operations: OperationDto[], deviceId: string) {
    const ids = [...new Set(operations.map((op) => op.authorId))];
    const [users, sessions] = await Promise.all([
      manager.findBy(User, { id: In(ids) }).then((found) => new Map(found.map((u) => [u.id, u]))),
      this.auth.deviceSessions(ids, deviceId),
    ]);
    return (authorId: string, recordedAt: Date): string | undefined => {
      const user = users.get(authorId);
      if (!user?.active || !AUTHOR_ROLES.has(user.role)) {
        return `authorId ${authorId} is not an active inspector or supervisor`;
      }
      if (recordedAt.getTime() > Date.now() + CLOCK_SLACK_MS) {
        return `recordedAt ${recordedAt.toISOString()} is in the future`;
      }
      if (!vouchesFor(sessions.get(authorId) ?? [], recordedAt)) {
        return `authorId ${authorId} had not signed in on device ${deviceId} at ${recordedAt.toISOString()}`;
      }
      return undefined;
    };
  }

  /** Runs one op in a savepoint; a failure rolls back to it and comes back as the reason. */
  private async inSavepoint(
    manager: EntityManager,
    apply: () => Promise<string>,
  ): Promise<string | { reason: string }> {
    const runner = manager.queryRunner!;
    await runner.startTransaction();
    try {
      const lotId = await apply();
      await runner.commitTransaction();
      return lotId;
    } catch (error) {
      await runner.rollbackTransaction();
      return this.reasonOf(error);
    }
  }

  /** Runs one op that writes nothing itself; a failure comes back as the reason. */
  private async refusing(apply: () => Promise<string>): Promise<string | { reason: string }> {
    try {
      return await apply();
    } catch (error) {
      return this.reasonOf(error);
    }
  }

  private reasonOf(error: unknown): { reason: string } {
    if (error instanceof OpRejected) return { reason: error.message };
    const body = errorBody(error);
    if (body.statusCode >= 500) this.logger.error(error);
    return { reason: body.statusCode >= 500 ? 'the server could not apply it' : body.message };
  }
}
