import { randomUUID } from 'node:crypto';
import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import {
  Between,
  IsNull,
  LessThanOrEqual,
  MoreThanOrEqual,
  Not,
  Repository,
  type EntityManager,
  type FindOptionsWhere,
} from 'typeorm';
import { ChangeFeed } from '../changes/change-feed.service.js';
import { Transactions } from '../database/transactions.js';
import { lotVerdict, partVerdict, samplingPlan, type PartVerdict } from '../engine.js';
import { Defect } from '../inspections/entities/defect.entity.js';
import { Inspection } from '../inspections/entities/inspection.entity.js';
import { MailService } from '../mail/mail.service.js';
import { Press } from '../presses/entities/press.entity.js';
import { SpecRevision } from '../specs/entities/spec-revision.entity.js';
import { SpecsService } from '../specs/specs.service.js';
import { AuditService, auditRow } from '../audit/audit.service.js';
import { OpRejected, type OpContext } from '../sync/op-context.js';
import type { LotOpenPayload, LotSubmitPayload } from '../sync/dto/operations.dto.js';
import { User } from '../users/entities/user.entity.js';
import type { DispositionDto, LotQueryDto } from './dto/lot.dto.js';
import { Disposition } from './entities/disposition.entity.js';
import { Lot, type LotVerdict } from './entities/lot.entity.js';

export interface JudgedPart {
  inspection: Inspection;
  defects: Defect[];
  verdict: PartVerdict;
}

export type InspectionView = Inspection & { supersededBy: string | null };
export type LotDetail = Lot & {
  inspections: InspectionView[];
  defects: Defect[];
  dispositions: Disposition[];
};

/** Inspections that no later revision replaces: the ones a lot is judged on. */
export function currentInspections(all: Inspection[]): Inspection[] {
  const replaced = new Set(all.map((i) => i.supersedesId).filter(Boolean));
  return all.filter((i) => !replaced.has(i.id));
}

@Injectable()
export class LotsService {
  constructor(
    private readonly transactions: Transactions,
    private readonly audit: AuditService,
    private readonly feed: ChangeFeed,
    private readonly mail: MailService,
    private readonly specs: SpecsService,
    @InjectRepository(Lot) private readonly lots: Repository<Lot>,
  ) {}

  list(query: LotQueryDto): Promise<Lot[]> {
    const where: FindOptionsWhere<Lot> = {};
    if (query.status) where.status = query.status;
    if (query.pressId) where.pressId = query.pressId;
    if (query.specId) where.specId = query.specId;
    // true: the review queue (flagged, no disposition yet); false: lots the server has not flagged.
    if (query.flagged === true)
      Object.assign(where, { serverVerdict: 'flagged', dispositionAction: IsNull() });
    if (query.flagged === false) where.serverVerdict = Not('flagged');
    if (query.from && query.to) where.openedAt = Between(new Date(query.from), new Date(query.to));
    else if (query.from) where.openedAt = MoreThanOrEqual(new Date(query.from));
    else if (query.to) where.openedAt = LessThanOrEqual(new Date(query.to));
    return this.lots.find({ where, order: { openedAt: 'DESC' }, take: query.limit ?? 200 });
  }

  async get(id: string): Promise<LotDetail> {
    const lot = await this.lots.findOneBy({ id });
    if (!lot) throw new NotFoundException(`No lot ${id}`);
    const manager = this.lots.manager;
    const [inspections, defects, dispositions] = await Promise.all([
      manager.find(Inspection, {
        where: { lotId: id },
        order: { sampleIndex: 'ASC', recordedAt: 'ASC' },
      }),
      manager.find(Defect, { where: { lotId: id }, order: { recordedAt: 'ASC' } }),
      manager.find(Disposition, { where: { lotId: id }, order: { decidedAt: 'ASC' } }),
    ]);
    const supersededBy = new Map(inspections.map((i) => [i.supersedesId, i.id]));
    return {
      ...lot,
      inspections: inspections.map((i) => ({ ...i, supersededBy: supersededBy.get(i.id) ?? null })),
      defects,
      dispositions,
    };
  }

  /** `lot.open`: the lot gets the sampling plan of its spec revision for its size, for good. */
  async open(ctx: OpContext, p: LotOpenPayload): Promise<string> {
    const { manager } = ctx;
    const revision = await manager.findOneBy(SpecRevision, { id: p.specRevisionId });
    if (revision?.status !== 'released') {
      throw new OpRejected(`specRevisionId ${p.specRevisionId} is not a released spec revision`);
    }
    const press = await manager.findOneBy(Press, { id: p.pressId });
    if (!press?.active) throw new OpRejected(`pressId ${p.pressId} is not an active press`);
    if (await manager.existsBy(Lot, { id: p.id }))
      throw new OpRejected(`lot ${p.id} already exists`);
    if (await manager.existsBy(Lot, { lotNumber: p.lotNumber })) {
      throw new OpRejected(`lotNumber ${p.lotNumber} is already used by another lot`);
    }
    const lot: Lot = {
      id: p.id,
      lotNumber: p.lotNumber,
      specId: revision.specId,
      specRevisionId: revision.id,
      pressId: press.id,
      cavity: p.cavity,
      lotSize: p.lotSize,
      moldedAt: new Date(p.moldedAt),
      openedBy: ctx.authorId,
      openedAt: ctx.recordedAt,
      deviceId: ctx.deviceId,
      status: 'open',
      plan: samplingPlan({ lotSize: p.lotSize, ...revision.body.sampling }),
      inspected: 0,
      nonconforming: 0,
      serverVerdict: 'pending',
      verdictReason: '',
      deviceVerdict: null,
      submittedAt: null,
      flaggedAt: null,
      dispositionAction: null,
    };
    await manager.insert(Lot, lot);
    await this.feed.publish(manager, 'lot', lot.id, lot);
    ctx.batch.audit.push(auditRow(ctx, 'lot.open', 'lot', lot.id, null, lot));
    ctx.batch.lots.set(lot.id, lot);
    // A lot made just now has no records yet: its records in this batch need not look for any.
    ctx.batch.samples.set(lot.id, new Map());
    return lot.id;
  }

  /** `lot.submit`: the inspector is done; the device's own verdict is kept beside the server's. */
  async submit(ctx: OpContext, p: LotSubmitPayload): Promise<string> {
    const before = await this.openLot(ctx, p.lotId);
    const patch = {
      status: 'submitted' as const,
      deviceVerdict: {
        verdict: p.deviceVerdict.verdict,
        nonconforming: p.deviceVerdict.nonconforming,
      },
      submittedAt: ctx.recordedAt,
    };
    const after: Lot = { ...before, ...patch };
    await ctx.manager.update(Lot, { id: before.id }, patch);
    ctx.batch.audit.push(auditRow(ctx, 'lot.submit', 'lot', before.id, before, after));
    ctx.batch.lots.set(after.id, after);
    return before.id;
  }

  /** The lot, if it exists and still takes records. */
  async openLot(ctx: OpContext, id: string): Promise<Lot> {
    const lot = ctx.batch.lots.get(id) ?? (await ctx.manager.findOneBy(Lot, { id }));
    if (!lot)
      throw new OpRejected(`lot ${id} is not known to the server (push its lot.open first)`);
    ctx.batch.lots.set(id, lot);
    if (lot.status !== 'open') throw new OpRejected(`lot ${lot.lotNumber} is already submitted`);
    return lot;
  }

  /**
   * Judges a lot again after a batch touched it: the engine's lot verdict over its current
   * sampled parts. Each part's stored server verdict covers its measurements; a part with
   * defects recorded on it (under any revision of its record) is judged again with them. The
   * first time the lot is rejected it is flagged and the supervisors are mailed, once: the mail's
   * key makes a second flag of the same lot a no-op.
   */
  async recount(manager: EntityManager, lotId: string): Promise<void> {
    const lot = await manager.findOneByOrFail(Lot, { id: lotId });
    const verdict = lotVerdict(lot.plan, await this.standings(manager, lot));
    const serverVerdict: LotVerdict =
      verdict.decision === 'reject'
        ? 'flagged'
        : verdict.decision === 'accept'
          ? 'pass'
          : 'pending';
    const newlyFlagged = serverVerdict === 'flagged' && !lot.flaggedAt;
    const patch = {
      inspected: verdict.inspected,
      nonconforming: verdict.nonconforming,
      serverVerdict,
      verdictReason: verdict.reason.slice(0, 500),
      flaggedAt: newlyFlagged ? new Date() : lot.flaggedAt,
    };
    const after: Lot = { ...lot, ...patch };
    await manager.update(Lot, { id: lotId }, patch);
    if (after.serverVerdict !== lot.serverVerdict) {
      await this.audit.record(manager, null, 'lot.verdict', 'lot', lotId, lot, after);
    }
    await this.feed.publish(manager, 'lot', lotId, after);
    if (newlyFlagged) await this.notifyFlagged(manager, after);
  }

  /**
   * What the lot rule needs of each current sampled part. Without defects on its samples that is
   * the stored `conforming` (the server's verdict of the measurements, which carry no defects),
   * read without the records' bulky columns; otherwise each part is judged as in `judgeParts`.
   */
  private async standings(
    manager: EntityManager,
    lot: Lot,
  ): Promise<Pick<PartVerdict, 'conforming' | 'criticalDefects'>[]> {
    if (await manager.existsBy(Defect, { lotId: lot.id, inspectionId: Not(IsNull()) })) {
      return (await this.judgeParts(manager, lot)).map((p) => p.verdict);
    }
    const all = await manager.find(Inspection, {
      select: { id: true, sampleIndex: true, supersedesId: true, conforming: true },
      where: { lotId: lot.id },
    });
    return currentInspections(all).map((i) => ({ conforming: i.conforming, criticalDefects: 0 }));
  }

  /**
   * The lot's current sampled parts, each with the server's verdict of it: the stored one, or —
   * where defects were recorded on that sample under any revision of its record — the engine's
   * verdict of its measurements together with those defects.
   */
  async judgeParts(manager: EntityManager, lot: Lot): Promise<JudgedPart[]> {
    const all = await manager.find(Inspection, {
      where: { lotId: lot.id },
      order: { sampleIndex: 'ASC' },
    });
    const defects = await manager.find(Defect, {
      where: { lotId: lot.id },
      order: { recordedAt: 'ASC' },
    });
    const indexOf = new Map(all.map((i) => [i.id, i.sampleIndex]));
    const defectsOf = new Map<number, Defect[]>();
    for (const defect of defects) {
      const index = defect.inspectionId ? indexOf.get(defect.inspectionId) : undefined;
      if (index !== undefined) defectsOf.set(index, [...(defectsOf.get(index) ?? []), defect]);
    }
    const { prepared } = await this.specs.judged(manager, lot.specRevisionId);
    return currentInspections(all).map((inspection) => {
      const found = defectsOf.get(inspection.sampleIndex) ?? [];
      const verdict = found.length
        ? partVerdict(prepared, { ...inspection.measurements, defects: found })
        : inspection.serverVerdict;
      return { inspection, defects: found, verdict };
    });
  }

  private async notifyFlagged(manager: EntityManager, lot: Lot): Promise<void> {
    const supervisors = await manager.findBy(User, { role: 'supervisor', active: true });
    if (supervisors.length === 0) return;
    const revision = await manager.findOneOrFail(SpecRevision, {
      where: { id: lot.specRevisionId },
      relations: { spec: true },
    });
    const press = await manager.findOneByOrFail(Press, { id: lot.pressId });
    const part = `${revision.spec?.partNumber} rev ${revision.revision} (${revision.spec?.name})`;
    await this.mail.enqueue(
      manager,
      `lot-flagged:${lot.id}`,
      supervisors.map((s) => s.email),
      `Lot ${lot.lotNumber} flagged: ${lot.nonconforming} nonconforming of ${lot.inspected}`,
      [
        `Lot ${lot.lotNumber} of part ${part}, press ${press.code}, cavity ${lot.cavity}, is flagged.`,
        `${lot.nonconforming} of ${lot.inspected} sampled parts are nonconforming; the plan`,
        `(code letter ${lot.plan.codeLetter}, n = ${lot.plan.sampleSize}) rejects at ${lot.plan.reject}.`,
        lot.verdictReason,
        '',
        `Review it in Gumshoe and record a disposition (lot id ${lot.id}).`,
      ].join('\n'),
    );
  }

  disposition(actorId: string, lotId: string, dto: DispositionDto): Promise<Disposition> {
    return this.transactions.run(async (manager) => {
      const lot = await manager.findOneBy(Lot, { id: lotId });
      if (!lot) throw new NotFoundException(`No lot ${lotId}`);
      const disposition: Disposition = {
        id: randomUUID(),
        lotId,
        action: dto.action,
        note: dto.note,
        decidedBy: actorId,
        decidedAt: new Date(),
      };
      await manager.insert(Disposition, disposition);
      await manager.update(Lot, { id: lotId }, { dispositionAction: dto.action });
      await this.audit.record(manager, actorId, 'lot.disposition', 'lot', lotId, lot, {
        ...lot,
        dispositionAction: dto.action,
      });
      await this.feed.publish(manager, 'disposition', disposition.id, disposition);
      await this.feed.publish(manager, 'lot', lotId, { ...lot, dispositionAction: dto.action });
      return disposition;
    });
  }

  /** Back to open so an inspector can re-check it; its records stay as they are. */
  reopen(actorId: string, lotId: string, note: string): Promise<Lot> {
    return this.transactions.run(async (manager) => {
      const lot = await manager.findOneBy(Lot, { id: lotId });
      if (!lot) throw new NotFoundException(`No lot ${lotId}`);
      const after: Lot = { ...lot, status: 'open', submittedAt: null };
      await manager.update(Lot, { id: lotId }, { status: 'open', submittedAt: null });
      await this.audit.record(manager, actorId, 'lot.reopen', 'lot', lotId, lot, {
        ...after,
        note,
      });
      await this.feed.publish(manager, 'lot', lotId, after);
      return after;
    });
  }
}
