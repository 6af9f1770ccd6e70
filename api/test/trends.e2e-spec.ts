import { randomUUID } from 'node:crypto';
import { signIn, startApp, type Harness } from './harness.js';
import { lotOpen, part, released, tablet, type Released, type Tablet } from './ops.js';

let h: Harness;
let t: Tablet;
let r: Released;
let quality: string;
beforeAll(async () => {
  h = await startApp();
  t = await tablet(h, 'inspector@demo.test');
  r = await released(h, t.token);
  quality = (await signIn(h, 'quality@demo.test')).accessToken;
});
afterAll(() => h.close());

const rowsOf = (query: Record<string, string>) =>
  h.http().get('/api/trends/measurements').query(query).auth(quality, { type: 'bearer' });

interface Row {
  lotId: string;
  sampleIndex: number;
  inspectionId: string;
  hardness: number | null;
  load: number | null;
  cavity: number;
  pressCode: string;
}

test('one row per current sampled part: a correction replaces its record, hardness is the median', async () => {
  const { lotId, op } = lotOpen(t, r);
  const first = part(t, r, lotId, 1);
  const second = part(t, r, lotId, 2);
  (second.payload.measurements as { hardness: number[] }).hardness = [52, 58, 55];
  await t.push([op, first, second]);
  const correction = part(t, r, lotId, 1, 1.1, { supersedes: first.payload.id });
  expect((await t.push([correction])).body.results[0]!.status).toBe('applied');

  const res = await rowsOf({ specId: (await specIdOf(r.revisionId))! }).expect(200);
  const ours = (res.body as Row[]).filter((row) => row.lotId === lotId);
  expect(ours.map((row) => [row.sampleIndex, row.inspectionId])).toEqual([
    [1, correction.payload.id],
    [2, second.payload.id],
  ]);
  // Median of 52, 58, 55 (REFERENCES §6: the median of the readings counts).
  expect(ours[1]!.hardness).toBe(55);
  expect(ours[0]!.load).toBe(Math.round(r.expectedLoad * 1.1));
  expect(ours[0]!.cavity).toBe(1);
  expect(ours[0]!.pressCode).toMatch(/\S/);
});

test('press and cavity narrow the rows; no lot matches → an empty list', async () => {
  const specId = (await specIdOf(r.revisionId))!;
  const all = (await rowsOf({ specId }).expect(200)).body as Row[];
  expect(all.length).toBeGreaterThan(0);
  const cavity2 = (await rowsOf({ specId, cavity: '2' }).expect(200)).body as Row[];
  expect(cavity2.every((row) => row.cavity === 2)).toBe(true);
  expect(cavity2.length).toBeLessThan(all.length);
  expect((await rowsOf({ specId: randomUUID() }).expect(200)).body).toEqual([]);
});

test('from and to bound the molding time; a date alone as `to` covers that whole day', async () => {
  const specId = (await specIdOf(r.revisionId))!;
  const { lotId, op } = lotOpen(t, r); // molded a day ago
  await t.push([op, part(t, r, lotId, 1)]);
  const moldedOn = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10);
  const through = (await rowsOf({ specId, to: moldedOn }).expect(200)).body as Row[];
  expect(through.some((row) => row.lotId === lotId)).toBe(true);
  const later = new Date(Date.now() + 3_600_000).toISOString();
  expect((await rowsOf({ specId, from: later }).expect(200)).body).toEqual([]);
});

test('bad parameters are 400s naming the parameter', async () => {
  for (const [query, field] of [
    [{}, 'specId'],
    [{ specId: 'nope' }, 'specId'],
    [{ specId: randomUUID(), cavity: '0' }, 'cavity'],
    [{ specId: randomUUID(), from: 'yesterday' }, 'from'],
    [{ specId: randomUUID(), colour: 'red' }, 'colour'],
  ] as const) {
    const res = await rowsOf(query);
    expect([res.status, res.body.field]).toEqual([400, field]);
  }
});

async function specIdOf(revisionId: string): Promise<string | undefined> {
  const specs = await h.http().get('/api/specs').auth(quality, { type: 'bearer' }).expect(200);
  return (specs.body as { id: string; currentRevision: { id: string } }[]).find(
    (s) => s.currentRevision.id === revisionId,
  )?.id;
}
