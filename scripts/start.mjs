// `npm start`: build what is out of date, then run the plant server, which applies
// migrations, seeds the demo on first start, starts the local fake mail server and
// serves the API under /api and the built PWA at /.
import { spawn, spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { dirname, join } from 'node:path';
import { createServer } from 'node:net';
import { isStale } from './freshness.mjs';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const at = (...parts) => join(root, ...parts);

// Say so at once when the port is taken, before spending time on a build.
const port = Number(process.env.PORT ?? 3000);
const portFree = await new Promise((resolve) => {
  const probe = createServer();
  probe.once('error', () => resolve(false));
  probe.listen(port, () => probe.close(() => resolve(true)));
});
if (!portFree) {
  console.error(`gumshoe: port ${port} is already in use; stop the other server or set PORT.`);
  process.exit(1);
}

const builds = [
  {
    workspace: 'pwa',
    quiet: ['--', '--logLevel', 'error'],
    output: at('pwa/dist/index.html'),
    sources: [at('pwa/src'), at('pwa/public'), at('pwa/index.html'), at('pwa/vite.config.ts')],
  },
  {
    workspace: 'api',
    quiet: [],
    output: at('api/dist/api/src/main.js'),
    sources: [at('api/src'), at('pwa/src/engine'), at('api/tsconfig.build.json')],
  },
];

for (const build of builds) {
  if (!isStale(build.output, build.sources)) continue;
  console.log(`gumshoe: building ${build.workspace} …`);
  const result = spawnSync('npm', ['run', 'build', '-w', build.workspace, ...build.quiet], {
    cwd: root,
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  if (result.status !== 0) {
    console.error(`gumshoe: the ${build.workspace} build failed (see above).`);
    process.exit(1);
  }
}

const server = spawn(process.execPath, [at('api/dist/api/src/main.js')], {
  cwd: at('api'),
  stdio: 'inherit',
  env: { ...process.env, GUMSHOE_PWA_DIR: process.env.GUMSHOE_PWA_DIR ?? at('pwa/dist') },
});
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, () => server.kill(signal));
}
server.on('exit', (code, signal) => process.exit(code ?? (signal ? 0 : 1)));
