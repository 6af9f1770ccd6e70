import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

/** Newest modification time of any file below the given paths (folders are walked). */
export function newestMtime(paths) {
  let newest = 0;
  const visit = (path) => {
    if (!existsSync(path)) return;
    const stat = statSync(path);
    if (stat.isDirectory()) {
      for (const entry of readdirSync(path)) {
        if (entry !== 'node_modules' && entry !== 'dist') visit(join(path, entry));
      }
    } else {
      newest = Math.max(newest, stat.mtimeMs);
    }
  };
  paths.forEach(visit);
  return newest;
}

/** True when the output is missing or older than any of its sources. */
export function isStale(output, sources) {
  return !existsSync(output) || statSync(output).mtimeMs < newestMtime(sources);
}
