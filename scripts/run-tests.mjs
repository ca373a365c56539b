// `npm test`: builds the client (the browser tests use the real build), runs every vitest
// suite (unit, API on a throwaway PostgreSQL, e2e in Chromium) and ends with one line
// "N passed, N failed" for CI.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';

const args = process.argv.slice(2);
const run = (cmd, argv) => spawnSync(cmd, argv, { stdio: 'inherit', env: process.env }).status ?? 1;

if (!args.includes('--no-build')) {
  const built = run('npx', ['vite', 'build', '--logLevel', 'warn']);
  if (built !== 0) {
    console.log('0 passed, 1 failed');
    process.exit(1);
  }
}
mkdirSync('test-results', { recursive: true });
const report = 'test-results/vitest.json';
const filters = args.filter((a) => a !== '--no-build');
const code = run('npx', ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile=${report}`, ...filters]);
let passed = 0;
let failed = code === 0 ? 0 : 1;
if (existsSync(report)) {
  const r = JSON.parse(readFileSync(report, 'utf8'));
  passed = r.numPassedTests ?? 0;
  failed = (r.numFailedTests ?? 0) + (code !== 0 && (r.numFailedTests ?? 0) === 0 ? 1 : 0);
}
console.log(`${passed} passed, ${failed} failed`);
process.exit(code);
