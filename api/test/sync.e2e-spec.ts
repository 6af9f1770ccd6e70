import { randomUUID } from 'node:crypto';
import { rows, signIn, startApp, type Harness } from './harness.js';
import { lotOpen, part, released, tablet, type Released, type Tablet } from './ops.js';

let h: Harness;
let t: Tablet;
let r: Released;
beforeAll(async () => {
  h = await startApp();
  t = await tablet(h, 'inspector@demo.test');
  r = await released(h, t.token);
});
afterAll(() => h.close());

const count = (table: string) => rows(h, table);

const statuses = (body: { results: { status: string }[] }) => body.results.map((x) => x.status);

test('the same batch pushed twice is applied once; the second answer is all duplicates', async () => {
  const { lotId, op } = lotOpen(t, r);
  const batch = [op, part(t, r, lotId, 1), part(t, r, lotId, 2), part(t, r, lotId, 3)];
  const first = await t.push(batch);
  expect(first.status).toBe(200);
  expect(statuses(first.body)).toEqual(['applied', 'applied', 'applied', 'applied']);
  const rows = {
    inspections: await count('inspections'),
    audit: await count('audit_log'),
    ops: await count('applied_ops'),
  };
  const again = await t.push(batch);
  expect(statuses(again.body)).toEqual(['duplicate', 'duplicate', 'duplicate', 'duplicate']);
  expect({
    inspections: await count('inspections'),
    audit: await count('audit_log'),
    ops: await count('applied_ops'),
  }).toEqual(rows);
  const lot = await h
    .http()
    .get(`/api/lots/${lotId}`)
    .auth(t.token, { type: 'bearer' })
    .expect(200);
  expect(lot.body.inspections).toHaveLength(3);
});

test('one bad operation is rejected with its reason; the rest of the batch applies', async () => {
  const { lotId, op } = lotOpen(t, r);
  const bad = part(t, r, lotId, 2);
  (bad.payload.measurements as Record<string, unknown>).thickness = 'NaN';
  const unknownLot = part(t, r, randomUUID(), 1);
  const unknownType = t.op('lot.delete', { lotId });
  const { body } = await t.push([
    op,
    part(t, r, lotId, 1),
    bad,
    unknownLot,
    unknownType,
    part(t, r, lotId, 3),
  ]);
  expect(statuses(body)).toEqual([
    'applied',
    'applied',
    'rejected',
    'rejected',
    'rejected',
    'applied',
  ]);
  expect(body.results[2]!.reason).toMatch(/payload\.measurements\.thickness/);
  expect(body.results[3]!.reason).toMatch(/not known to the server/);
  expect(body.results[4]!.reason).toMatch(/^type: /);
  // A rejected op was not applied, so fixing it and pushing it again under the same opId works.
  (bad.payload.measurements as Record<string, unknown>).thickness = r.spec.geometry.thickness;
  expect(statuses((await t.push([bad])).body)).toEqual(['applied']);
});

test('the server keeps its own verdict beside the device’s and judges the lot by the plan', async () => {
  const { lotId, op } = lotOpen(t, r, 10); // 10 parts: sample 5, rejected at 1 (ISO 2859-1, AQL 2.5)
  const lying = part(t, r, lotId, 2, 1.6);
  // The tablet claims the part is fine; the server's engine says otherwise.
  lying.payload.deviceVerdict = {
    status: 'within',
    conforming: true,
    characteristics: { load: 'within' },
  };
  const { body } = await t.push([op, part(t, r, lotId, 1), lying]);
  expect(statuses(body)).toEqual(['applied', 'applied', 'applied']);
  const lot = await h
    .http()
    .get(`/api/lots/${lotId}`)
    .auth(t.token, { type: 'bearer' })
    .expect(200);
  const recorded = lot.body.inspections.find((i: { sampleIndex: number }) => i.sampleIndex === 2);
  expect(recorded.deviceVerdict.conforming).toBe(true);
  expect(recorded.serverVerdict.conforming).toBe(false);
  expect(
    recorded.serverVerdict.characteristics.find(
      (c: { characteristic: string }) => c.characteristic === 'load',
    ).status,
  ).toBe('out');
  expect(lot.body).toMatchObject({ serverVerdict: 'flagged', nonconforming: 1, inspected: 2 });
  expect(lot.body.plan).toMatchObject({ sampleSize: 5, accept: 0, reject: 1 });
});

test('a record with its plan dimensions is applied and each dimension judged (ISO 3302-1 M2)', async () => {
  const { lotId, op } = lotOpen(t, r);
  // GM-1040 is an 80 mm square pad; side 80.1 mm lies inside M2's ± 0.50 mm for 63–100 mm.
  const measured = part(t, r, lotId, 1);
  (measured.payload.measurements as Record<string, unknown>).dimensions = { side: 80.1 };
  const { body } = await t.push([op, measured]);
  expect(statuses(body)).toEqual(['applied', 'applied']);
  const lot = await h
    .http()
    .get(`/api/lots/${lotId}`)
    .auth(t.token, { type: 'bearer' })
    .expect(200);
  const side = lot.body.inspections[0].serverVerdict.characteristics.find(
    (c: { characteristic: string }) => c.characteristic === 'side',
  );
  expect(side).toMatchObject({ status: 'within', measured: 80.1, lower: 79.5, upper: 80.5 });
  expect(lot.body.inspections[0].measurements.dimensions).toEqual({ side: 80.1 });
});

test('a record id already stored, or used earlier in the batch, is refused; the first stays', async () => {
  const { lotId, op } = lotOpen(t, r);
  const first = part(t, r, lotId, 1);
  expect(statuses((await t.push([op, first])).body)).toEqual(['applied', 'applied']);
  const reused = part(t, r, lotId, 2, 1, { id: first.payload.id });
  const fresh = part(t, r, lotId, 3);
  const twice = part(t, r, lotId, 4, 1, { id: fresh.payload.id });
  const { body } = await t.push([reused, fresh, twice]);
  expect(statuses(body)).toEqual(['rejected', 'applied', 'rejected']);
  expect(body.results[0]!.reason).toBe(
    `id ${first.payload.id} is already the id of another record`,
  );
  const lot = await h
    .http()
    .get(`/api/lots/${lotId}`)
    .auth(t.token, { type: 'bearer' })
    .expect(200);
  expect(lot.body.inspections.map((i: { sampleIndex: number }) => i.sampleIndex)).toEqual([1, 3]);
});

test('a correction supersedes the current record once; a second record of a sample is refused', async () => {
  const { lotId, op } = lotOpen(t, r);
  const original = part(t, r, lotId, 1, 1.6);
  await t.push([op, original]);
  const correction = part(t, r, lotId, 1, 1, { supersedes: original.payload.id });
  const duplicateSample = part(t, r, lotId, 1);
  const secondCorrection = part(t, r, lotId, 1, 1, { supersedes: original.payload.id });
  const { body } = await t.push([correction, duplicateSample, secondCorrection]);
  expect(statuses(body)).toEqual(['applied', 'rejected', 'rejected']);
  expect(body.results[1]!.reason).toMatch(/already recorded/);
  expect(body.results[2]!.reason).toMatch(/not the current record/);
  const lot = await h
    .http()
    .get(`/api/lots/${lotId}`)
    .auth(t.token, { type: 'bearer' })
    .expect(200);
  expect(lot.body.inspections.map((i: { supersededBy: string | null }) => i.supersededBy)).toEqual([
    correction.payload.id,
    null,
  ]);
  expect(lot.body.nonconforming).toBe(0);
});

test('each op is attributed to its author, who must have signed in on that device', async () => {
  const supervisor = await signIn(h, 'supervisor@demo.test'); // signed in, but not on this tablet
  const { lotId, op } = lotOpen(t, r);
  const bySupervisor = part(t, r, lotId, 1);
  bySupervisor.authorId = supervisor.user.id;
  const beforeSignIn = part(t, r, lotId, 2);
  beforeSignIn.recordedAt = new Date(Date.now() - 3_600_000).toISOString();
  const future = part(t, r, lotId, 3);
  future.recordedAt = new Date(Date.now() + 3_600_000).toISOString();
  const first = await t.push([op, bySupervisor, future]);
  expect(statuses(first.body)).toEqual(['applied', 'rejected', 'rejected']);
  expect(first.body.results[1]!.reason).toMatch(/had not signed in on device/);
  expect(first.body.results[2]!.reason).toMatch(/in the future/);
  // The supervisor signs in on the shared tablet; their op now goes through under the inspector's token.
  await signIn(h, 'supervisor@demo.test', { deviceId: t.deviceId });
  const retry = { ...bySupervisor, recordedAt: new Date().toISOString() };
  expect(statuses((await t.push([retry])).body)).toEqual(['applied']);
  // Work from before the inspector's own sign-in on this device is not theirs to push.
  const early = { ...beforeSignIn, recordedAt: new Date(Date.now() - 86_400_000).toISOString() };
  expect(statuses((await t.push([early])).body)).toEqual(['rejected']);
  const lot = await h
    .http()
    .get(`/api/lots/${lotId}`)
    .auth(t.token, { type: 'bearer' })
    .expect(200);
  expect(lot.body.inspections[0].authorId).toBe(supervisor.user.id);
  // A token made on another device cannot push for this one.
  const other = await signIn(h, 'inspector@demo.test', { deviceId: randomUUID() });
  const wrongDevice = await h
    .http()
    .post('/api/sync/push')
    .auth(other.accessToken, { type: 'bearer' })
    .send({ deviceId: t.deviceId, operations: [] });
  expect(wrongDevice.status).toBe(403);
});

test('two devices pushing at once both land, and one batch raced against itself applies once', async () => {
  const second = await tablet(h, 'supervisor@demo.test');
  const a = lotOpen(t, r);
  const b = lotOpen(second, r);
  const batchA = [a.op, ...[1, 2, 3, 4, 5].map((i) => part(t, r, a.lotId, i))];
  const batchB = [b.op, ...[1, 2, 3, 4, 5].map((i) => part(second, r, b.lotId, i))];
  const [resA, resA2, resB] = await Promise.all([
    t.push(batchA),
    t.push(batchA),
    second.push(batchB),
  ]);
  expect(statuses(resB.body)).toEqual(Array(6).fill('applied'));
  const pair = [statuses(resA.body), statuses(resA2.body)].sort();
  expect(pair).toEqual([Array(6).fill('applied'), Array(6).fill('duplicate')]);
  for (const lotId of [a.lotId, b.lotId]) {
    const lot = await h
      .http()
      .get(`/api/lots/${lotId}`)
      .auth(t.token, { type: 'bearer' })
      .expect(200);
    expect(lot.body.inspections).toHaveLength(5);
  }
});

test('a pull cursor never skips or repeats a change, even while pushes land', async () => {
  const pullAll = async (limit: number) => {
    const seen: number[] = [];
    let cursor = '0';
    for (;;) {
      const page = await h
        .http()
        .get(`/api/sync/pull?since=${cursor}&limit=${limit}`)
        .auth(t.token, { type: 'bearer' })
        .expect(200);
      seen.push(...page.body.changes.map((c: { seq: number }) => c.seq));
      cursor = page.body.cursor;
      if (!page.body.more) return { seen, cursor };
    }
  };
  const pushes = Array.from({ length: 4 }, () => {
    const { lotId, op } = lotOpen(t, r);
    return t.push([op, part(t, r, lotId, 1), part(t, r, lotId, 2)]);
  });
  const [during] = await Promise.all([pullAll(7), ...pushes]);
  // Whatever was read while pushing, a second pass from its cursor picks up the rest.
  const rest = await pullAll(7);
  const resumed = await (async () => {
    const seen = [...during.seen];
    let cursor = during.cursor;
    for (;;) {
      const page = await h
        .http()
        .get(`/api/sync/pull?since=${cursor}&limit=5`)
        .auth(t.token, { type: 'bearer' })
        .expect(200);
      seen.push(...page.body.changes.map((c: { seq: number }) => c.seq));
      cursor = page.body.cursor;
      if (!page.body.more) return seen;
    }
  })();
  expect(new Set(resumed).size).toBe(resumed.length);
  expect(resumed).toEqual([...resumed].sort((x, y) => x - y));
  expect(resumed).toEqual(rest.seen);
  const kinds = await h
    .http()
    .get('/api/sync/pull?limit=1000')
    .auth(t.token, { type: 'bearer' })
    .expect(200);
  expect(new Set(kinds.body.changes.map((c: { kind: string }) => c.kind))).toEqual(
    new Set(['press', 'compound', 'fit', 'spec', 'lot', 'disposition']),
  );
});
