import { randomUUID } from 'node:crypto';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { ChangeFeed } from '../changes/change-feed.service.js';
import { badInput } from '../common/validation.js';
import { CompoundFit } from '../compounds/entities/compound-fit.entity.js';
import { Compound } from '../compounds/entities/compound.entity.js';
import { Transactions } from '../database/transactions.js';
import { prepareSpec, shapeFactor, type PreparedSpec } from '../engine.js';
import type { SpecBody } from './dto/spec-body.dto.js';
import type { CreateSpecDto } from './dto/spec.dto.js';
import { Spec } from './entities/spec.entity.js';
import { SpecRevision } from './entities/spec-revision.entity.js';
import { engineSpec, frozenBody, specDerived } from './engine-spec.js';

export type SpecDetail = Spec & { revisions: SpecRevision[] };

/** A released revision ready for verdicts: its spec row and the engine's prepared spec. */
export interface JudgedRevision {
  revision: SpecRevision;
  prepared: PreparedSpec;
}

@Injectable()
export class SpecsService {
  private readonly released = new Map<string, JudgedRevision>();

  constructor(
    private readonly transactions: Transactions,
    private readonly audit: AuditService,
    private readonly feed: ChangeFeed,
    @InjectRepository(Spec) private readonly specs: Repository<Spec>,
  ) {}

  list(): Promise<Spec[]> {
    return this.specs.find({ relations: { currentRevision: true }, order: { partNumber: 'ASC' } });
  }

  async get(id: string): Promise<SpecDetail> {
    const spec = await this.specs.findOne({ where: { id }, relations: { currentRevision: true } });
    if (!spec) throw new NotFoundException(`No part spec ${id}`);
    const revisions = await this.specs.manager.find(SpecRevision, {
      where: { specId: id },
      relations: { fit: true },
      order: { revision: 'ASC' },
    });
    return { ...spec, revisions };
  }

  create(actorId: string | null, dto: CreateSpecDto): Promise<Spec> {
    return this.transactions.run(async (manager) => {
      const spec: Spec = {
        id: randomUUID(),
        partNumber: dto.partNumber,
        name: dto.name,
        description: dto.description ?? '',
        currentRevisionId: null,
        createdAt: new Date(),
      };
      await manager.insert(Spec, spec);
      await this.audit.record(manager, actorId, 'spec.create', 'spec', spec.id, null, spec);
      return spec;
    });
  }

  addRevision(actorId: string | null, specId: string, body: SpecBody): Promise<SpecRevision> {
    return this.transactions.run(async (manager) => {
      await this.check(manager, body);
      if (!(await manager.existsBy(Spec, { id: specId }))) {
        throw new NotFoundException(`No part spec ${specId}`);
      }
      const last = (await manager.maximum(SpecRevision, 'revision', { specId })) ?? 0;
      const revision: SpecRevision = {
        id: randomUUID(),
        specId,
        revision: last + 1,
        status: 'draft',
        body: plain(body),
        compoundId: body.compoundId,
        fitId: null,
        partSpec: null,
        derived: null,
        createdAt: new Date(),
        releasedAt: null,
        releasedBy: null,
      };
      await manager.insert(SpecRevision, revision);
      await this.audit.record(manager, actorId, 'spec.revision', 'spec', specId, null, revision);
      return revision;
    });
  }

  updateRevision(
    actorId: string,
    specId: string,
    revisionId: string,
    body: SpecBody,
  ): Promise<SpecRevision> {
    return this.transactions.run(async (manager) => {
      const before = await this.draft(manager, specId, revisionId);
      await this.check(manager, body);
      const after: SpecRevision = { ...before, body: plain(body), compoundId: body.compoundId };
      await manager.update(
        SpecRevision,
        { id: revisionId },
        { body: after.body, compoundId: after.compoundId },
      );
      await this.audit.record(
        manager,
        actorId,
        'spec.revision.update',
        'spec',
        specId,
        before,
        after,
      );
      return after;
    });
  }

  /**
   * Freezes a draft: it takes the compound's current fit and the engine's windows for it, and
   * becomes what new lots of this part are opened against.
   */
  release(actorId: string | null, specId: string, revisionId: string): Promise<SpecRevision> {
    return this.transactions.run(async (manager) => {
      const before = await this.draft(manager, specId, revisionId);
      const compound = await manager.findOneByOrFail(Compound, { id: before.compoundId });
      if (!compound.currentFitId) {
        throw new ConflictException(
          `Compound ${compound.code} has no published fit to release against`,
        );
      }
      const fit = await manager.findOneByOrFail(CompoundFit, { id: compound.currentFitId });
      const body = frozenBody(before.body, compound.bulkModulusMPa);
      const partSpec = engineSpec(body, fit.model, compound.bulkModulusMPa);
      const after: SpecRevision = {
        ...before,
        body,
        status: 'released',
        fitId: fit.id,
        partSpec,
        derived: specDerived(partSpec),
        releasedAt: new Date(),
        releasedBy: actorId,
      };
      await manager.update(
        SpecRevision,
        { id: revisionId },
        {
          body: after.body,
          status: after.status,
          fitId: after.fitId,
          partSpec: after.partSpec,
          derived: after.derived,
          releasedAt: after.releasedAt,
          releasedBy: after.releasedBy,
        },
      );
      await manager.update(Spec, { id: specId }, { currentRevisionId: revisionId });
      await this.audit.record(manager, actorId, 'spec.release', 'spec', specId, before, after);
      const spec = await manager.findOneByOrFail(Spec, { id: specId });
      await this.feed.publish(manager, 'spec', revisionId, {
        ...after,
        fit,
        partNumber: spec.partNumber,
        name: spec.name,
      });
      return after;
    });
  }

  /**
   * The engine's prepared spec of a released revision. Released revisions never change, so each
   * is prepared once per process: re-checking a pushed record then costs only its own verdict.
   */
  async judged(manager: EntityManager, revisionId: string): Promise<JudgedRevision> {
    const known = this.released.get(revisionId);
    if (known) return known;
    const revision = await manager.findOneByOrFail(SpecRevision, { id: revisionId });
    if (revision.status !== 'released' || !revision.partSpec) {
      throw new ConflictException(`Revision ${revisionId} is not released`);
    }
    const judged = { revision, prepared: prepareSpec(revision.partSpec) };
    this.released.set(revisionId, judged);
    return judged;
  }

  private async draft(
    manager: EntityManager,
    specId: string,
    revisionId: string,
  ): Promise<SpecRevision> {
    const revision = await manager.findOneBy(SpecRevision, { id: revisionId, specId });
    if (!revision) throw new NotFoundException(`No revision ${revisionId} of part spec ${specId}`);
    if (revision.status !== 'draft') {
      throw new ConflictException(`Revision ${revision.revision} is released and cannot change`);
    }
    return revision;
  }

  /** What the DTO cannot see on one field: references and relations between fields. */
  private async check(manager: EntityManager, body: SpecBody): Promise<void> {
    // The engine refuses a geometry it cannot judge parts by (e.g. a hole as wide as the ring).
    shapeFactor(body.geometry);
    if (body.testDeflection >= body.geometry.thickness) {
      throw badInput([
        {
          field: 'testDeflection',
          messages: ['testDeflection must be less than geometry.thickness'],
        },
      ]);
    }
    if (!(await manager.existsBy(Compound, { id: body.compoundId }))) {
      throw badInput([
        { field: 'compoundId', messages: [`compoundId ${body.compoundId} is not a compound`] },
      ]);
    }
  }
}

/** The validated DTO as plain JSON, so what is stored is exactly what was checked. */
function plain(body: SpecBody): SpecBody {
  return JSON.parse(JSON.stringify(body)) as SpecBody;
}
