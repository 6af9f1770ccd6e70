import { randomUUID } from 'node:crypto';
import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { Transactions } from '../database/transactions.js';
import { arrheniusFit } from '../engine.js';
import type { CreateAgingSetDto } from './dto/aging.dto.js';
import { AgingSet } from './entities/aging-set.entity.js';
import { Compound } from './entities/compound.entity.js';

@Injectable()
export class AgingService {
  constructor(
    private readonly transactions: Transactions,
    private readonly audit: AuditService,
    @InjectRepository(AgingSet) private readonly agingSets: Repository<AgingSet>,
  ) {}

  async list(compoundId: string): Promise<AgingSet[]> {
    if (!(await this.agingSets.manager.existsBy(Compound, { id: compoundId }))) {
      throw new NotFoundException(`No compound ${compoundId}`);
    }
    return this.agingSets.find({ where: { compoundId }, order: { createdAt: 'DESC' } });
  }

  /** Kept only when the engine can fit Arrhenius to the points: the desk predicts life from it. */
  add(actorId: string, compoundId: string, dto: CreateAgingSetDto): Promise<AgingSet> {
    const points = dto.points.map(({ temperatureC, hours }) => ({ temperatureC, hours }));
    arrheniusFit(points);
    return this.transactions.run(async (manager) => {
      if (!(await manager.existsBy(Compound, { id: compoundId }))) {
        throw new NotFoundException(`No compound ${compoundId}`);
      }
      const set: AgingSet = {
        id: randomUUID(),
        compoundId,
        name: dto.name,
        thresholdPercent: dto.thresholdPercent,
        points,
        createdBy: actorId,
        createdAt: new Date(),
      };
      await manager.insert(AgingSet, set);
      await this.audit.record(
        manager,
        actorId,
        'compound.aging',
        'compound',
        compoundId,
        null,
        set,
      );
      return set;
    });
  }
}
