#!/usr/bin/env node
// The whole suite, as `npm test` runs it: typecheck, lint, format, unit + validation + property
// tests, build, and the Playwright end-to-end tests in Debian's Chromium. Ends with one line
// "N passed, N failed". Each static check (typecheck, lint, format, build) counts as one test.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';

const env = { ...process.env, PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD: '1' };
const chromium = env.CHROMIUM_PATH ?? '/usr/bin/chromium';
let passed = 0;
let failed = 0;
const failures = [];
const t0 = Date.now();

function run(label, cmd, args, extraEnv = {}) {
  const started = Date.now();
  console.log(`\n== ${label} ==`);
  const r = spawnSync(cmd, args, { stdio: 'inherit', env: { ...env, ...extraEnv } });
  const ok = r.status === 0;
  console.log(
    `== ${label}: ${ok ? 'ok' : 'FAILED'} (${((Date.now() - started) / 1000).toFixed(1)} s)`,
  );
  return ok;
}

function check(label, cmd, args) {
  if (run(label, cmd, args)) passed += 1;
  else {
    failed += 1;
    failures.push(label);
  }
}

function ensureChromium() {
  if (existsSync(chromium)) return true;
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  const hasApt = spawnSync('sh', ['-c', 'command -v apt-get'], { stdio: 'ignore' }).status === 0;
  if (isRoot && hasApt) {
    console.log(
      `Chromium not found at ${chromium}; installing Debian's chromium package (apt-get).`,
    );
    const ok =
      run('apt-get update', 'apt-get', ['update', '-qq']) &&
      run('apt-get install chromium', 'apt-get', ['install', '-y', '-qq', 'chromium'], {
        DEBIAN_FRONTEND: 'noninteractive',
      });
    if (ok && existsSync(chromium)) return true;
  }
  console.error(
    `No Chromium at ${chromium}: install Debian's chromium (apt-get install chromium) or set CHROMIUM_PATH=/path/to/chromium.`,
  );
  return false;
}

mkdirSync('reports', { recursive: true });
const npx = 'npx';
check('typecheck', npx, ['tsc', '--noEmit', '-p', 'tsconfig.json']);
check('lint', npx, ['eslint', '.']);
check('format', npx, ['prettier', '--check', '.']);

run('unit, validation and property tests', npx, [
  'vitest',
  'run',
  '--reporter=default',
  '--reporter=json',
  '--outputFile.json=reports/unit.json',
]);
try {
  const u = JSON.parse(readFileSync('reports/unit.json', 'utf8'));
  passed += u.numPassedTests;
  failed += u.numFailedTests;
  // A file that fails to load has no tests but must still count as a failure.
  const broken = (u.testResults ?? []).filter(
    (f) => f.status === 'failed' && f.assertionResults.length === 0,
  );
  failed += broken.length;
  if (u.numFailedTests || broken.length) failures.push('unit tests');
} catch {
  failed += 1;
  failures.push('unit tests (no report)');
}

const built = run('build', npx, ['vite', 'build']);
if (built) passed += 1;
else {
  failed += 1;
  failures.push('build');
}

if (built && ensureChromium()) {
  run(
    'end-to-end (Playwright, Debian Chromium)',
    npx,
    ['playwright', 'test', '--reporter=list,json'],
    {
      PLAYWRIGHT_JSON_OUTPUT_FILE: 'reports/e2e.json',
      CHROMIUM_PATH: chromium,
      E2E_SKIP_BUILD: '1',
    },
  );
  try {
    const e = JSON.parse(readFileSync('reports/e2e.json', 'utf8')).stats;
    passed += e.expected + e.flaky;
    failed += e.unexpected;
    if (e.unexpected) failures.push('end-to-end tests');
    if (e.expected + e.unexpected + e.flaky === 0) {
      failed += 1;
      failures.push('end-to-end tests (none ran)');
    }
  } catch {
    failed += 1;
    failures.push('end-to-end tests (no report)');
  }
} else {
  failed += 1;
  failures.push(built ? 'end-to-end tests (no Chromium)' : 'end-to-end tests (no build)');
}

console.log(
  `\nSuite took ${((Date.now() - t0) / 1000).toFixed(0)} s.${failures.length ? ' Failed: ' + failures.join(', ') : ''}`,
);
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed > 0 || passed === 0 ? 1 : 0);
