/**
 * The inspector's records on the device. Each write stores the record and queues its
 * sync operation in one transaction, so neither can exist without the other.
 */
import type {
  DefectLocation,
  DefectSeverity,
  LotPlan,
  LotVerdict,
  Measurements,
} from '../api/types';
import type { PartVerdict } from '../engine/index';
import { toWireVerdict } from '../inspect/deviceVerdict';
import { db, type StoredPhoto } from './db';
import { enqueue } from './outbox';
import { recordId } from './recordId';

export interface LocalLot {
  id: string;
  lotNumber: string;
  specId: string;
  specRevisionId: string;
  pressId: string;
  cavity: number;
  lotSize: number;
  moldedAt: string;
  openedBy: string;
  openedAt: string;
  plan: LotPlan;
  status: 'open' | 'submitted';
  verdict?: { verdict: LotVerdict; nonconforming: number };
}

/** One sampled part. Never edited: a correction is a new part whose `supersedes` names it. */
export interface LocalPart {
  id: string;
  lotId: string;
  sampleIndex: number;
  supersedes?: string;
  measurements: Measurements;
  /** The engine's verdict as the tablet showed it; its statuses go out as the deviceVerdict. */
  verdict: PartVerdict;
  conforming: boolean;
  authorId: string;
  recordedAt: string;
}

export interface LocalDefect {
  id: string;
  lotId: string;
  partId?: string;
  type: string;
  location: DefectLocation;
  severity: DefectSeverity;
  sizeMm?: number;
  note?: string;
  photoSha256?: string;
  authorId: string;
  recordedAt: string;
}

export type NewLot = Pick<
  LocalLot,
  'lotNumber' | 'specId' | 'specRevisionId' | 'pressId' | 'cavity' | 'lotSize' | 'moldedAt' | 'plan'
>;

export async function openLot(input: NewLot, authorId: string): Promise<LocalLot> {
  const lot: LocalLot = {
    ...input,
    id: recordId(),
    openedBy: authorId,
    openedAt: new Date().toISOString(),
    status: 'open',
  };
  await db.transaction('rw', db.lots, db.outbox, async () => {
    await db.lots.add(lot);
    const { id, lotNumber, specRevisionId, pressId, cavity, lotSize, moldedAt } = lot;
    await enqueue({
      type: 'lot.open',
      payload: { id, lotNumber, specRevisionId, pressId, cavity, lotSize, moldedAt },
      authorId,
      recordId: id,
    });
  });
  return lot;
}

export type NewPart = Pick<
  LocalPart,
  'lotId' | 'sampleIndex' | 'supersedes' | 'measurements' | 'verdict' | 'conforming'
>;

export async function recordPart(input: NewPart, authorId: string): Promise<LocalPart> {
  const part: LocalPart = {
    ...input,
    id: recordId(),
    authorId,
    recordedAt: new Date().toISOString(),
  };
  await db.transaction('rw', db.parts, db.outbox, async () => {
    await db.parts.add(part);
    const { id, lotId, sampleIndex, supersedes, measurements, verdict } = part;
    await enqueue({
      type: 'inspection.record',
      payload: {
        id,
        lotId,
        sampleIndex,
        supersedes,
        measurements,
        deviceVerdict: toWireVerdict(verdict),
      },
      authorId,
      recordId: id,
    });
  });
  return part;
}

export type NewDefect = Pick<
  LocalDefect,
  'lotId' | 'partId' | 'type' | 'location' | 'severity' | 'sizeMm' | 'note'
>;

export type PhotoToKeep = Pick<StoredPhoto, 'sha256' | 'blob' | 'mime' | 'width' | 'height'>;

/** The photo is stored beside the defect; sync uploads it after the defect has been accepted. */
export async function recordDefect(
  input: NewDefect,
  photo: PhotoToKeep | undefined,
  authorId: string,
): Promise<LocalDefect> {
  const defect: LocalDefect = {
    ...input,
    id: recordId(),
    photoSha256: photo?.sha256,
    authorId,
    recordedAt: new Date().toISOString(),
  };
  await db.transaction('rw', db.defects, db.photos, db.outbox, async () => {
    await db.defects.add(defect);
    if (photo) {
      await db.photos.put({
        ...photo,
        defectId: defect.id,
        authorId,
        state: 'waiting',
        createdAt: defect.recordedAt,
      });
    }
    const { id, lotId, partId, type, location, severity, sizeMm, note, photoSha256 } = defect;
    await enqueue({
      type: 'defect.record',
      payload: {
        id,
        lotId,
        inspectionId: partId,
        type,
        location,
        severity,
        sizeMm,
        note,
        photoSha256,
      },
      authorId,
      recordId: id,
    });
  });
  return defect;
}

export async function submitLot(
  lotId: string,
  verdict: NonNullable<LocalLot['verdict']>,
  authorId: string,
): Promise<void> {
  await db.transaction('rw', db.lots, db.outbox, async () => {
    await db.lots.update(lotId, { status: 'submitted', verdict });
    await enqueue({
      type: 'lot.submit',
      payload: { lotId, deviceVerdict: verdict },
      authorId,
      recordId: lotId,
    });
  });
}
