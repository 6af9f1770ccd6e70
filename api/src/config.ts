import { existsSync, readFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export interface Config {
  port: number;
  /** Holds the SQLite file, photos, kept mail and the generated JWT secret. */
  dataDir: string;
  /** The built PWA served at `/`; absent folders are skipped (API only). */
  pwaDir: string;
  /** Unset → the process starts its own fake SMTP server on loopback. */
  smtpUrl: string | undefined;
  /** Unset → a secret generated once and kept in the data folder. */
  jwtSecret: string | undefined;
  corsOrigins: string[];
  seedDemo: boolean;
  version: string;
}

export const CONFIG = Symbol('Config');

/** The api package folder, found from this file whether it runs from src/ or dist/api/src/. */
function apiRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  while (!existsSync(join(dir, 'package.json'))) {
    const parent = dirname(dir);
    if (parent === dir) throw new Error('api/package.json not found above ' + import.meta.url);
    dir = parent;
  }
  return dir;
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const root = apiRoot();
  const port = Number(env.PORT ?? 3000);
  if (!Number.isInteger(port) || port < 0 || port > 65535) {
    throw new Error(`PORT must be a whole number from 0 to 65535, not "${env.PORT}"`);
  }
  const pkg = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')) as { version: string };
  return {
    port,
    dataDir: resolve(env.GUMSHOE_DATA_DIR || join(root, 'data')),
    pwaDir: resolve(env.GUMSHOE_PWA_DIR || join(root, '..', 'pwa', 'dist')),
    smtpUrl: env.SMTP_URL || undefined,
    jwtSecret: env.JWT_SECRET || undefined,
    corsOrigins: (env.GUMSHOE_CORS_ORIGIN ?? '')
      .split(',')
      .map((origin) => origin.trim())
      .filter(Boolean),
    seedDemo: env.GUMSHOE_SEED !== 'off',
    version: pkg.version,
  };
}
