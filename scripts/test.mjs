// `npm test`: every suite in order, then one closing line "N passed, N failed".
// A suite that fails does not stop the later ones, so one run shows everything.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const reports = mkdtempSync(join(tmpdir(), 'gumshoe-test-'));

function run(command, args, cwd = root) {
  console.log(`\n▶ ${command} ${args.join(' ')}`);
  const result = spawnSync(command, args, {
    cwd,
    stdio: 'inherit',
  });
  return result.status === 0;
}

/** Counts from a vitest or jest JSON report; a missing report counts as one failure. */
function countsFrom(report, ok) {
  try {
    const json = JSON.parse(readFileSync(report, 'utf8'));
    const failed = json.numFailedTests + (ok || json.numFailedTests > 0 ? 0 : 1);
    return { passed: json.numPassedTests, failed };
  } catch {
    return { passed: 0, failed: 1 };
  }
}

const check = (ok) => ({ passed: ok ? 1 : 0, failed: ok ? 0 : 1 });
const npx = join(root, 'node_modules/.bin');

const suites = [
  ['type-check', () => check(run(join(npx, 'tsc'), ['-b']))],
  [
    'lint',
    () => check(run(join(npx, 'eslint'), ['.']) && run(join(npx, 'prettier'), ['--check', '.'])),
  ],
  [
    'vitest (pwa)',
    () => {
      const out = join(reports, 'vitest.json');
      const args = ['--reporter=default', '--reporter=json', `--outputFile.json=${out}`];
      return countsFrom(out, run('npm', ['test', '-w', 'pwa', '--', ...args]));
    },
  ],
  [
    'jest (api)',
    () => {
      const out = join(reports, 'jest.json');
      return countsFrom(
        out,
        run('npm', ['test', '-w', 'api', '--', '--json', `--outputFile=${out}`]),
      );
    },
  ],
  [
    'browser (chromium)',
    () => {
      if (!run('npm', ['run', 'build'])) return { passed: 0, failed: 1 };
      const out = join(reports, 'browser.json');
      const ok = run(
        join(npx, 'vitest'),
        [
          'run',
          '--config',
          'vitest.e2e.config.ts',
          '--reporter=default',
          '--reporter=json',
          `--outputFile.json=${out}`,
        ],
        join(root, 'pwa'),
      );
      return countsFrom(out, ok);
    },
  ],
];

let passed = 0;
let failed = 0;
const summary = [];
for (const [name, suite] of suites) {
  const counts = suite();
  passed += counts.passed;
  failed += counts.failed;
  summary.push(`  ${name}: ${counts.passed} passed, ${counts.failed} failed`);
}
rmSync(reports, { recursive: true, force: true });
console.log(`\n${summary.join('\n')}`);
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed === 0 ? 0 : 1);
