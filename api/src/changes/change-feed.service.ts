import { Injectable } from '@nestjs/common';
import { MoreThan, type EntityManager } from 'typeorm';
import { Transactions } from '../database/transactions.js';
import { Change, type ChangeKind } from './entities/change.entity.js';

export interface ChangePage {
  changes: { seq: number; kind: ChangeKind; id: string; data: object }[];
  cursor: string;
  more: boolean;
}

/** The feed tablets pull server-owned rows from (DESIGN §6). */
@Injectable()
export class ChangeFeed {
  constructor(private readonly transactions: Transactions) {}

  /** Appends a snapshot of the row inside the caller's transaction. */
  async publish(manager: EntityManager, kind: ChangeKind, id: string, data: object): Promise<void> {
    await manager.insert(Change, { kind, entityId: id, data, at: new Date() });
  }

  /** Read in the writers' queue, so a change is seen only once its transaction has committed. */
  pull(since: number, limit: number): Promise<ChangePage> {
    return this.transactions.run(async (manager) => {
      const rows = await manager.find(Change, {
        where: { seq: MoreThan(since) },
        order: { seq: 'ASC' },
        take: limit + 1,
      });
      const page = rows.slice(0, limit);
      return {
        changes: page.map(({ seq, kind, entityId, data }) => ({ seq, kind, id: entityId, data })),
        cursor: String(page.at(-1)?.seq ?? since),
        more: rows.length > limit,
      };
    });
  }
}
