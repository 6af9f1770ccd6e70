import { Table, type MigrationInterface, type QueryRunner } from 'typeorm';

/**
 * The quality desk's additions: compound notes, fit weights and publish details, and the
 * compression-set aging sets. Columns are added with plain `ALTER TABLE … ADD/DROP COLUMN`, which
 * SQLite and PostgreSQL both run in place; TypeORM's SQLite `addColumn` would instead rebuild
 * the table, dropping a parent of rows that still point at it.
 */
export class DeskFields1764700000000 implements MigrationInterface {
  name = 'DeskFields1764700000000';

  async up(runner: QueryRunner): Promise<void> {
    await runner.query(
      `ALTER TABLE "compounds" ADD COLUMN "notes" varchar(2000) NOT NULL DEFAULT ''`,
    );
    for (const column of COLUMNS) {
      await runner.query(`ALTER TABLE "compound_fits" ADD COLUMN ${column.sql}`);
    }
    const timestamp = runner.connection.driver.normalizeType({ type: Date });
    await runner.createTable(
      new Table({
        name: 'compound_aging_sets',
        columns: [
          { name: 'id', type: 'varchar', length: '36', isPrimary: true },
          { name: 'compoundId', type: 'varchar', length: '36' },
          { name: 'name', type: 'varchar', length: '120' },
          { name: 'thresholdPercent', type: 'double precision' },
          { name: 'points', type: 'text' },
          { name: 'createdBy', type: 'varchar', length: '36' },
          { name: 'createdAt', type: timestamp },
        ],
        foreignKeys: [
          {
            columnNames: ['compoundId'],
            referencedTableName: 'compounds',
            referencedColumnNames: ['id'],
          },
        ],
      }),
    );
  }

  async down(runner: QueryRunner): Promise<void> {
    await runner.dropTable('compound_aging_sets');
    for (const column of [...COLUMNS].reverse()) {
      await runner.query(`ALTER TABLE "compound_fits" DROP COLUMN "${column.name}"`);
    }
    await runner.query(`ALTER TABLE "compounds" DROP COLUMN "notes"`);
  }
}

const COLUMNS = [
  { name: 'weights', sql: `"weights" text NULL` },
  { name: 'note', sql: `"note" varchar(1000) NULL` },
  { name: 'publishedBy', sql: `"publishedBy" varchar(36) NULL` },
];
