import { requestsOf, signIn, startApp, type Harness } from './harness.js';
import { planar, uniaxial } from './lab-readings.js';
import { lotOpen, part, released, tablet } from './ops.js';

let h: Harness;
let quality: string;
let supervisor: string;
beforeAll(async () => {
  h = await startApp();
  quality = (await signIn(h, 'quality@demo.test')).accessToken;
  supervisor = (await signIn(h, 'supervisor@demo.test')).accessToken;
});
afterAll(() => h.close());

const by = (token: string) => requestsOf(h, token);

test('a compound is fitted by the engine, published, and a spec released against it is frozen', async () => {
  const q = by(quality);
  const compound = await q
    .post('/api/compounds', {
      code: 'TEST-50',
      name: 'Test compound',
      polymer: 'NR',
      hardnessShoreA: 50,
    })
    .expect(201);
  const sets = [];
  for (const [mode, points] of [
    ['uniaxial', uniaxial],
    ['planar', planar],
  ] as const) {
    sets.push(
      (
        await q
          .post(`/api/compounds/${compound.body.id}/test-sets`, { name: mode, mode, points })
          .expect(201)
      ).body.id,
    );
  }
  const fit = await q
    .post(`/api/compounds/${compound.body.id}/fits`, {
      model: { kind: 'mooney-rivlin', c10: 0.2, c01: 0.05 },
      testSetIds: sets,
      objective: 'absolute',
    })
    .expect(201);
  expect(fit.body).toMatchObject({ version: 1, status: 'draft', model: { kind: 'mooney-rivlin' } });
  expect(fit.body.result.r2ByMode.uniaxial).toBeGreaterThan(0.95);

  const spec = await q
    .post('/api/specs', { partNumber: 'TEST-PAD-1', name: 'Test pad' })
    .expect(201);
  const body = {
    geometry: { shape: 'disc', diameter: 60, thickness: 10 },
    bonded: true,
    compoundId: compound.body.id,
    testDeflection: 1,
    loadTolerancePercent: 15,
    tolerance: { class: 'M2' },
    hardness: { nominal: 50, tolerance: 5 },
    sampling: { level: 'II', aql: 1, severity: 'normal' },
  };
  const draft = await q.post(`/api/specs/${spec.body.id}/revisions`, body).expect(201);
  // No published fit yet: nothing to release against.
  await q.post(`/api/specs/${spec.body.id}/revisions/${draft.body.id}/release`).expect(409);
  await q.post(`/api/compounds/${compound.body.id}/fits/${fit.body.id}/publish`).expect(200);
  await q
    .put(`/api/specs/${spec.body.id}/revisions/${draft.body.id}`, {
      ...body,
      loadTolerancePercent: 20,
    })
    .expect(200);
  const release = await q
    .post(`/api/specs/${spec.body.id}/revisions/${draft.body.id}/release`)
    .expect(200);
  expect(release.body).toMatchObject({ status: 'released', fitId: fit.body.id, revision: 1 });
  expect(release.body.partSpec.model).toEqual(fit.body.model);
  const { windows, lowerLoad, upperLoad } = release.body.derived;
  expect(lowerLoad).toBeLessThan(upperLoad);
  expect(windows.thickness.min.value).toBeLessThan(10);
  expect(windows.thickness.max.value).toBeGreaterThan(10);
  await q.put(`/api/specs/${spec.body.id}/revisions/${draft.body.id}`, body).expect(409);
  const detail = await q.get(`/api/specs/${spec.body.id}`).expect(200);
  expect(detail.body.currentRevisionId).toBe(draft.body.id);
});

test('a geometry the engine refuses is a 422 naming the field; a deflection past the thickness a 400', async () => {
  const q = by(quality);
  const [compound] = (await q.get('/api/compounds').expect(200)).body;
  const spec = await q
    .post('/api/specs', { partNumber: 'TEST-RING-1', name: 'Test ring' })
    .expect(201);
  const body = {
    geometry: { shape: 'annulus', outerDiameter: 30, innerDiameter: 40, thickness: 10 },
    bonded: true,
    compoundId: compound.id,
    testDeflection: 1,
    loadTolerancePercent: 15,
    tolerance: { class: 'M2' },
    hardness: { nominal: 50, tolerance: 5 },
    sampling: { level: 'II', aql: 1, severity: 'normal' },
  };
  const ring = await q.post(`/api/specs/${spec.body.id}/revisions`, body).expect(422);
  expect(ring.body.field).toBe('innerDiameter');
  const deep = await q
    .post(`/api/specs/${spec.body.id}/revisions`, {
      ...body,
      geometry: { shape: 'disc', diameter: 40, thickness: 1 },
    })
    .expect(400);
  expect(deep.body.field).toBe('testDeflection');
});

test('review queue, disposition, reopen, and the lot report as JSON and CSV', async () => {
  const t = await tablet(h, 'inspector@demo.test');
  const r = await released(h, t.token, 'GS-3070');
  const { lotId, op } = lotOpen(t, r, 10);
  await t.push([op, part(t, r, lotId, 1), part(t, r, lotId, 2, 1.8)]);
  const s = by(supervisor);
  const queue = await s.get('/api/lots?flagged=true').expect(200);
  expect(queue.body.map((l: { id: string }) => l.id)).toContain(lotId);

  await s
    .post(`/api/lots/${lotId}/dispositions`, { action: 'sort-all', note: 'Sort 100 % on load.' })
    .expect(201);
  const after = await s.get('/api/lots?flagged=true').expect(200);
  expect(after.body.map((l: { id: string }) => l.id)).not.toContain(lotId);

  const report = await s.get(`/api/lots/${lotId}/report`).expect(200);
  expect(report.body).toMatchObject({
    part: { partNumber: 'GS-3070', revision: 1 },
    verdict: { lot: 'flagged', nonconforming: 1, inspected: 2 },
    dispositions: [{ action: 'sort-all', decidedBy: 'Sam Demo' }],
  });
  expect(report.body.notice).toMatch(/qualified engineer/);
  expect(
    report.body.parts[1].characteristics.find(
      (c: { characteristic: string }) => c.characteristic === 'load',
    ).status,
  ).toBe('out');

  const csv = await s.get(`/api/lots/${lotId}/report.csv`).expect(200);
  expect(csv.headers['content-type']).toMatch(/^text\/csv/);
  expect(csv.headers['content-disposition']).toMatch(/attachment; filename="lot-T-/);
  const lines = csv.text.trim().split('\r\n');
  expect(lines).toHaveLength(3);
  expect(lines[0]).toMatch(/^lot,part,revision,sample/);
  expect(lines[2]).toMatch(/,out,no,/);

  await t.push([
    t.op('lot.submit', { lotId, deviceVerdict: { verdict: 'flagged', nonconforming: 1 } }),
  ]);
  const reopened = await s
    .post(`/api/lots/${lotId}/reopen`, { note: 'Re-check after sorting' })
    .expect(200);
  expect(reopened.body.status).toBe('open');
});

test('every write is audited with before and after; admins and quality read it', async () => {
  const admin = by((await signIn(h, 'admin@demo.test')).accessToken);
  const made = await admin
    .post('/api/users', {
      email: 'audit-me@demo.test',
      name: 'Audit Me',
      role: 'inspector',
      password: 'long-enough-3',
    })
    .expect(201);
  await h
    .http()
    .patch(`/api/users/${made.body.id}/role`)
    .auth((await signIn(h, 'admin@demo.test')).accessToken, { type: 'bearer' })
    .send({ role: 'supervisor' })
    .expect(200);
  const log = await by(quality).get(`/api/audit?entity=user&entityId=${made.body.id}`).expect(200);
  expect(log.body.map((e: { action: string }) => e.action)).toEqual(['user.role', 'user.create']);
  expect(log.body[0]).toMatchObject({
    before: { role: 'inspector' },
    after: { role: 'supervisor' },
  });
  expect(JSON.stringify(log.body)).not.toMatch(/passwordHash/);
});

test('a duplicate key is a 409 naming the field, not a 500', async () => {
  const admin = by((await signIn(h, 'admin@demo.test')).accessToken);
  const press = await admin
    .post('/api/presses', { code: 'P1', name: 'Again', kind: 'compression' })
    .expect(409);
  expect(press.body).toMatchObject({ statusCode: 409, field: 'code' });
  const user = await admin
    .post('/api/users', {
      email: 'quality@demo.test',
      name: 'Twin',
      role: 'quality',
      password: 'long-enough-4',
    })
    .expect(409);
  expect(user.body.field).toBe('email');
});
