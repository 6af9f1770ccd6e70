import { AsyncLocalStorage } from 'node:async_hooks';
import { Injectable } from '@nestjs/common';
import { DataSource, type EntityManager } from 'typeorm';

/**
 * TypeORM's better-sqlite3 driver runs everything on one shared connection, so two transactions
 * that overlap in time would interleave their statements inside one SQLite transaction. SQLite
 * allows one writer at a time anyway: run transactions strictly one after another.
 *
 * A `run` inside another `run` joins the outer transaction, so a larger unit of work (the demo
 * seed) can call services that each guard their own writes, and still commit or fail as one.
 */
@Injectable()
export class Transactions {
  private tail: Promise<unknown> = Promise.resolve();
  private readonly current = new AsyncLocalStorage<EntityManager>();

  constructor(private readonly dataSource: DataSource) {}

  run<T>(work: (manager: EntityManager) => Promise<T>): Promise<T> {
    const outer = this.current.getStore();
    if (outer) return work(outer);
    const result = this.tail.then(() =>
      this.dataSource.transaction((manager) => this.current.run(manager, () => work(manager))),
    );
    this.tail = result.catch(() => undefined);
    return result;
  }
}
