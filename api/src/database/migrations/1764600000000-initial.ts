import {
  Table,
  TableForeignKey,
  type MigrationInterface,
  type QueryRunner,
  type TableColumnOptions,
  type TableForeignKeyOptions,
} from 'typeorm';

/**
 * Written with TypeORM's schema API rather than SQL so that the same migration builds the schema
 * on SQLite and on PostgreSQL; the timestamp type is asked of the driver (datetime / timestamp).
 * Frozen: later changes go in new migrations.
 */
export class Initial1764600000000 implements MigrationInterface {
  name = 'Initial1764600000000';

  async up(runner: QueryRunner): Promise<void> {
    const timestamp = runner.connection.driver.normalizeType({ type: Date });
    const id = (name = 'id'): TableColumnOptions => ({
      name,
      type: 'varchar',
      length: '36',
      isPrimary: true,
    });
    const text = (name: string, length: number, extra: Partial<TableColumnOptions> = {}) =>
      ({ name, type: 'varchar', length: String(length), ...extra }) as TableColumnOptions;
    const ref = (name: string, extra: Partial<TableColumnOptions> = {}) => text(name, 36, extra);
    const time = (name: string, isNullable = false): TableColumnOptions => ({
      name,
      type: timestamp,
      isNullable,
    });
    const num = (name: string, isNullable = false): TableColumnOptions => ({
      name,
      type: 'double precision',
      isNullable,
    });
    const int = (name: string): TableColumnOptions => ({ name, type: 'integer' });
    const json = (name: string, isNullable = false): TableColumnOptions => ({
      name,
      type: 'text',
      isNullable,
    });
    const bool = (name: string): TableColumnOptions => ({ name, type: 'boolean' });
    const fk = (column: string, table: string): TableForeignKeyOptions => ({
      columnNames: [column],
      referencedTableName: table,
      referencedColumnNames: ['id'],
    });
    const serial = (name: string): TableColumnOptions => ({
      name,
      type: 'integer',
      isPrimary: true,
      isGenerated: true,
      generationStrategy: 'increment',
    });

    await runner.createTable(
      new Table({
        name: 'users',
        columns: [
          id(),
          text('email', 254, { isUnique: true }),
          text('name', 120),
          text('role', 16),
          text('passwordHash', 72),
          bool('active'),
          time('createdAt'),
        ],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'sessions',
        columns: [
          id(),
          ref('userId'),
          ref('deviceId', { isNullable: true }),
          time('createdAt'),
          time('revokedAt', true),
          text('revokeReason', 16, { isNullable: true }),
        ],
        indices: [{ columnNames: ['userId', 'deviceId'] }],
        foreignKeys: [fk('userId', 'users')],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'refresh_tokens',
        columns: [
          id(),
          ref('sessionId'),
          text('secretHash', 64),
          time('expiresAt'),
          time('usedAt', true),
        ],
        foreignKeys: [fk('sessionId', 'sessions')],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'presses',
        columns: [
          id(),
          text('code', 32, { isUnique: true }),
          text('name', 120),
          text('kind', 16),
          num('clampForceKn', true),
          bool('active'),
        ],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'compounds',
        columns: [
          id(),
          text('code', 32, { isUnique: true }),
          text('name', 120),
          text('polymer', 8),
          num('hardnessShoreA'),
          num('bulkModulusMPa', true),
          ref('currentFitId', { isNullable: true }),
          time('createdAt'),
        ],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'compound_test_sets',
        columns: [
          id(),
          ref('compoundId'),
          text('name', 120),
          text('mode', 12),
          num('temperatureC', true),
          json('points'),
          ref('createdBy'),
          time('createdAt'),
        ],
        foreignKeys: [fk('compoundId', 'compounds')],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'compound_fits',
        columns: [
          id(),
          ref('compoundId'),
          int('version'),
          json('model'),
          text('objective', 12),
          json('testSetIds'),
          json('result'),
          text('status', 12),
          ref('createdBy'),
          time('createdAt'),
          time('publishedAt', true),
        ],
        indices: [{ columnNames: ['compoundId', 'version'], isUnique: true }],
        foreignKeys: [fk('compoundId', 'compounds')],
      }),
    );
    // The two circular references (current fit, current revision) are added once both tables exist.
    await runner.createForeignKey(
      'compounds',
      new TableForeignKey(fk('currentFitId', 'compound_fits')),
    );
    await runner.createTable(
      new Table({
        name: 'part_specs',
        columns: [
          id(),
          text('partNumber', 40, { isUnique: true }),
          text('name', 120),
          text('description', 1000),
          ref('currentRevisionId', { isNullable: true }),
          time('createdAt'),
        ],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'part_spec_revisions',
        columns: [
          id(),
          ref('specId'),
          int('revision'),
          text('status', 12),
          json('body'),
          ref('compoundId'),
          ref('fitId', { isNullable: true }),
          json('partSpec', true),
          json('derived', true),
          time('createdAt'),
          time('releasedAt', true),
          ref('releasedBy', { isNullable: true }),
        ],
        indices: [{ columnNames: ['specId', 'revision'], isUnique: true }],
        foreignKeys: [
          fk('specId', 'part_specs'),
          fk('compoundId', 'compounds'),
          fk('fitId', 'compound_fits'),
        ],
      }),
    );
    await runner.createForeignKey(
      'part_specs',
      new TableForeignKey(fk('currentRevisionId', 'part_spec_revisions')),
    );
    await runner.createTable(
      new Table({
        name: 'lots',
        columns: [
          id(),
          text('lotNumber', 40, { isUnique: true }),
          ref('specId'),
          ref('specRevisionId'),
          ref('pressId'),
          int('cavity'),
          int('lotSize'),
          time('moldedAt'),
          ref('openedBy'),
          time('openedAt'),
          ref('deviceId'),
          text('status', 12),
          json('plan'),
          int('inspected'),
          int('nonconforming'),
          text('serverVerdict', 12),
          text('verdictReason', 500),
          json('deviceVerdict', true),
          time('submittedAt', true),
          time('flaggedAt', true),
          text('dispositionAction', 12, { isNullable: true }),
        ],
        indices: [{ columnNames: ['openedAt'] }],
        foreignKeys: [
          fk('specId', 'part_specs'),
          fk('specRevisionId', 'part_spec_revisions'),
          fk('pressId', 'presses'),
          fk('openedBy', 'users'),
        ],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'dispositions',
        columns: [
          id(),
          ref('lotId'),
          text('action', 12),
          text('note', 2000),
          ref('decidedBy'),
          time('decidedAt'),
        ],
        foreignKeys: [fk('lotId', 'lots'), fk('decidedBy', 'users')],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'inspections',
        columns: [
          id(),
          ref('lotId'),
          int('sampleIndex'),
          ref('supersedesId', { isNullable: true, isUnique: true }),
          json('measurements'),
          json('deviceVerdict'),
          json('serverVerdict'),
          bool('conforming'),
          ref('authorId'),
          ref('deviceId'),
          time('recordedAt'),
          time('receivedAt'),
        ],
        indices: [{ columnNames: ['lotId'] }],
        foreignKeys: [
          fk('lotId', 'lots'),
          fk('supersedesId', 'inspections'),
          fk('authorId', 'users'),
        ],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'defects',
        columns: [
          id(),
          ref('lotId'),
          ref('inspectionId', { isNullable: true }),
          text('type', 20),
          text('location', 12),
          text('severity', 12),
          num('sizeMm', true),
          text('note', 1000),
          text('photoSha256', 64, { isNullable: true }),
          ref('authorId'),
          ref('deviceId'),
          time('recordedAt'),
        ],
        indices: [{ columnNames: ['lotId'] }],
        foreignKeys: [
          fk('lotId', 'lots'),
          fk('inspectionId', 'inspections'),
          fk('authorId', 'users'),
        ],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'photos',
        columns: [
          { name: 'sha256', type: 'varchar', length: '64', isPrimary: true },
          text('mime', 16),
          int('bytes'),
          ref('uploadedBy'),
          time('createdAt'),
        ],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'audit_log',
        columns: [
          serial('id'),
          time('at'),
          ref('actorId', { isNullable: true }),
          text('action', 40),
          text('entity', 40),
          text('entityId', 64),
          json('before', true),
          json('after', true),
        ],
        indices: [{ columnNames: ['entity', 'entityId'] }],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'change_log',
        columns: [serial('seq'), text('kind', 16), ref('entityId'), json('data'), time('at')],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'applied_ops',
        columns: [
          id('opId'),
          ref('deviceId'),
          text('type', 24),
          ref('authorId'),
          time('appliedAt'),
        ],
      }),
    );
    await runner.createTable(
      new Table({
        name: 'outgoing_mail',
        columns: [
          id(),
          text('dedupeKey', 120, { isUnique: true }),
          json('to'),
          text('subject', 200),
          { name: 'text', type: 'text' },
          time('createdAt'),
          time('sentAt', true),
          int('attempts'),
          text('lastError', 500, { isNullable: true }),
        ],
      }),
    );
  }

  async down(runner: QueryRunner): Promise<void> {
    // Break the two circular references first so every table can then go in reverse order.
    for (const [table, column] of [
      ['part_specs', 'currentRevisionId'],
      ['compounds', 'currentFitId'],
    ] as const) {
      const loaded = await runner.getTable(table);
      const key = loaded?.foreignKeys.find((k) => k.columnNames.includes(column));
      if (key) await runner.dropForeignKey(table, key);
    }
    for (const table of [
      'outgoing_mail',
      'applied_ops',
      'change_log',
      'audit_log',
      'photos',
      'defects',
      'inspections',
      'dispositions',
      'lots',
      'part_spec_revisions',
      'part_specs',
      'compound_fits',
      'compound_test_sets',
      'compounds',
      'presses',
      'refresh_tokens',
      'sessions',
      'users',
    ]) {
      await runner.dropTable(table);
    }
  }
}
