import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

/** A start-up problem the person starting the server can fix; shown as one line. */
export class StartupError extends Error {}

/** Makes the data folder and its parts, and proves it can be written before anything else runs. */
export function prepareDataDir(dir: string): void {
  const probe = join(dir, `.write-test-${process.pid}`);
  try {
    for (const part of ['', 'photos', 'mail']) mkdirSync(join(dir, part), { recursive: true });
    writeFileSync(probe, '');
    rmSync(probe);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code ?? String(error);
    throw new StartupError(
      `The data folder ${dir} cannot be written (${code}); set GUMSHOE_DATA_DIR to a writable folder`,
    );
  }
}
