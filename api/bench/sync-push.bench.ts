/*
 * Sync push throughput: 10 000 sampled-part records pushed over HTTP in batches of 200 to the
 * compiled server on a fresh data folder, against raw better-sqlite3 inserting the same rows in
 * one transaction. Run with `npm run bench -w api` (it builds first).
 */
import { spawn } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer, type AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { partVerdict, prepareSpec, type PartSpec } from '../src/engine.js';
import { deviceVerdictOf } from '../src/sync/device-verdict.js';

const RECORDS = 10_000;
const BATCH = 200;
// Lots of 3 201–10 000 parts take code letter L at level II: 200 samples each.
const LOT_SIZE = 5000;

const API = join(import.meta.dirname, '..');
const dataDir = mkdtempSync(join(tmpdir(), 'gumshoe-bench-'));

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as AddressInfo;
      probe.close(() => resolve(port));
    });
  });
}

const port = await freePort();
const base = `http://127.0.0.1:${port}/api`;
const server = spawn(process.execPath, [join(API, 'dist', 'api', 'src', 'main.js')], {
  env: { ...process.env, PORT: String(port), GUMSHOE_DATA_DIR: dataDir },
  stdio: ['ignore', 'pipe', 'inherit'],
});
await new Promise<void>((resolve, reject) => {
  server.stdout.on('data', (part: Buffer) => part.toString().includes('http://') && resolve());
  server.on('exit', (code) => reject(new Error(`server exited with ${code}`)));
});

async function call<T>(method: string, path: string, token?: string, body?: unknown): Promise<T> {
  const res = await fetch(base + path, {
    method,
    headers: {
      'content-type': 'application/json',
      ...(token ? { authorization: `Bearer ${token}` } : {}),
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
  return (await res.json()) as T;
}

const deviceId = randomUUID();
const session = await call<{ accessToken: string; user: { id: string } }>(
  'POST',
  '/auth/login',
  undefined,
  {
    email: 'inspector@demo.test',
    password: 'demo-password-1',
    deviceId,
  },
);
const token = session.accessToken;
const authorId = session.user.id;
const specs = await call<{ currentRevision: { id: string; partSpec: PartSpec } }[]>(
  'GET',
  '/specs',
  token,
);
const presses = await call<{ id: string }[]>('GET', '/presses', token);
const revision = specs[0]!.currentRevision;
const prepared = prepareSpec(revision.partSpec);
const nominal = revision.partSpec;

type Op = { opId: string; type: string; authorId: string; recordedAt: string; payload: object };
const push = (operations: Op[]) =>
  call<{ results: { status: string; reason?: string }[] }>('POST', '/sync/push', token, {
    deviceId,
    operations,
  });
const op = (type: string, payload: object): Op => ({
  opId: randomUUID(),
  type,
  authorId,
  recordedAt: new Date().toISOString(),
  payload,
});

// The lots first (not timed): one per 200 records.
const lotIds = Array.from({ length: RECORDS / BATCH }, () => randomUUID());
const opened = await push(
  lotIds.map((id, i) =>
    op('lot.open', {
      id,
      lotNumber: `BENCH-${i + 1}`,
      specRevisionId: revision.id,
      pressId: presses[i % presses.length]!.id,
      cavity: 1,
      lotSize: LOT_SIZE,
      moldedAt: new Date().toISOString(),
    }),
  ),
);
if (opened.results.some((r) => r.status !== 'applied'))
  throw new Error(JSON.stringify(opened.results[0]));

// What a tablet would send: the part's readings near nominal, and the verdict it showed.
let state = 42;
const jitter = () => ((state = (state * 16807) % 2147483647) / 2147483647 - 0.5) * 0.02;
// The server stores its own full verdict beside the device's summary; the raw rows do too.
const verdicts = new Map<string, object>();
const batches: Op[][] = lotIds.map((lotId) =>
  Array.from({ length: BATCH }, (_, i) => {
    const measurements = {
      thickness: Number((nominal.geometry.thickness * (1 + jitter())).toFixed(2)),
      hardness: [0, 1, 2].map(() => Math.round(nominal.hardness.nominal + jitter() * 100)),
      load: Math.round(prepared.expected.low.load * (1 + jitter() * 3)),
    };
    const id = randomUUID();
    const verdict = partVerdict(prepared, measurements);
    verdicts.set(id, verdict);
    return op('inspection.record', {
      id,
      lotId,
      sampleIndex: i + 1,
      measurements,
      deviceVerdict: deviceVerdictOf(verdict),
    });
  }),
);

const started = performance.now();
for (const batch of batches) {
  const { results } = await push(batch);
  const bad = results.find((r) => r.status !== 'applied');
  if (bad) throw new Error(`not applied: ${JSON.stringify(bad)}`);
}
const apiSeconds = (performance.now() - started) / 1000;
server.kill('SIGINT');

// The same rows, straight into SQLite with one prepared statement in one transaction.
const raw = new Database(join(dataDir, 'raw.sqlite'));
raw.pragma('journal_mode = WAL');
raw.exec(`CREATE TABLE inspections (id varchar(36) PRIMARY KEY, lotId varchar(36), sampleIndex integer,
  supersedesId varchar(36), measurements text, deviceVerdict text, serverVerdict text, conforming boolean,
  authorId varchar(36), deviceId varchar(36), recordedAt datetime, receivedAt datetime)`);
const insert = raw.prepare(
  'INSERT INTO inspections VALUES (?, ?, ?, NULL, ?, ?, ?, ?, ?, ?, ?, ?)',
);
const rawStarted = performance.now();
raw.transaction(() => {
  for (const batch of batches) {
    for (const { payload, recordedAt } of batch) {
      const p = payload as {
        id: string;
        lotId: string;
        sampleIndex: number;
        measurements: object;
        deviceVerdict: { conforming: boolean };
      };
      insert.run(
        p.id,
        p.lotId,
        p.sampleIndex,
        JSON.stringify(p.measurements),
        JSON.stringify(p.deviceVerdict),
        JSON.stringify(verdicts.get(p.id)),
        p.deviceVerdict.conforming ? 1 : 0,
        authorId,
        deviceId,
        recordedAt,
        new Date().toISOString(),
      );
    }
  }
})();
const rawSeconds = (performance.now() - rawStarted) / 1000;
raw.close();
rmSync(dataDir, { recursive: true, force: true });

const apiRate = RECORDS / apiSeconds;
const rawRate = RECORDS / rawSeconds;
const row = (what: string, seconds: number, rate: number) =>
  `${what.padEnd(40)} ${seconds.toFixed(3).padStart(8)} s ${Math.round(rate).toString().padStart(10)} records/s`;
console.log(
  `sync push: ${RECORDS} inspection records, batches of ${BATCH}, spec ${nominal.geometry.shape}`,
);
console.log(row('HTTP push (validate, re-check, store)', apiSeconds, apiRate));
console.log(row('raw better-sqlite3, one transaction', rawSeconds, rawRate));
console.log(
  `ratio ${(apiRate / rawRate).toFixed(3)} (goal ≥ 0.2); HTTP goal ≥ 2 000 records/s: ${apiRate >= 2000 ? 'met' : 'not met'}`,
);
