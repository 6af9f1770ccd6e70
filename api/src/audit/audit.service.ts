import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { LessThan, Repository, type EntityManager, type FindOptionsWhere } from 'typeorm';
import { insertRows } from '../database/insert-rows.js';
import type { AuditQueryDto } from './dto/audit-query.dto.js';
import { AuditEntry } from './entities/audit-entry.entity.js';

export type AuditRow = Omit<AuditEntry, 'id'>;

/** An entry for what `ctx.authorId` did, stamped now, to be written with `recordMany`. */
export function auditRow(
  ctx: { authorId: string },
  action: string,
  entity: string,
  entityId: string,
  before: object | null,
  after: object | null,
): AuditRow {
  return { at: new Date(), actorId: ctx.authorId, action, entity, entityId, before, after };
}

@Injectable()
export class AuditService {
  constructor(@InjectRepository(AuditEntry) private readonly entries: Repository<AuditEntry>) {}

  /** Written inside the caller's transaction, so a change and its audit entry stand or fall together. */
  async record(
    manager: EntityManager,
    actorId: string | null,
    action: string,
    entity: string,
    entityId: string,
    before: object | null,
    after: object | null,
  ): Promise<void> {
    await manager.insert(AuditEntry, {
      at: new Date(),
      actorId,
      action,
      entity,
      entityId,
      before,
      after,
    });
  }

  /** Many entries in few statements. */
  recordMany(manager: EntityManager, rows: AuditRow[]): Promise<void> {
    return insertRows<AuditRow>(manager, AuditEntry, rows);
  }

  list({ entity, entityId, before, limit }: AuditQueryDto): Promise<AuditEntry[]> {
    const where: FindOptionsWhere<AuditEntry> = {};
    if (entity) where.entity = entity;
    if (entityId) where.entityId = entityId;
    if (before) where.id = LessThan(before);
    return this.entries.find({ where, order: { id: 'DESC' }, take: limit ?? 100 });
  }
}
