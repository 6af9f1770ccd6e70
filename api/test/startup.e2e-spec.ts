import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { createServer, type AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// The real `npm start` path: the compiled server, started as its own process.
const API = join(import.meta.dirname, '..');
const MAIN = join(API, 'dist', 'api', 'src', 'main.js');

let dataDir: string;
beforeAll(() => {
  const built = spawnSync('npx', ['tsc', '-p', 'tsconfig.build.json'], {
    cwd: API,
    encoding: 'utf8',
  });
  if (built.status !== 0) throw new Error(`build failed:\n${built.stdout}${built.stderr}`);
  dataDir = mkdtempSync(join(tmpdir(), 'gumshoe-start-'));
}, 120_000);
afterAll(() => rmSync(dataDir, { recursive: true, force: true }));

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as AddressInfo;
      probe.close(() => resolve(port));
    });
  });
}

interface Run {
  child: ChildProcess;
  stdout: string;
  stderr: string;
  exit: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
}

function start(env: Record<string, string>): Run {
  const child = spawn(process.execPath, [MAIN], {
    env: { PATH: process.env.PATH, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const run: Run = {
    child,
    stdout: '',
    stderr: '',
    exit: new Promise((resolve) => child.on('exit', (code, signal) => resolve({ code, signal }))),
  };
  child.stdout?.on('data', (part: Buffer) => (run.stdout += part.toString()));
  child.stderr?.on('data', (part: Buffer) => (run.stderr += part.toString()));
  return run;
}

async function until(check: () => boolean, ms = 20_000): Promise<void> {
  for (const end = Date.now() + ms; Date.now() < end;) {
    if (check()) return;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error('timed out');
}

test('starts, migrates and seeds, warns about the demo accounts, answers, and stops on Ctrl-C', async () => {
  const port = await freePort();
  const run = start({ PORT: String(port), GUMSHOE_DATA_DIR: dataDir });
  await until(() => run.stdout.includes(`http://localhost:${port}`));
  expect(run.stderr).toMatch(/^Warning: 4 demo account\(s\).*demo-password-1.*\n$/);
  const health = await fetch(`http://127.0.0.1:${port}/api/health`);
  expect(await health.json()).toMatchObject({ status: 'ok', database: 'ok' });

  // A second start on the same port says so in one line and exits 1.
  const second = start({ PORT: String(port), GUMSHOE_DATA_DIR: dataDir });
  expect((await second.exit).code).toBe(1);
  expect(second.stderr).toMatch(/^gumshoe: Port \d+ is already in use[^\n]*\n$/);

  run.child.kill('SIGINT');
  const stopped = await run.exit;
  expect(stopped.code === 0 || stopped.signal === 'SIGINT').toBe(true);
  expect(run.stderr).not.toMatch(/Error|at /);
}, 60_000);

test('a data folder that cannot be written gives one line and exit code 1', async () => {
  const blocker = join(dataDir, 'a-file');
  writeFileSync(blocker, '');
  const run = start({ PORT: String(await freePort()), GUMSHOE_DATA_DIR: join(blocker, 'data') });
  expect((await run.exit).code).toBe(1);
  expect(run.stderr).toMatch(/^gumshoe: The data folder .* cannot be written \(\w+\)[^\n]*\n$/);
  expect(run.stdout).toBe('');
}, 30_000);
