import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DataSource } from 'typeorm';
import { MIGRATIONS, dataSourceOptions } from '../src/database/data-source.js';

let dir: string;
let db: DataSource;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'gumshoe-migrations-'));
  db = new DataSource({ ...dataSourceOptions(dir), migrationsRun: false });
  await db.initialize();
});
afterAll(async () => {
  await db.destroy();
  rmSync(dir, { recursive: true, force: true });
});

const tables = async () =>
  (
    (await db.query(
      "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' AND name <> 'migrations' ORDER BY name",
    )) as { name: string }[]
  ).map((row) => row.name);

test('migrations run on an empty file and match the entities exactly', async () => {
  expect(await tables()).toEqual([]);
  // Without the migration the schema builder has everything to create: the comparison has teeth.
  expect((await db.driver.createSchemaBuilder().log()).upQueries.length).toBeGreaterThan(20);
  const ran = await db.runMigrations({ transaction: 'each' });
  expect(ran.map((m) => m.name)).toEqual(MIGRATIONS.map((m) => m.name));
  expect(await tables()).toHaveLength(db.entityMetadatas.length);
  // The schema builder lists what it would change to fit the entities: nothing.
  const pending = await db.driver.createSchemaBuilder().log();
  expect(pending.upQueries.map((q) => q.query)).toEqual([]);
  expect(await db.query('PRAGMA journal_mode')).toEqual([{ journal_mode: 'wal' }]);
  expect(await db.query('PRAGMA foreign_keys')).toEqual([{ foreign_keys: 1 }]);
});

test('the migrations revert, newest first, to an empty file and apply again', async () => {
  for (const _migration of MIGRATIONS) await db.undoLastMigration({ transaction: 'each' });
  expect(await tables()).toEqual([]);
  await db.runMigrations({ transaction: 'each' });
  expect(await tables()).toHaveLength(db.entityMetadatas.length);
});
