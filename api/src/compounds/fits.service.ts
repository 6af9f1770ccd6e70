import { randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { badInput } from '../common/validation.js';
import { Transactions } from '../database/transactions.js';
import { fitModel, type MaterialModel } from '../engine.js';
import type { CreateFitDto } from './dto/compound.dto.js';
import { CompoundFit } from './entities/compound-fit.entity.js';
import { TestSet } from './entities/test-set.entity.js';

@Injectable()
export class FitsService {
  constructor(
    private readonly transactions: Transactions,
    private readonly audit: AuditService,
    @InjectRepository(TestSet) private readonly testSets: Repository<TestSet>,
  ) {}

  /**
   * Fits the model to the chosen test sets with the engine and keeps the result as the next
   * draft version. The fit runs before the writers' queue is taken: it is the slow part.
   */
  async fit(actorId: string, compoundId: string, dto: CreateFitDto): Promise<CompoundFit> {
    const sets = await this.testSets.findBy({ id: In(dto.testSetIds), compoundId });
    const missing = dto.testSetIds.filter((id) => !sets.some((s) => s.id === id));
    if (missing.length > 0) {
      throw badInput([
        {
          field: 'testSetIds',
          messages: [`not test sets of this compound: ${missing.join(', ')}`],
        },
      ]);
    }
    // In the order the engineer listed the sets: the fit's sums then run in a known order, so the
    // same request always gives the same constants to the last digit.
    const ordered = dto.testSetIds.map((id) => sets.find((s) => s.id === id)!);
    const data = ordered.flatMap((set) =>
      set.points.map((point) => ({ mode: set.mode, ...point })),
    );
    const weights = dto.weights ?? null;
    const { model, ...result } = fitModel({
      model: dto.model as MaterialModel,
      data,
      objective: dto.objective,
      ...(weights && { weights }),
    });
    return this.transactions.run(async (manager) => {
      const last = (await manager.maximum(CompoundFit, 'version', { compoundId })) ?? 0;
      const fit: CompoundFit = {
        id: randomUUID(),
        compoundId,
        version: last + 1,
        model,
        objective: dto.objective,
        testSetIds: dto.testSetIds,
        weights,
        result,
        status: 'draft',
        createdBy: actorId,
        createdAt: new Date(),
        publishedAt: null,
        publishedBy: null,
        note: null,
      };
      await manager.insert(CompoundFit, fit);
      await this.audit.record(manager, actorId, 'compound.fit', 'compound', compoundId, null, {
        fitId: fit.id,
        version: fit.version,
        model,
      });
      return fit;
    });
  }
}
