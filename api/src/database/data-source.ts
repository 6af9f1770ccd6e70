import { join } from 'node:path';
import type { DataSourceOptions } from 'typeorm';
import { AuditEntry } from '../audit/entities/audit-entry.entity.js';
import { RefreshToken } from '../auth/entities/refresh-token.entity.js';
import { Session } from '../auth/entities/session.entity.js';
import { AgingSet } from '../compounds/entities/aging-set.entity.js';
import { CompoundFit } from '../compounds/entities/compound-fit.entity.js';
import { Compound } from '../compounds/entities/compound.entity.js';
import { TestSet } from '../compounds/entities/test-set.entity.js';
import { Defect } from '../inspections/entities/defect.entity.js';
import { Inspection } from '../inspections/entities/inspection.entity.js';
import { Disposition } from '../lots/entities/disposition.entity.js';
import { Lot } from '../lots/entities/lot.entity.js';
import { OutgoingMail } from '../mail/entities/outgoing-mail.entity.js';
import { Photo } from '../photos/entities/photo.entity.js';
import { Press } from '../presses/entities/press.entity.js';
import { Spec } from '../specs/entities/spec.entity.js';
import { SpecRevision } from '../specs/entities/spec-revision.entity.js';
import { AppliedOp } from '../sync/entities/applied-op.entity.js';
import { Change } from '../changes/entities/change.entity.js';
import { User } from '../users/entities/user.entity.js';
import { Initial1764600000000 } from './migrations/1764600000000-initial.js';
import { DeskFields1764700000000 } from './migrations/1764700000000-desk-fields.js';

export const ENTITIES = [
  User,
  Session,
  RefreshToken,
  Press,
  Compound,
  TestSet,
  CompoundFit,
  AgingSet,
  Spec,
  SpecRevision,
  Lot,
  Disposition,
  Inspection,
  Defect,
  Photo,
  AuditEntry,
  Change,
  AppliedOp,
  OutgoingMail,
];

export const MIGRATIONS = [Initial1764600000000, DeskFields1764700000000];

export function databaseFile(dataDir: string): string {
  return join(dataDir, 'gumshoe.sqlite');
}

export function dataSourceOptions(dataDir: string): DataSourceOptions {
  return {
    type: 'better-sqlite3',
    database: databaseFile(dataDir),
    enableWAL: true,
    // Prepared statements are reused by their SQL; the default 100 is fewer than this app uses.
    statementCacheSize: 1000,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTransactionMode: 'each',
    migrationsRun: true,
    synchronize: false,
  };
}
