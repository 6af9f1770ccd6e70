import type { EntityManager, EntityMetadata, EntityTarget, ObjectLiteral } from 'typeorm';

// SQLite caps the values bound to one statement; 100 rows stay far below it for these tables.
const ROWS_PER_STATEMENT = 100;

interface Plan {
  columns: EntityMetadata['columns'];
  /** The statement for n rows, made once per row count. */
  sql: Map<number, string>;
  head: string;
}
const plans = new WeakMap<object, Plan>();

/**
 * Inserts complete rows (every column but generated ones given) in the caller's transaction,
 * with nothing read back. Values are converted exactly as TypeORM's insert does (driver's
 * `preparePersistentValue`), but the statement is built once per entity and row count instead of
 * by the query builder on every call: on the sync push path that building cost more than SQLite.
 */
export async function insertRows<T extends ObjectLiteral>(
  manager: EntityManager,
  entity: EntityTarget<T>,
  rows: T[],
): Promise<void> {
  const metadata = manager.connection.getMetadata(entity);
  const { driver } = manager.connection;
  let plan = plans.get(metadata);
  if (!plan) {
    const columns = metadata.columns.filter((c) => c.isInsert && !c.isGenerated && !c.isVirtual);
    plan = {
      columns,
      sql: new Map(),
      head: `INSERT INTO ${driver.escape(metadata.tablePath)}(${columns.map((c) => driver.escape(c.databaseName)).join(', ')}) VALUES `,
    };
    plans.set(metadata, plan);
  }
  for (let i = 0; i < rows.length; i += ROWS_PER_STATEMENT) {
    const chunk = rows.slice(i, i + ROWS_PER_STATEMENT);
    let sql = plan.sql.get(chunk.length);
    if (!sql) {
      // Placeholders from the driver: `?` on SQLite, `$1, $2, …` on PostgreSQL.
      const width = plan.columns.length;
      const row = (r: number) =>
        `(${plan.columns.map((_, c) => driver.createParameter(`p${r * width + c}`, r * width + c)).join(', ')})`;
      sql = plan.head + Array.from(chunk, (_, r) => row(r)).join(', ');
      plan.sql.set(chunk.length, sql);
    }
    const values: unknown[] = [];
    for (const row of chunk) {
      for (const column of plan.columns) {
        values.push(driver.preparePersistentValue(column.getEntityValue(row), column) ?? null);
      }
    }
    await manager.query(sql, values);
  }
}
