import { randomUUID } from 'node:crypto';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { ChangeFeed } from '../changes/change-feed.service.js';
import { Transactions } from '../database/transactions.js';
import type { CreateCompoundDto, CreateTestSetDto, UpdateCompoundDto } from './dto/compound.dto.js';
import { CompoundFit } from './entities/compound-fit.entity.js';
import { Compound } from './entities/compound.entity.js';
import { TestSet } from './entities/test-set.entity.js';

export type CompoundDetail = Compound & { testSets: TestSet[]; fits: CompoundFit[] };

@Injectable()
export class CompoundsService {
  constructor(
    private readonly transactions: Transactions,
    private readonly audit: AuditService,
    private readonly feed: ChangeFeed,
    @InjectRepository(Compound) private readonly compounds: Repository<Compound>,
  ) {}

  list(): Promise<Compound[]> {
    return this.compounds.find({ relations: { currentFit: true }, order: { code: 'ASC' } });
  }

  async get(id: string): Promise<CompoundDetail> {
    const compound = await this.compounds.findOne({
      where: { id },
      relations: { currentFit: true },
    });
    if (!compound) throw new NotFoundException(`No compound ${id}`);
    const [testSets, fits] = await Promise.all([
      this.compounds.manager.find(TestSet, {
        where: { compoundId: id },
        order: { createdAt: 'ASC' },
      }),
      this.compounds.manager.find(CompoundFit, {
        where: { compoundId: id },
        order: { version: 'ASC' },
      }),
    ]);
    return { ...compound, testSets, fits };
  }

  create(actorId: string | null, dto: CreateCompoundDto): Promise<Compound> {
    return this.transactions.run(async (manager) => {
      const compound: Compound = {
        id: randomUUID(),
        bulkModulusMPa: null,
        notes: '',
        ...dto,
        currentFitId: null,
        createdAt: new Date(),
      };
      await manager.insert(Compound, compound);
      await this.audit.record(
        manager,
        actorId,
        'compound.create',
        'compound',
        compound.id,
        null,
        compound,
      );
      await this.publishCompound(manager, compound.id);
      return compound;
    });
  }

  /** Later releases pick up a changed K; released revisions keep the one they froze. */
  update(actorId: string, id: string, dto: UpdateCompoundDto): Promise<Compound> {
    return this.transactions.run(async (manager) => {
      const before = await this.mustExist(manager, id);
      const changes = Object.fromEntries(
        Object.entries(dto).filter(([, value]) => value !== undefined),
      ) as UpdateCompoundDto;
      if (Object.keys(changes).length === 0) return this.withFit(manager, id);
      await manager.update(Compound, { id }, changes);
      await this.audit.record(manager, actorId, 'compound.update', 'compound', id, before, {
        ...before,
        ...changes,
      });
      return this.publishCompound(manager, id);
    });
  }

  addTestSet(actorId: string, compoundId: string, dto: CreateTestSetDto): Promise<TestSet> {
    return this.transactions.run(async (manager) => {
      await this.mustExist(manager, compoundId);
      const testSet: TestSet = {
        id: randomUUID(),
        compoundId,
        name: dto.name,
        mode: dto.mode,
        temperatureC: dto.temperatureC ?? null,
        points: dto.points.map(({ stretch, stress }) => ({ stretch, stress })),
        createdBy: actorId,
        createdAt: new Date(),
      };
      await manager.insert(TestSet, testSet);
      await this.audit.record(manager, actorId, 'compound.test-set', 'compound', compoundId, null, {
        testSetId: testSet.id,
        name: testSet.name,
        mode: testSet.mode,
        points: testSet.points.length,
      });
      return testSet;
    });
  }

  /** Makes a fit the compound's current constants; specs released from now on use it. */
  publish(actorId: string, compoundId: string, fitId: string, note?: string): Promise<Compound> {
    return this.transactions.run(async (manager) => {
      const before = await this.mustExist(manager, compoundId);
      const fit = await manager.findOneBy(CompoundFit, { id: fitId, compoundId });
      if (!fit) throw new NotFoundException(`No fit ${fitId} of compound ${compoundId}`);
      if (fit.status === 'published' && before.currentFitId === fit.id) {
        throw new ConflictException('This fit is already the current one');
      }
      const published: CompoundFit = {
        ...fit,
        status: 'published',
        publishedAt: fit.publishedAt ?? new Date(),
        publishedBy: fit.publishedBy ?? actorId,
        note: note ?? fit.note,
      };
      const { status, publishedAt, publishedBy } = published;
      await manager.update(
        CompoundFit,
        { id: fit.id },
        { status, publishedAt, publishedBy, note: published.note },
      );
      await manager.update(Compound, { id: compoundId }, { currentFitId: fit.id });
      await this.audit.record(
        manager,
        actorId,
        'compound.publish-fit',
        'compound',
        compoundId,
        before,
        {
          ...before,
          currentFitId: fit.id,
          note: published.note,
        },
      );
      await this.feed.publish(manager, 'fit', fit.id, published);
      return this.publishCompound(manager, compoundId);
    });
  }

  private async mustExist(manager: EntityManager, id: string): Promise<Compound> {
    const compound = await manager.findOneBy(Compound, { id });
    if (!compound) throw new NotFoundException(`No compound ${id}`);
    return compound;
  }

  /** Tablets get the compound with its current fit embedded, as the list shows it. */
  private async publishCompound(manager: EntityManager, id: string): Promise<Compound> {
    const compound = await this.withFit(manager, id);
    await this.feed.publish(manager, 'compound', id, compound);
    return compound;
  }

  private withFit(manager: EntityManager, id: string): Promise<Compound> {
    return manager.findOneOrFail(Compound, { where: { id }, relations: { currentFit: true } });
  }
}
