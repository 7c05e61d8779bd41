#!/usr/bin/env node
// The README's test command: type-check (tsc, svelte-check), unit and property tests, build, browser tests.
// Browser tests need Debian's Chromium; when it is missing we install it as root, else we
// stop with the one command that installs it.
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, mkdirSync } from 'node:fs';

const chromium = process.env.PLAYWRIGHT_CHROMIUM || '/usr/bin/chromium';
function run(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { stdio: 'inherit', ...opts });
  return r.status ?? 1;
}

if (!existsSync(chromium)) {
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!isRoot) {
    console.error(`Chromium is missing at ${chromium}. Install it with:\n  sudo apt-get update && sudo apt-get install -y chromium`);
    process.exit(1);
  }
  console.log('Chromium is missing: installing the Debian package chromium …');
  if (run('apt-get', ['update', '-qq']) !== 0 || run('apt-get', ['install', '-y', '-qq', 'chromium'], { env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } }) !== 0) {
    console.error('Could not install chromium; run: apt-get update && apt-get install -y chromium');
    process.exit(1);
  }
}

mkdirSync('test-results', { recursive: true });
const steps = [
  ['type check', 'npx', ['tsc', '--noEmit', '-p', '.']],
  ['Svelte check', 'npx', ['svelte-check', '--tsconfig', './tsconfig.json', '--threshold', 'warning', '--fail-on-warnings']],
  ['unit and property tests', 'npx', ['vitest', 'run', '--reporter=default', '--reporter=json', '--outputFile.json=test-results/unit.json']],
  ['build the app', 'npx', ['vite', 'build', '--logLevel', 'warn']],
  ['browser tests', 'npx', ['vitest', 'run', '-c', 'vitest.e2e.config.ts', '--reporter=default', '--reporter=json', '--outputFile.json=test-results/e2e.json']],
];
let failedStep = '';
for (const [name, cmd, args] of steps) {
  console.log(`\n=== ${name} ===`);
  if (run(cmd, args) !== 0) {
    failedStep = name;
    break;
  }
}
let passed = 0;
let failed = 0;
let skipped = 0;
for (const f of ['test-results/unit.json', 'test-results/e2e.json']) {
  if (!existsSync(f)) continue;
  try {
    const j = JSON.parse(readFileSync(f, 'utf8'));
    passed += j.numPassedTests ?? 0;
    failed += j.numFailedTests ?? 0;
    skipped += (j.numPendingTests ?? 0) + (j.numTodoTests ?? 0);
  } catch {
    /* a report that did not get written counts as nothing */
  }
}
if (failedStep) console.error(`\nstep failed: ${failedStep}`);
console.log(`\nkerfline: ${passed} passed, ${failed} failed, ${skipped} skipped`);
process.exit(failedStep || failed > 0 || passed === 0 ? 1 : 0);
