import { randomUUID } from 'node:crypto';
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

const columns = async (table: string) =>
  ((await db.query(`PRAGMA table_info("${table}")`)) as { name: string }[]).map((c) => c.name);

test('the desk fields revert and apply again on a file holding data', async () => {
  const compoundId = randomUUID();
  const fitId = randomUUID();
  const at = new Date().toISOString();
  await db.query(
    `INSERT INTO compounds (id, code, name, polymer, hardnessShoreA, createdAt) VALUES (?, 'M-1', 'M', 'NR', 50, ?)`,
    [compoundId, at],
  );
  await db.query(
    `INSERT INTO compound_fits (id, compoundId, version, model, objective, testSetIds, result, status, createdBy, createdAt) VALUES (?, ?, 1, '{}', 'absolute', '[]', '{}', 'draft', ?, ?)`,
    [fitId, compoundId, randomUUID(), at],
  );
  await db.query('UPDATE compounds SET currentFitId = ? WHERE id = ?', [fitId, compoundId]);

  const reverted = await db.undoLastMigration({ transaction: 'each' });
  expect(reverted).toBeUndefined();
  expect(await tables()).not.toContain('compound_aging_sets');
  expect(await columns('compounds')).not.toContain('notes');
  for (const column of ['weights', 'note', 'publishedBy']) {
    expect(await columns('compound_fits')).not.toContain(column);
  }
  expect(await db.query('SELECT id, currentFitId FROM compounds')).toEqual([
    { id: compoundId, currentFitId: fitId },
  ]);

  const ran = await db.runMigrations({ transaction: 'each' });
  expect(ran.map((m) => m.name)).toEqual(['DeskFields1764700000000']);
  expect(await db.query('SELECT notes FROM compounds')).toEqual([{ notes: '' }]);
  expect(await db.query('SELECT weights, note, publishedBy FROM compound_fits')).toEqual([
    { weights: null, note: null, publishedBy: null },
  ]);
  expect(await db.query('PRAGMA foreign_key_check')).toEqual([]);
  expect((await db.driver.createSchemaBuilder().log()).upQueries).toEqual([]);
  await db.query('UPDATE compounds SET currentFitId = NULL');
  await db.query('DELETE FROM compound_fits');
  await db.query('DELETE FROM compounds');
});

test('the migrations revert, newest first, to an empty file and apply again', async () => {
  for (const _migration of MIGRATIONS) await db.undoLastMigration({ transaction: 'each' });
  expect(await tables()).toEqual([]);
  await db.runMigrations({ transaction: 'each' });
  expect(await tables()).toHaveLength(db.entityMetadatas.length);
});
