import type { EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';

/**
 * Which of these values of one column are stored, in one plain statement. TypeORM's `findBy`
 * with `In(...)` builds and escapes the same query at about five times the cost for a few
 * hundred values, and a sync push asks this for every batch. Placeholders come from the driver,
 * so the SQL is the same on SQLite and PostgreSQL.
 */
export async function storedKeys<T extends ObjectLiteral>(
  manager: EntityManager,
  entity: EntityTarget<T>,
  property: keyof T & string,
  values: readonly string[],
): Promise<Set<string>> {
  if (values.length === 0) return new Set();
  const metadata = manager.connection.getMetadata(entity);
  const { driver } = manager.connection;
  const column = driver.escape(metadata.findColumnWithPropertyName(property)!.databaseName);
  const placeholders = values.map((_, i) => driver.createParameter(`v${i}`, i)).join(', ');
  const rows = (await manager.query(
    `SELECT ${column} AS "key" FROM ${driver.escape(metadata.tablePath)} WHERE ${column} IN (${placeholders})`,
    [...values],
  )) as { key: string }[];
  return new Set(rows.map((row) => row.key));
}
