// `npm run dev`: the Vite dev server with hot reload, and the API rebuilt and restarted on
// every change, behind Vite's /api proxy.
import { spawn, spawnSync } from 'node:child_process';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const bin = (name) => join(root, 'node_modules/.bin', name);
const apiPort = process.env.GUMSHOE_API_PORT ?? '3001';

const first = spawnSync(bin('tsc'), ['-p', 'api/tsconfig.build.json'], {
  cwd: root,
  stdio: 'inherit',
});
if (first.status !== 0) process.exit(1);

const children = [
  spawn(bin('tsc'), ['-p', 'api/tsconfig.build.json', '--watch', '--preserveWatchOutput'], {
    cwd: root,
    stdio: 'inherit',
  }),
  spawn(process.execPath, ['--watch', 'dist/api/src/main.js'], {
    cwd: join(root, 'api'),
    stdio: 'inherit',
    env: { ...process.env, PORT: apiPort },
  }),
  spawn(bin('vite'), [], {
    cwd: join(root, 'pwa'),
    stdio: 'inherit',
    env: { ...process.env, GUMSHOE_API_URL: `http://localhost:${apiPort}` },
  }),
];

const stopAll = () => children.forEach((child) => child.kill('SIGTERM'));
process.on('SIGINT', stopAll);
process.on('SIGTERM', stopAll);
for (const child of children) child.on('exit', stopAll);
