import { Injectable } from '@nestjs/common';
import { DataSource, type EntityManager } from 'typeorm';

/**
 * TypeORM's better-sqlite3 driver runs everything on one shared connection, so two transactions
 * that overlap in time would interleave their statements inside one SQLite transaction. SQLite
 * allows one writer at a time anyway: run transactions strictly one after another.
 */
@Injectable()
export class Transactions {
  private tail: Promise<unknown> = Promise.resolve();

  constructor(private readonly dataSource: DataSource) {}

  run<T>(work: (manager: EntityManager) => Promise<T>): Promise<T> {
    const result = this.tail.then(() => this.dataSource.transaction(work));
    this.tail = result.catch(() => undefined);
    return result;
  }
}
