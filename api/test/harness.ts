import { createHash } from 'node:crypto';
import {
  copyFileSync,
  existsSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  renameSync,
  rmSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { loadConfig, type Config } from '../src/config.js';
import { createApp } from '../src/create-app.js';
import { databaseFile } from '../src/database/data-source.js';
import { DEMO_PASSWORD } from '../src/database/seed.js';

export interface Harness {
  app: NestExpressApplication;
  config: Config;
  http: () => ReturnType<typeof request>;
  close: () => Promise<void>;
}

const SECRET = 'test-secret-'.padEnd(48, 'x');
const ROOT = join(import.meta.dirname, '..', '..');

function sources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return sources(path);
    return entry.name.endsWith('.ts') && !entry.name.endsWith('.test.ts') ? [path] : [];
  });
}

/**
 * The demo seed takes seconds (it fits compounds and judges a week of lots), so it is made once
 * per version of the code and each test copies the file. The name carries a hash of the server
 * and engine sources: changed code gets a fresh seed, never a stale one.
 */
async function seededTemplate(): Promise<string> {
  const hash = createHash('sha256');
  for (const file of [
    ...sources(join(ROOT, 'api', 'src')),
    ...sources(join(ROOT, 'pwa', 'src', 'engine')),
  ].sort()) {
    hash.update(relative(ROOT, file)).update(readFileSync(file));
  }
  const template = join(tmpdir(), `gumshoe-seeded-${hash.digest('hex').slice(0, 16)}.sqlite`);
  if (existsSync(template)) return template;
  for (const old of readdirSync(tmpdir()).filter((name) => name.startsWith('gumshoe-seeded-'))) {
    rmSync(join(tmpdir(), old), { force: true });
  }
  const dataDir = mkdtempSync(join(tmpdir(), 'gumshoe-seeding-'));
  const app = await createApp(loadConfig({ GUMSHOE_DATA_DIR: dataDir, JWT_SECRET: SECRET }));
  await app.close(); // closing checkpoints the WAL into the file
  renameSync(databaseFile(dataDir), template);
  rmSync(dataDir, { recursive: true, force: true });
  return template;
}

/** A whole server with the demo data, on its own SQLite file in its own temporary data folder. */
export async function startApp(env: Record<string, string> = {}): Promise<Harness> {
  const template = await seededTemplate();
  const dataDir = mkdtempSync(join(tmpdir(), 'gumshoe-test-'));
  copyFileSync(template, databaseFile(dataDir));
  const config = loadConfig({ GUMSHOE_DATA_DIR: dataDir, JWT_SECRET: SECRET, ...env });
  const app = await createApp(config);
  return {
    app,
    config,
    http: () => request(app.getHttpServer()),
    close: async () => {
      await app.close();
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

/** Rows in a table, read straight from the server's database. */
export async function rows(h: Harness, table: string): Promise<number> {
  const [row] = (await h.app.get(DataSource).query(`SELECT COUNT(*) AS n FROM ${table}`)) as {
    n: number;
  }[];
  return row!.n;
}

export async function signIn(
  h: Harness,
  email: string,
  extra: Record<string, unknown> = {},
): Promise<{ accessToken: string; refreshToken: string; user: { id: string; role: string } }> {
  const res = await h
    .http()
    .post('/api/auth/login')
    .send({ email, password: DEMO_PASSWORD, ...extra });
  if (res.status !== 200)
    throw new Error(`sign-in of ${email} gave ${res.status} ${JSON.stringify(res.body)}`);
  return res.body;
}

/** Requests made with one signed-in person's token. */
export function requestsOf(h: Harness, token: string) {
  return {
    get: (path: string) => h.http().get(path).auth(token, { type: 'bearer' }),
    post: (path: string, body?: object) =>
      h.http().post(path).auth(token, { type: 'bearer' }).send(body),
    put: (path: string, body: object) =>
      h.http().put(path).auth(token, { type: 'bearer' }).send(body),
    patch: (path: string, body: object) =>
      h.http().patch(path).auth(token, { type: 'bearer' }).send(body),
  };
}
