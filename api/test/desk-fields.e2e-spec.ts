import { randomUUID } from 'node:crypto';
import { fitModel, type FitPoint } from '../src/engine.js';
import { requestsOf, rows, signIn, startApp, type Harness } from './harness.js';
import { planar, uniaxial } from './lab-readings.js';

let h: Harness;
let quality: string;
let qualityId: string;
let inspector: string;
beforeAll(async () => {
  h = await startApp();
  const session = await signIn(h, 'quality@demo.test');
  quality = session.accessToken;
  qualityId = session.user.id;
  inspector = (await signIn(h, 'inspector@demo.test')).accessToken;
});
afterAll(() => h.close());

const by = (token: string) => requestsOf(h, token);

let code = 0;
async function compound(extra: object = {}) {
  code += 1;
  return (
    await by(quality)
      .post('/api/compounds', {
        code: `DESK-${code}`,
        name: `Desk compound ${code}`,
        polymer: 'NR',
        hardnessShoreA: 50,
        ...extra,
      })
      .expect(201)
  ).body as { id: string; notes: string; bulkModulusMPa: number | null };
}

async function fitted(compoundId: string, weights?: object) {
  const q = by(quality);
  const sets: string[] = [];
  for (const [mode, points] of [
    ['uniaxial', uniaxial],
    ['planar', planar],
  ] as const) {
    const set = await q
      .post(`/api/compounds/${compoundId}/test-sets`, { name: mode, mode, points })
      .expect(201);
    sets.push(set.body.id);
  }
  const start = { model: { kind: 'mooney-rivlin', c10: 0.2, c01: 0.05 }, testSetIds: sets };
  const fit = await q
    .post(`/api/compounds/${compoundId}/fits`, {
      ...start,
      objective: 'absolute',
      ...(weights && { weights }),
    })
    .expect(201);
  return fit.body;
}

describe('fits: weights and publish note', () => {
  test('the weights go to the engine as given and are stored; none stored as null', async () => {
    const c = await compound();
    const weights = { uniaxial: 1, planar: 50 };
    const weighted = await fitted(c.id, weights);
    expect(weighted.weights).toEqual(weights);
    const plain = (await fitted(c.id)).weights;
    expect(plain).toBeNull();

    // The server's fit is the engine's fit with those weights (the desk relies on landing there).
    const data: FitPoint[] = [
      ...uniaxial.map((p) => ({ mode: 'uniaxial' as const, ...p })),
      ...planar.map((p) => ({ mode: 'planar' as const, ...p })),
    ];
    const engine = fitModel({
      model: { kind: 'mooney-rivlin', c10: 0.2, c01: 0.05 },
      data,
      objective: 'absolute',
      weights,
    });
    expect(weighted.model).toEqual(engine.model);
    const unweighted = fitModel({
      model: { kind: 'mooney-rivlin', c10: 0.2, c01: 0.05 },
      data,
      objective: 'absolute',
    });
    expect(weighted.model).not.toEqual(unweighted.model);
    // A heavier planar weight cannot fit the planar test worse than the plain sum does.
    expect(weighted.result.rmsByMode.planar).toBeLessThanOrEqual(
      unweighted.rmsByMode.planar! + 1e-12,
    );

    const detail = await by(quality).get(`/api/compounds/${c.id}`).expect(200);
    expect(detail.body.fits.map((f: { weights: unknown }) => f.weights)).toEqual([weights, null]);
  });

  test('a zero weight is a 400 naming it, and nothing is written', async () => {
    const c = await compound();
    const set = await by(quality)
      .post(`/api/compounds/${c.id}/test-sets`, { name: 'u', mode: 'uniaxial', points: uniaxial })
      .expect(201);
    const before = await rows(h, 'compound_fits');
    const res = await by(quality)
      .post(`/api/compounds/${c.id}/fits`, {
        model: { kind: 'neo-hookean', c10: 0.3 },
        testSetIds: [set.body.id],
        objective: 'absolute',
        weights: { uniaxial: 0 },
      })
      .expect(400);
    expect(res.body.field).toBe('weights.uniaxial');
    expect(await rows(h, 'compound_fits')).toBe(before);
  });

  test('publishing keeps the note and who published; the fit says who made it and when', async () => {
    const c = await compound();
    const fit = await fitted(c.id);
    expect(fit).toMatchObject({ createdBy: qualityId, note: null, publishedBy: null });
    expect(Number.isNaN(Date.parse(fit.createdAt))).toBe(false);
    const published = await by(quality)
      .post(`/api/compounds/${c.id}/fits/${fit.id}/publish`, { note: 'Planar data added' })
      .expect(200);
    expect(published.body.currentFit).toMatchObject({
      id: fit.id,
      status: 'published',
      note: 'Planar data added',
      publishedBy: qualityId,
      createdBy: qualityId,
    });
    const detail = await by(inspector).get(`/api/compounds/${c.id}`).expect(200);
    expect(detail.body.fits[0]).toMatchObject({
      note: 'Planar data added',
      publishedBy: qualityId,
    });
    const pulled = await by(inspector).get('/api/sync/pull?since=0&limit=1000').expect(200);
    const feedFit = pulled.body.changes.find(
      (ch: { kind: string; id: string }) => ch.kind === 'fit' && ch.id === fit.id,
    );
    expect(feedFit?.data).toMatchObject({ note: 'Planar data added', publishedBy: qualityId });
  });

  test('a note out of range is a 400, and the fit stays a draft', async () => {
    const c = await compound();
    const fit = await fitted(c.id);
    for (const note of ['', 'x'.repeat(1001), null]) {
      const res = await by(quality)
        .post(`/api/compounds/${c.id}/fits/${fit.id}/publish`, { note })
        .expect(400);
      expect(res.body.field).toBe('note');
    }
    const detail = await by(quality).get(`/api/compounds/${c.id}`).expect(200);
    expect(detail.body).toMatchObject({ currentFitId: null, fits: [{ status: 'draft' }] });
  });
});

describe('specs: set condition, note, and the compound K frozen at release', () => {
  async function releasedFor(compoundId: string) {
    const q = by(quality);
    const fit = await fitted(compoundId);
    await q.post(`/api/compounds/${compoundId}/fits/${fit.id}/publish`).expect(200);
    const spec = await q
      .post('/api/specs', { partNumber: `DESK-PAD-${randomUUID().slice(0, 8)}`, name: 'Pad' })
      .expect(201);
    const body = {
      geometry: { shape: 'disc', diameter: 60, thickness: 10 },
      bonded: true,
      compoundId,
      testDeflection: 1,
      loadTolerancePercent: 15,
      tolerance: { class: 'M2' },
      hardness: { nominal: 50, tolerance: 5 },
      compressionSetLimitPercent: 25,
      compressionSetCondition: { temperatureC: 70, hours: 22 },
      sampling: { level: 'II', aql: 1, severity: 'normal' },
      note: 'Set limit now stated at 70 °C',
    };
    const draft = await q.post(`/api/specs/${spec.body.id}/revisions`, body).expect(201);
    expect(draft.body.body).toEqual(body);
    const release = await q
      .post(`/api/specs/${spec.body.id}/revisions/${draft.body.id}/release`)
      .expect(200);
    return { body, release: release.body, specId: spec.body.id as string };
  }

  test('a compound with a measured K: the frozen body and the part spec carry it', async () => {
    const c = await compound({ bulkModulusMPa: 1800 });
    const { body, release, specId } = await releasedFor(c.id);
    expect(release.body).toEqual({ ...body, bulkModulusMPa: 1800 });
    expect(release.partSpec).toMatchObject({ bulkModulusMPa: 1800, note: body.note });
    const detail = await by(inspector).get(`/api/specs/${specId}`).expect(200);
    expect(detail.body.revisions[0].body.bulkModulusMPa).toBe(1800);
  });

  test('a compound without one: the body is frozen as written', async () => {
    const c = await compound();
    const { body, release } = await releasedFor(c.id);
    expect(release.body).toEqual(body);
    expect(release.partSpec.bulkModulusMPa).toBeNull();
  });

  test('bulkModulusMPa is the server’s to set: a client sending it gets a 400', async () => {
    const c = await compound();
    const spec = await by(quality)
      .post('/api/specs', { partNumber: `DESK-K-${randomUUID().slice(0, 8)}`, name: 'Pad' })
      .expect(201);
    const res = await by(quality)
      .post(`/api/specs/${spec.body.id}/revisions`, {
        geometry: { shape: 'disc', diameter: 60, thickness: 10 },
        bonded: true,
        compoundId: c.id,
        testDeflection: 1,
        loadTolerancePercent: 15,
        tolerance: { class: 'M2' },
        hardness: { nominal: 50, tolerance: 5 },
        sampling: { level: 'II', aql: 1, severity: 'normal' },
        bulkModulusMPa: 2000,
      })
      .expect(400);
    expect(res.body.field).toBe('bulkModulusMPa');
  });
});

describe('compounds: notes and PATCH', () => {
  test('notes default to empty and are kept when given', async () => {
    expect((await compound()).notes).toBe('');
    expect((await compound({ notes: 'Peroxide cure' })).notes).toBe('Peroxide cure');
  });

  test('PATCH changes the given fields, is audited with before and after, and reaches tablets', async () => {
    const c = await compound({ notes: 'first' });
    const res = await by(quality)
      .patch(`/api/compounds/${c.id}`, { name: 'Renamed', bulkModulusMPa: 2200, notes: 'second' })
      .expect(200);
    expect(res.body).toMatchObject({
      id: c.id,
      code: `DESK-${code}`,
      name: 'Renamed',
      polymer: 'NR',
      hardnessShoreA: 50,
      bulkModulusMPa: 2200,
      notes: 'second',
      currentFit: null,
    });
    const log = await by(quality).get(`/api/audit?entity=compound&entityId=${c.id}`).expect(200);
    expect(log.body[0]).toMatchObject({
      action: 'compound.update',
      actorId: qualityId,
      before: { name: `Desk compound ${code}`, notes: 'first', bulkModulusMPa: null },
      after: { name: 'Renamed', notes: 'second', bulkModulusMPa: 2200 },
    });
    const pulled = await by(inspector).get('/api/sync/pull?since=0&limit=1000').expect(200);
    const latest = pulled.body.changes.filter(
      (ch: { kind: string; id: string }) => ch.kind === 'compound' && ch.id === c.id,
    );
    expect(latest.at(-1).data).toMatchObject({ name: 'Renamed', notes: 'second' });
  });

  test('the code stays fixed; an unknown compound is a 404; nothing is written', async () => {
    const c = await compound();
    const before = await rows(h, 'audit_log');
    const res = await by(quality).patch(`/api/compounds/${c.id}`, { code: 'NEW' }).expect(400);
    expect(res.body.field).toBe('code');
    await by(quality).patch(`/api/compounds/${randomUUID()}`, { name: 'x' }).expect(404);
    await by(quality)
      .patch(`/api/compounds/${c.id}`, { notes: 'x'.repeat(2001) })
      .expect(400);
    expect(await rows(h, 'audit_log')).toBe(before);
  });
});

describe('compression-set aging sets', () => {
  // Invented oven results: life falls as temperature rises (roughly 90 kJ/mol).
  const points = [
    { temperatureC: 70, hours: 6000 },
    { temperatureC: 100, hours: 900 },
    { temperatureC: 125, hours: 210 },
  ];

  test('a set is kept and listed newest first', async () => {
    const c = await compound();
    const first = await by(quality)
      .post(`/api/compounds/${c.id}/aging`, { name: 'First', thresholdPercent: 40, points })
      .expect(201);
    expect(first.body).toMatchObject({
      compoundId: c.id,
      name: 'First',
      thresholdPercent: 40,
      points,
      createdBy: qualityId,
    });
    const second = await by(quality)
      .post(`/api/compounds/${c.id}/aging`, {
        name: 'Second',
        thresholdPercent: 50,
        points: [...points, { temperatureC: 150, hours: 60 }],
      })
      .expect(201);
    const list = await by(inspector).get(`/api/compounds/${c.id}/aging`).expect(200);
    expect(list.body.map((s: { id: string }) => s.id)).toEqual([second.body.id, first.body.id]);
    const log = await by(quality).get(`/api/audit?entity=compound&entityId=${c.id}`).expect(200);
    expect(log.body[0]).toMatchObject({ action: 'compound.aging', after: { name: 'Second' } });
  });

  test('points the Arrhenius fit refuses are a 422 with its field and reason; nothing is written', async () => {
    const c = await compound();
    const before = await rows(h, 'compound_aging_sets');
    const twoTemperatures = await by(quality)
      .post(`/api/compounds/${c.id}/aging`, {
        name: 'Two temperatures',
        thresholdPercent: 40,
        points: [...points.slice(0, 2), { temperatureC: 100, hours: 950 }],
      })
      .expect(422);
    expect(twoTemperatures.body).toMatchObject({ field: 'points' });
    expect(twoTemperatures.body.reason).toMatch(/three or more different temperatures/);
    const rising = await by(quality)
      .post(`/api/compounds/${c.id}/aging`, {
        name: 'Rising',
        thresholdPercent: 40,
        points: points.map((p, i) => ({ ...p, hours: 100 * (i + 1) })),
      })
      .expect(422);
    expect(rising.body.field).toBe('points');
    expect(await rows(h, 'compound_aging_sets')).toBe(before);
  });

  test('an unknown compound is a 404 for reading and writing', async () => {
    const id = randomUUID();
    await by(quality).get(`/api/compounds/${id}/aging`).expect(404);
    await by(quality)
      .post(`/api/compounds/${id}/aging`, { name: 'x', thresholdPercent: 40, points })
      .expect(404);
  });
});
