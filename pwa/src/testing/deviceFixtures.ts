import type { PulledSpec } from '../api/types';
import { DEMO_PARTS } from '../engine/fixtures/demo-parts';
import { db, setMeta, type DevicePerson } from '../offline/db';
import type { LocalLot } from '../offline/records';

const pad = DEMO_PARTS['mounting pad'];

/** The demo mounting pad as pull delivers a released revision of it. */
export const PAD_SPEC: PulledSpec = {
  id: 'rev-pad-1',
  specId: 'spec-pad',
  revision: 1,
  status: 'released',
  partNumber: 'MP-80',
  name: 'Mounting pad',
  body: {
    geometry: pad.geometry,
    bonded: pad.bonded,
    compoundId: 'compound-nr',
    testDeflection: pad.testDeflection,
    loadTolerancePercent: pad.loadTolerancePercent,
    tolerance: pad.tolerance,
    hardness: pad.hardness,
    compressionSetLimitPercent: pad.compressionSetLimitPercent,
    sampling: { level: 'II', aql: 1, severity: 'normal' },
  },
  fit: {
    id: 'fit-1',
    compoundId: 'compound-nr',
    version: 1,
    model: pad.model,
    objective: 'absolute',
    status: 'published',
    publishedAt: '2026-11-30T10:00:00.000Z',
  },
  derived: null,
  releasedAt: '2026-11-30T10:00:00.000Z',
  releasedBy: 'u-quality',
};

export const PAD_LOT: LocalLot = {
  id: 'lot-1',
  lotNumber: 'L-100',
  specId: PAD_SPEC.specId,
  specRevisionId: PAD_SPEC.id,
  pressId: 'press-1',
  cavity: 1,
  lotSize: 10,
  moldedAt: '2026-12-01T00:00:00.000Z',
  openedBy: 'u-ines',
  openedAt: '2026-12-01T06:00:00.000Z',
  plan: { codeLetter: 'B', sampleSize: 3, accept: 0, reject: 1 },
  status: 'open',
};

export const INES: DevicePerson = {
  userId: 'u-ines',
  name: 'Ines',
  email: 'inspector@demo.test',
  role: 'inspector',
  units: 'metric',
  failedPins: 0,
  lastActiveAt: '2026-12-01T06:00:00.000Z',
};

/** An empty device store with Ines signed in, the pad spec pulled and one open lot. */
export async function deviceWithOpenLot(): Promise<void> {
  await Promise.all(db.tables.map((table) => table.clear()));
  await db.people.put(INES);
  await setMeta('currentUserId', INES.userId);
  await db.server.put({ kind: 'spec', id: PAD_SPEC.id, data: PAD_SPEC });
  await db.server.put({
    kind: 'press',
    id: 'press-1',
    data: {
      id: 'press-1',
      code: 'P1',
      name: 'Press one',
      kind: 'compression',
      clampForceKn: 1000,
      active: true,
    },
  });
  await db.lots.put(PAD_LOT);
}
