import { randomBytes } from 'node:crypto';
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

export const JWT_SECRET = Symbol('JwtSecret');

/**
 * JWT_SECRET from the environment, else one generated on the first start and kept in the data
 * folder (owner-only), so tokens survive a restart and no secret ever lives in the code.
 */
export function jwtSecret(fromEnv: string | undefined, dataDir: string): string {
  if (fromEnv) return fromEnv;
  const file = join(dataDir, 'jwt-secret');
  try {
    return readFileSync(file, 'utf8').trim();
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'ENOENT') throw error;
  }
  const made = randomBytes(48).toString('base64url');
  writeFileSync(file, made + '\n', { mode: 0o600, flag: 'wx' });
  return made;
}
