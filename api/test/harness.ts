import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { loadConfig, type Config } from '../src/config.js';
import { createApp } from '../src/create-app.js';
import { DEMO_PASSWORD } from '../src/database/seed.js';

export interface Harness {
  app: NestExpressApplication;
  config: Config;
  http: () => ReturnType<typeof request>;
  close: () => Promise<void>;
}

/** A whole server on a fresh SQLite file in its own temporary data folder. */
export async function startApp(env: Record<string, string> = {}): Promise<Harness> {
  const dataDir = mkdtempSync(join(tmpdir(), 'gumshoe-test-'));
  const config = loadConfig({
    GUMSHOE_DATA_DIR: dataDir,
    JWT_SECRET: 'test-secret-'.padEnd(48, 'x'),
    ...env,
  });
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
