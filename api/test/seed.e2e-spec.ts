import { DataSource } from 'typeorm';
import { createApp } from '../src/create-app.js';
import { rows, startApp, type Harness } from './harness.js';

/* The demo seed of the plant server issue and DESIGN §8: an invented molder's week. */

let h: Harness;
beforeAll(async () => {
  h = await startApp();
});
afterAll(() => h.close());

const query = <T>(sql: string) => h.app.get(DataSource).query(sql) as Promise<T[]>;

test('one user per role, four presses, three fitted compounds and the released part specs', async () => {
  const roles = await query<{ role: string }>('SELECT role FROM users ORDER BY role');
  expect(roles.map((r) => r.role)).toEqual(['admin', 'inspector', 'quality', 'supervisor']);
  expect(await rows(h, 'presses')).toBe(4);
  const compounds = await query<{ fitted: number }>(
    'SELECT currentFitId IS NOT NULL AS fitted FROM compounds',
  );
  expect(compounds).toEqual([{ fitted: 1 }, { fitted: 1 }, { fitted: 1 }]);
  const released = await query<{ n: number }>(
    "SELECT COUNT(*) AS n FROM part_spec_revisions WHERE status = 'released'",
  );
  expect(released[0]!.n).toBeGreaterThanOrEqual(4);
});

test('a week of lots, each with its whole sample recorded and judged, a few of them flagged', async () => {
  const lots = await query<{
    sampleSize: number;
    inspected: number;
    stored: number;
    flagged: number;
  }>(
    `SELECT json_extract(plan, '$.sampleSize') AS sampleSize, inspected,
            (SELECT COUNT(*) FROM inspections i WHERE i.lotId = l.id) AS stored,
            serverVerdict = 'flagged' AS flagged
       FROM lots l`,
  );
  expect(lots.length).toBeGreaterThanOrEqual(20);
  for (const lot of lots) {
    expect(lot.stored).toBe(lot.sampleSize);
    expect(lot.inspected).toBe(lot.sampleSize);
  }
  const flagged = lots.filter((l) => l.flagged).length;
  expect(flagged).toBeGreaterThan(0);
  expect(flagged).toBeLessThan(lots.length / 4);
});

test('seeding again on the same file changes nothing', async () => {
  const tables = ['users', 'presses', 'compounds', 'lots', 'inspections', 'audit_log'];
  const count = async () => Promise.all(tables.map((t) => rows(h, t)));
  const before = await count();
  const again = await createApp(h.config);
  await again.close();
  expect(await count()).toEqual(before);
});
