import { randomUUID } from 'node:crypto';
import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { ChangeFeed } from '../changes/change-feed.service.js';
import { Transactions } from '../database/transactions.js';
import type { CreatePressDto, UpdatePressDto } from './dto/press.dto.js';
import { Press } from './entities/press.entity.js';

@Injectable()
export class PressesService {
  constructor(
    private readonly transactions: Transactions,
    private readonly audit: AuditService,
    private readonly feed: ChangeFeed,
    @InjectRepository(Press) private readonly presses: Repository<Press>,
  ) {}

  list(): Promise<Press[]> {
    return this.presses.find({ order: { code: 'ASC' } });
  }

  create(actorId: string | null, dto: CreatePressDto): Promise<Press> {
    return this.transactions.run((manager) => this.insert(manager, actorId, dto));
  }

  async insert(
    manager: EntityManager,
    actorId: string | null,
    dto: CreatePressDto,
  ): Promise<Press> {
    const press: Press = { id: randomUUID(), clampForceKn: null, ...dto, active: true };
    await manager.insert(Press, press);
    await this.audit.record(manager, actorId, 'press.create', 'press', press.id, null, press);
    await this.feed.publish(manager, 'press', press.id, press);
    return press;
  }

  update(actorId: string, id: string, dto: UpdatePressDto): Promise<Press> {
    return this.transactions.run(async (manager) => {
      const before = await manager.findOneBy(Press, { id });
      if (!before) throw new NotFoundException(`No press ${id}`);
      const after = { ...before, ...dto };
      await manager.update(Press, { id }, dto);
      await this.audit.record(manager, actorId, 'press.update', 'press', id, before, after);
      await this.feed.publish(manager, 'press', id, after);
      return after;
    });
  }
}
