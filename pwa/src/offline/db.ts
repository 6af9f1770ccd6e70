import Dexie, { type EntityTable } from 'dexie';
import type { PulledKind, Role } from '../api/types';
import type { LocalDefect, LocalLot, LocalPart } from './records';

/** How a person wants numbers shown and typed; the engine always works in SI. */
export type UnitSystem = 'metric' | 'imperial';

/** Someone who has signed in on this device; kept so they can switch back by PIN offline. */
export interface DevicePerson {
  userId: string;
  name: string;
  email: string;
  role: Role;
  units: UnitSystem;
  /** bcrypt hash of the quick-switch PIN; the PIN itself never leaves the keyboard. */
  pinHash?: string;
  failedPins: number;
  accessToken?: string;
  /** Milliseconds since the epoch, from the server's `expiresIn`. */
  accessExpiresAt?: number;
  refreshToken?: string;
  lastActiveAt: string;
}

export type OutboxState = 'waiting' | 'sent' | 'rejected';

/** One operation for POST /api/sync/push; opId makes a retry harmless. */
export interface OutboxOp {
  seq?: number;
  opId: string;
  type: string;
  payload: unknown;
  /** Who made it; the server attributes the record to them whoever's token pushes it. */
  authorId: string;
  /** The local record the operation creates or changes, to show its state beside it. */
  recordId: string;
  state: OutboxState;
  createdAt: string;
  sentAt?: string;
  reason?: string;
}

export type PhotoState = 'waiting' | 'uploaded' | 'rejected';

export interface StoredPhoto {
  sha256: string;
  blob: Blob;
  mime: string;
  width: number;
  height: number;
  defectId: string;
  authorId: string;
  state: PhotoState;
  reason?: string;
  createdAt: string;
}

/** A row the server owns and the device only mirrors, as pull delivered it last. */
export interface ServerRow {
  kind: PulledKind;
  id: string;
  data: unknown;
}

export interface MetaRow {
  key: string;
  value: unknown;
}

export type GumshoeDb = Dexie & {
  people: EntityTable<DevicePerson, 'userId'>;
  outbox: EntityTable<OutboxOp, 'seq'>;
  photos: EntityTable<StoredPhoto, 'sha256'>;
  lots: EntityTable<LocalLot, 'id'>;
  parts: EntityTable<LocalPart, 'id'>;
  defects: EntityTable<LocalDefect, 'id'>;
  server: EntityTable<ServerRow, 'id'>;
  meta: EntityTable<MetaRow, 'key'>;
};

/**
 * Opens the device store. Each schema change gets a new version() with an upgrade
 * function instead of editing an old one, so a tablet that was offline for weeks
 * upgrades without losing what it holds.
 */
export function openDb(name = 'gumshoe'): GumshoeDb {
  const db = new Dexie(name) as GumshoeDb;
  db.version(1).stores({
    people: 'userId',
    outbox: '++seq, &opId, state, recordId, authorId',
    photos: 'sha256, state, defectId',
    lots: 'id, pressId, state',
    parts: 'id, lotId',
    defects: 'id, lotId, partId',
    server: '[kind+id], kind',
    meta: 'key',
  });
  return db;
}

export const db = openDb();

export async function getMeta<T>(key: string): Promise<T | undefined> {
  const row = await db.meta.get(key);
  return row?.value as T | undefined;
}

export async function setMeta(key: string, value: unknown): Promise<void> {
  await db.meta.put({ key, value });
}

/** How people name a device: short enough to read off the tablet's Sending page. */
export function tabletName(deviceId: string): string {
  return `Tablet ${deviceId.slice(0, 8)}`;
}

/** A stable id for this browser profile, sent with every push. */
export async function deviceId(): Promise<string> {
  return db.transaction('rw', db.meta, async () => {
    const known = await getMeta<string>('deviceId');
    if (known) return known;
    const made = crypto.randomUUID();
    await setMeta('deviceId', made);
    return made;
  });
}
