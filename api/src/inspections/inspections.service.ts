import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { auditRow } from '../audit/audit.service.js';
import { insertRows } from '../database/insert-rows.js';
import { storedKeys } from '../database/stored-keys.js';
import { partVerdict } from '../engine.js';
import { currentInspections, LotsService } from '../lots/lots.service.js';
import { SpecsService } from '../specs/specs.service.js';
import type { DefectRecordPayload, InspectionRecordPayload } from '../sync/dto/operations.dto.js';
import { OpRejected, type OpBatch, type OpContext } from '../sync/op-context.js';
import { Defect } from './entities/defect.entity.js';
import { Inspection } from './entities/inspection.entity.js';

@Injectable()
export class InspectionsService {
  constructor(
    private readonly lots: LotsService,
    private readonly specs: SpecsService,
  ) {}

  /** Reads once which of the ids a batch is about to record are stored already. */
  async reserve(manager: EntityManager, batch: OpBatch, ids: string[]): Promise<void> {
    for (const id of await storedKeys(manager, Inspection, 'id', ids)) batch.inspectionIds.add(id);
  }

  /**
   * `inspection.record`: checks one sampled part as sent and queues it, with the server's own
   * verdict beside the device's, for `flush`. It writes nothing itself, so it needs no savepoint:
   * every refusal comes before it changes the batch. A sample is recorded once; a correction must
   * name the record it replaces.
   */
  async record(ctx: OpContext, p: InspectionRecordPayload): Promise<string> {
    if (ctx.batch.inspectionIds.has(p.id)) {
      throw new OpRejected(`id ${p.id} is already the id of another record`);
    }
    const lot = await this.lots.openLot(ctx, p.lotId);
    if (p.sampleIndex > lot.plan.sampleSize) {
      throw new OpRejected(
        `sampleIndex ${p.sampleIndex} is beyond the sample size ${lot.plan.sampleSize}`,
      );
    }
    const samples = await this.samples(ctx, lot.id);
    const current = samples.get(p.sampleIndex);
    if (p.supersedes && current !== p.supersedes) {
      throw new OpRejected(
        `supersedes ${p.supersedes} is not the current record of sample ${p.sampleIndex} in this lot`,
      );
    }
    if (!p.supersedes && current) {
      throw new OpRejected(
        `sample ${p.sampleIndex} is already recorded (${current}); a correction names it in supersedes`,
      );
    }
    const { prepared } = await this.specs.judged(ctx.manager, lot.specRevisionId);
    const serverVerdict = partVerdict(prepared, p.measurements);
    const inspection: Inspection = {
      id: p.id,
      lotId: lot.id,
      sampleIndex: p.sampleIndex,
      supersedesId: p.supersedes ?? null,
      measurements: p.measurements,
      deviceVerdict: p.deviceVerdict,
      serverVerdict,
      conforming: serverVerdict.conforming,
      authorId: ctx.authorId,
      deviceId: ctx.deviceId,
      recordedAt: ctx.recordedAt,
      receivedAt: new Date(),
    };
    ctx.batch.inspections.push(inspection);
    ctx.batch.inspectionIds.add(p.id);
    // The record itself never changes, so the audit names it rather than copying it.
    ctx.batch.audit.push(
      auditRow(ctx, 'inspection.record', 'inspection', p.id, null, {
        lotId: lot.id,
        sampleIndex: p.sampleIndex,
        supersedesId: inspection.supersedesId,
        conforming: inspection.conforming,
      }),
    );
    samples.set(p.sampleIndex, p.id);
    return lot.id;
  }

  /** Writes the records `record` queued, in few statements. */
  async flush(manager: EntityManager, batch: OpBatch): Promise<void> {
    await insertRows(manager, Inspection, batch.inspections.splice(0));
  }

  /** `defect.record`: a visual defect, on a sampled part when it names its record. */
  async recordDefect(ctx: OpContext, p: DefectRecordPayload): Promise<string> {
    const lot = await this.lots.openLot(ctx, p.lotId);
    const known =
      p.inspectionId === undefined ||
      [...(await this.samples(ctx, lot.id)).values()].includes(p.inspectionId) ||
      (await ctx.manager.existsBy(Inspection, { id: p.inspectionId, lotId: lot.id }));
    if (!known) throw new OpRejected(`inspectionId ${p.inspectionId} is not a record of this lot`);
    const defect: Defect = {
      id: p.id,
      lotId: lot.id,
      inspectionId: p.inspectionId ?? null,
      type: p.type,
      location: p.location,
      severity: p.severity,
      sizeMm: p.sizeMm ?? null,
      note: p.note ?? '',
      photoSha256: p.photoSha256 ?? null,
      authorId: ctx.authorId,
      deviceId: ctx.deviceId,
      recordedAt: ctx.recordedAt,
    };
    await ctx.manager.insert(Defect, defect);
    ctx.batch.audit.push(auditRow(ctx, 'defect.record', 'defect', p.id, null, defect));
    return lot.id;
  }

  /** The lot's current record per sample index, read once per batch. */
  private async samples(ctx: OpContext, lotId: string): Promise<Map<number, string>> {
    const known = ctx.batch.samples.get(lotId);
    if (known) return known;
    const all = await ctx.manager.find(Inspection, {
      select: { id: true, sampleIndex: true, supersedesId: true },
      where: { lotId },
    });
    const samples = new Map(currentInspections(all).map((i) => [i.sampleIndex, i.id]));
    ctx.batch.samples.set(lotId, samples);
    return samples;
  }
}
