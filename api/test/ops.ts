import { randomUUID } from 'node:crypto';
import { partVerdict, prepareSpec, type PartSpec } from '../src/engine.js';
import { deviceVerdictOf } from '../src/sync/device-verdict.js';
import { signIn, type Harness } from './harness.js';

export interface Op {
  opId: string;
  type: string;
  authorId: string;
  recordedAt: string;
  payload: Record<string, unknown>;
}

/** A signed-in tablet: pushes and pulls with one person's token, ops by whoever it says. */
export interface Tablet {
  deviceId: string;
  token: string;
  userId: string;
  push: (operations: Op[]) => Promise<{
    status: number;
    body: { results: { opId: string; status: string; reason?: string }[] };
  }>;
  op: (type: string, payload: Record<string, unknown>, authorId?: string) => Op;
}

export async function tablet(h: Harness, email: string, deviceId = randomUUID()): Promise<Tablet> {
  const session = await signIn(h, email, { deviceId });
  return {
    deviceId,
    token: session.accessToken,
    userId: session.user.id,
    push: async (operations) => {
      const res = await h
        .http()
        .post('/api/sync/push')
        .auth(session.accessToken, { type: 'bearer' })
        .send({ deviceId, operations });
      return { status: res.status, body: res.body };
    },
    op: (type, payload, authorId = session.user.id) => ({
      opId: randomUUID(),
      type,
      authorId,
      recordedAt: new Date().toISOString(),
      payload,
    }),
  };
}

export interface Released {
  revisionId: string;
  spec: PartSpec;
  pressId: string;
  expectedLoad: number;
}

/** The demo seed's first released spec revision and a press to open lots on. */
export async function released(
  h: Harness,
  token: string,
  partNumber = 'GM-1040',
): Promise<Released> {
  const specs = await h.http().get('/api/specs').auth(token, { type: 'bearer' }).expect(200);
  const spec = (
    specs.body as { partNumber: string; currentRevision: { id: string; partSpec: PartSpec } }[]
  ).find((s) => s.partNumber === partNumber)!;
  const presses = await h.http().get('/api/presses').auth(token, { type: 'bearer' }).expect(200);
  const prepared = prepareSpec(spec.currentRevision.partSpec);
  return {
    revisionId: spec.currentRevision.id,
    spec: spec.currentRevision.partSpec,
    pressId: presses.body[0].id,
    expectedLoad: (prepared.expected.low.load + prepared.expected.high.load) / 2,
  };
}

let lotCounter = 0;

export function lotOpen(t: Tablet, r: Released, lotSize = 200): { lotId: string; op: Op } {
  const lotId = randomUUID();
  return {
    lotId,
    op: t.op('lot.open', {
      id: lotId,
      lotNumber: `T-${process.pid}-${++lotCounter}`,
      specRevisionId: r.revisionId,
      pressId: r.pressId,
      cavity: 1,
      lotSize,
      moldedAt: new Date(Date.now() - 86_400_000).toISOString(),
    }),
  };
}

/** A sampled part; `loadFactor` away from 1 makes it nonconforming on load. */
export function part(
  t: Tablet,
  r: Released,
  lotId: string,
  sampleIndex: number,
  loadFactor = 1,
  extra = {},
): Op {
  const measurements = {
    thickness: r.spec.geometry.thickness,
    hardness: [r.spec.hardness.nominal, r.spec.hardness.nominal + 1, r.spec.hardness.nominal - 1],
    load: Math.round(r.expectedLoad * loadFactor),
  };
  return t.op('inspection.record', {
    id: randomUUID(),
    lotId,
    sampleIndex,
    measurements,
    deviceVerdict: deviceVerdictOf(partVerdict(prepareSpec(r.spec), measurements)),
    ...extra,
  });
}
