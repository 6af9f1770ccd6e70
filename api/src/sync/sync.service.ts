import { ForbiddenException, Injectable, Logger } from '@nestjs/common';
import { In, type EntityManager } from 'typeorm';
import type { AuthUser } from '../auth/access.js';
import { AuthService, vouchesFor } from '../auth/auth.service.js';
import { errorBody } from '../common/error.filter.js';
import { validated } from '../common/validation.js';
import { Transactions } from '../database/transactions.js';
import { InspectionsService } from '../inspections/inspections.service.js';
import { LotsService } from '../lots/lots.service.js';
import { MailService } from '../mail/mail.service.js';
import { User } from '../users/entities/user.entity.js';
import {
  DefectRecordPayload,
  InspectionRecordPayload,
  LotOpenPayload,
  LotSubmitPayload,
} from './dto/operations.dto.js';
import type { OperationDto, PushDto } from './dto/push.dto.js';
import { AppliedOp } from './entities/applied-op.entity.js';
import { OpRejected, type OpContext } from './op-context.js';

export interface OpResult {
  opId: string;
  status: 'applied' | 'duplicate' | 'rejected';
  reason?: string;
}

type Handler = (ctx: OpContext, payload: object) => Promise<string>;

// Devices keep their own clocks; allow a little drift before calling a time "in the future".
const CLOCK_SLACK_MS = 5 * 60 * 1000;
const AUTHOR_ROLES = new Set(['inspector', 'supervisor']);

@Injectable()
export class SyncService {
  private readonly logger = new Logger('Sync');
  private readonly handlers: Record<string, { payload: new () => object; apply: Handler }>;

  constructor(
    private readonly transactions: Transactions,
    private readonly auth: AuthService,
    private readonly lots: LotsService,
    private readonly inspections: InspectionsService,
    private readonly mail: MailService,
  ) {
    this.handlers = {
      'lot.open': {
        payload: LotOpenPayload,
        apply: (c, p) => this.lots.open(c, p as LotOpenPayload),
      },
      'inspection.record': {
        payload: InspectionRecordPayload,
        apply: (c, p) => this.inspections.record(c, p as InspectionRecordPayload),
      },
      'defect.record': {
        payload: DefectRecordPayload,
        apply: (c, p) => this.inspections.recordDefect(c, p as DefectRecordPayload),
      },
      'lot.submit': {
        payload: LotSubmitPayload,
        apply: (c, p) => this.lots.submit(c, p as LotSubmitPayload),
      },
    };
  }

  /**
   * Applies a batch in one transaction, each operation in its own savepoint: a rejected one
   * leaves nothing behind and the rest go on. Applied opIds are kept for good, so a retry of
   * the same batch answers 'duplicate' for each and changes nothing.
   */
  async push(user: AuthUser, { deviceId, operations }: PushDto): Promise<{ results: OpResult[] }> {
    if (user.deviceId !== deviceId) {
      throw new ForbiddenException(
        'deviceId is not the device this sign-in was made on; sign in with this deviceId',
      );
    }
    // Validation is the slow, asynchronous part: do it before taking the writers' queue.
    const payloads = await Promise.all(
      operations.map(async (op) => {
        const handler = this.handlers[op.type];
        if (!handler) return { problem: `unknown operation type ${op.type}` };
        const checked = await validated(handler.payload, op.payload);
        if ('problems' in checked) {
          return {
            problem: checked.problems
              .map((p) => `${p.field}: ${p.messages.join('; ')}`)
              .join(' | '),
          };
        }
        return { value: checked.value, apply: handler.apply };
      }),
    );
    const results = await this.transactions.run(async (manager) => {
      const done = new Set(
        (await manager.findBy(AppliedOp, { opId: In(operations.map((op) => op.opId)) })).map(
          (a) => a.opId,
        ),
      );
      const authors = await this.authors(manager, operations, deviceId);
      const applied: AppliedOp[] = [];
      const touched = new Set<string>();
      const out: OpResult[] = [];
      for (const [index, op] of operations.entries()) {
        const prepared = payloads[index] ?? { problem: 'missing' };
        if (done.has(op.opId)) {
          out.push({ opId: op.opId, status: 'duplicate' });
          continue;
        }
        const recordedAt = new Date(op.recordedAt);
        const refusal =
          'problem' in prepared
            ? prepared.problem
            : recordedAt.getTime() > Date.now() + CLOCK_SLACK_MS
              ? `recordedAt ${op.recordedAt} is in the future`
              : authors(op.authorId, recordedAt);
        if (refusal || !('apply' in prepared)) {
          out.push({ opId: op.opId, status: 'rejected', reason: refusal ?? 'not applicable' });
          continue;
        }
        const ctx: OpContext = { manager, authorId: op.authorId, deviceId, recordedAt };
        const outcome = await this.inSavepoint(manager, () => prepared.apply(ctx, prepared.value));
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
      // One multi-row insert per chunk instead of a statement per op (SQLite caps bound values).
      for (let i = 0; i < applied.length; i += 100) {
        await manager.insert(AppliedOp, applied.slice(i, i + 100));
      }
      for (const lotId of touched) await this.lots.recount(manager, lotId);
      return out;
    });
    void this.mail.flush();
    return { results };
  }

  /**
   * The rule of sync/README.md "Who wrote it": the author is active, may record, and signed in on
   * this device no later than the op was recorded. Returns a checker giving the refusal, if any.
   */
  private async authors(manager: EntityManager, operations: OperationDto[], deviceId: string) {
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
      if (error instanceof OpRejected) return { reason: error.message };
      const body = errorBody(error);
      if (body.statusCode >= 500) this.logger.error(error);
      return { reason: body.statusCode >= 500 ? 'the server could not apply it' : body.message };
    }
  }
}
