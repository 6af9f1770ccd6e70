/**
 * Live views over what the device holds: the server's presses and released specs (mirrored
 * by pull) and the inspector's own lots, parts and defects.
 */
import { useLiveQuery } from 'dexie-react-hooks';
import type { Lot, PulledKind, PulledSpec, Press } from '../api/types';
import { db, type OutboxOp } from './db';
import type { LocalDefect, LocalLot, LocalPart } from './records';

async function serverRows<T>(kind: PulledKind): Promise<T[]> {
  return (await db.server.where('kind').equals(kind).toArray()).map((row) => row.data as T);
}

export function usePresses(): Press[] | undefined {
  return useLiveQuery(async () =>
    (await serverRows<Press>('press'))
      .filter((press) => press.active)
      .sort((a, b) => a.code.localeCompare(b.code)),
  );
}

/** The newest released revision of each part: the only ones an inspector may check against. */
export function useReleasedSpecs(): PulledSpec[] | undefined {
  return useLiveQuery(async () => {
    const newest = new Map<string, PulledSpec>();
    for (const revision of await serverRows<PulledSpec>('spec')) {
      const known = newest.get(revision.specId);
      if (revision.status === 'released' && (!known || revision.revision > known.revision)) {
        newest.set(revision.specId, revision);
      }
    }
    return [...newest.values()].sort((a, b) => a.partNumber.localeCompare(b.partNumber));
  });
}

export function useSpecRevision(id: string | undefined): PulledSpec | undefined {
  return useLiveQuery(async () => {
    if (!id) return undefined;
    const row = await db.server.get({ kind: 'spec', id });
    return row?.data as PulledSpec | undefined;
  }, [id]);
}

function fromServer(lot: Lot): LocalLot {
  return {
    id: lot.id,
    lotNumber: lot.lotNumber,
    specId: lot.specId,
    specRevisionId: lot.specRevisionId,
    pressId: lot.pressId,
    cavity: lot.cavity,
    lotSize: lot.lotSize,
    moldedAt: lot.moldedAt,
    openedBy: lot.openedBy,
    openedAt: lot.openedAt,
    plan: lot.plan,
    status: lot.status,
    verdict: lot.deviceVerdict ?? undefined,
  };
}

/**
 * The device's copy of a lot while it still has something to send for it; once everything has
 * gone out, the server's copy (which a supervisor may have reopened for a re-check).
 */
async function current(local: LocalLot, remote: Lot | undefined): Promise<LocalLot> {
  if (!remote) return local;
  const waiting = await db.outbox
    .where('recordId')
    .equals(local.id)
    .filter((op) => op.state === 'waiting')
    .count();
  return waiting > 0 ? local : { ...local, status: remote.status };
}

async function serverLot(id: string): Promise<Lot | undefined> {
  return (await db.server.get({ kind: 'lot', id }))?.data as Lot | undefined;
}

/** Open lots, this tablet's and those other tablets opened (from pull), newest first. */
export function useOpenLots(): LocalLot[] | undefined {
  return useLiveQuery(async () => {
    const remote = new Map((await serverRows<Lot>('lot')).map((lot) => [lot.id, lot]));
    const local = await Promise.all(
      (await db.lots.toArray()).map((lot) => current(lot, remote.get(lot.id))),
    );
    const known = new Set(local.map((lot) => lot.id));
    const others = [...remote.values()].filter((lot) => !known.has(lot.id)).map(fromServer);
    return [...local, ...others]
      .filter((lot) => lot.status === 'open')
      .sort((a, b) => b.openedAt.localeCompare(a.openedAt));
  });
}

export function useLot(lotId: string | undefined): LocalLot | null | undefined {
  return useLiveQuery(async () => {
    if (!lotId) return null;
    const [local, remote] = await Promise.all([db.lots.get(lotId), serverLot(lotId)]);
    if (local) return current(local, remote);
    return remote ? fromServer(remote) : null;
  }, [lotId]);
}

export interface LotRecords {
  /** Current parts only: a corrected part is replaced by its correction. */
  parts: LocalPart[];
  defects: LocalDefect[];
  /** The sample number of every part record, corrected ones too (defects may point at those). */
  sampleOf: Map<string, number>;
  /** The sync operation of each record, by record id, to show what is still waiting. */
  ops: Map<string, OutboxOp>;
}

export function useLotRecords(lotId: string | undefined): LotRecords | undefined {
  return useLiveQuery(async () => {
    if (!lotId) return { parts: [], defects: [], sampleOf: new Map(), ops: new Map() };
    const [parts, defects] = await Promise.all([
      db.parts.where('lotId').equals(lotId).toArray(),
      db.defects.where('lotId').equals(lotId).toArray(),
    ]);
    const replaced = new Set(parts.map((part) => part.supersedes).filter(Boolean));
    const ids = [...parts.map((p) => p.id), ...defects.map((d) => d.id)];
    const ops = await db.outbox.where('recordId').anyOf(ids).toArray();
    return {
      parts: parts
        .filter((part) => !replaced.has(part.id))
        .sort((a, b) => a.sampleIndex - b.sampleIndex),
      defects: defects.sort((a, b) => a.recordedAt.localeCompare(b.recordedAt)),
      sampleOf: new Map(parts.map((part) => [part.id, part.sampleIndex])),
      ops: new Map(ops.map((op) => [op.recordId, op])),
    };
  }, [lotId]);
}
