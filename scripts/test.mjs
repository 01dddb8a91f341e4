#!/usr/bin/env node
// npm test: dependencies → PostgreSQL (databases quadrant_test and quadrant_e2e; the demo database
// `quadrant` is never touched) → Chromium → eslint → tsc (app and geometry) → vite build → vitest (unit,
// api, e2e). Every step runs even after an earlier failure so one CI log shows everything; the exit code is
// non-zero when anything failed. The last line is always `tests: <passed> passed, <failed> failed`.
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { bootstrapDeps } from './bootstrap-deps.mjs';
import { ROOT, UserError, aptInstall, info, isRoot, main, runAsync, step } from './lib/run.mjs';
import { ensureCluster, redact, withDatabase } from './lib/pg-cluster.mjs';

const BIN = (pkg, file) => path.join(ROOT, 'node_modules', pkg, file);
const ARTIFACTS = path.join(ROOT, 'test-artifacts');
const RESULTS = path.join(ARTIFACTS, 'vitest-results.json');
const CHROMIUM = '/usr/bin/chromium';
const NO_STDIN = ['ignore', 'inherit', 'inherit'];

/** Results of each step, printed at the end. */
const outcomes = [];

async function runStep(name, fn) {
  step(name);
  const started = Date.now();
  let ok = false;
  try {
    ok = await fn();
  } catch (err) {
    process.stderr.write(`    ${err instanceof UserError ? err.message : (err?.stack ?? err)}\n`);
    ok = false;
  }
  const seconds = ((Date.now() - started) / 1000).toFixed(1);
  outcomes.push({ name, ok, seconds });
  if (!ok) info(`FAILED: ${name}`);
  return ok;
}

/** Test database URLs: given ones win; else DATABASE_URL's server or the project-local cluster. */
async function prepareDatabases() {
  let test = process.env.QUADRANT_TEST_DATABASE_URL;
  let e2e = process.env.QUADRANT_E2E_DATABASE_URL;
  if (!test || !e2e) {
    let base = process.env.DATABASE_URL;
    if (base) info(`using the server of DATABASE_URL (${redact(base)})`);
    else base = ensureCluster().url('postgres');
    test ??= withDatabase(base, 'quadrant_test');
    e2e ??= withDatabase(base, 'quadrant_e2e');
  }
  for (const url of [test, e2e]) {
    if (new URL(url).pathname === '/quadrant') throw new UserError('tests must not use the demo database `quadrant`.');
  }
  const { ensureDatabase } = await import('./lib/database.mjs');
  for (const url of [test, e2e]) {
    info(`${(await ensureDatabase(url)) ? 'created' : 'found'} ${redact(url)}`);
  }
  return { test, e2e };
}

/** Debian's chromium for the browser tests; installed with apt when missing and root. */
function ensureChromium() {
  if (existsSync(CHROMIUM)) {
    info(`${CHROMIUM} is present`);
    return true;
  }
  if (!isRoot()) {
    info(`${CHROMIUM} is missing; install it with \`sudo apt-get install -y chromium\` (browser tests will fail).`);
    return false;
  }
  info('installing chromium with apt-get (about a minute)');
  return aptInstall(['chromium']) === 0 && existsSync(CHROMIUM);
}

function readResults() {
  try {
    return JSON.parse(readFileSync(RESULTS, 'utf8'));
  } catch {
    return null;
  }
}

async function test() {
  const ci = process.env.CI === 'true' || process.env.CI === '1';
  info(`project ${ROOT}${ci ? ' (CI)' : ''}`);
  try {
    bootstrapDeps();
  } catch (err) {
    process.stderr.write(`    ${err instanceof UserError ? err.message : (err?.stack ?? err)}\n`);
    process.stdout.write('\ntests: 0 passed, 0 failed\n');
    return 1;
  }

  let urls = null;
  await runStep('test databases', async () => {
    urls = await prepareDatabases();
    return true;
  });
  await runStep('chromium', async () => ensureChromium());
  const node = process.execPath;
  await runStep('eslint (module boundaries, import cycles)', async () =>
    (await runAsync(node, [BIN('eslint', 'bin/eslint.js'), '.'], { stdio: NO_STDIN })) === 0);
  await runStep('typecheck: tsc -p tsconfig.json', async () =>
    (await runAsync(node, [BIN('typescript', 'bin/tsc'), '--noEmit', '-p', 'tsconfig.json'], { stdio: NO_STDIN })) === 0);
  await runStep('typecheck: tsc -p geometry/tsconfig.json', async () =>
    (await runAsync(node, [BIN('typescript', 'bin/tsc'), '--noEmit', '-p', 'geometry/tsconfig.json'], { stdio: NO_STDIN })) === 0);
  await runStep('client build: vite build', async () =>
    (await runAsync(node, [BIN('vite', 'bin/vite.js'), 'build', '--logLevel', 'warn'], { stdio: NO_STDIN })) === 0);

  let vitestOk = false;
  await runStep('vitest run (unit, api, e2e)', async () => {
    if (!urls) throw new UserError('no test databases; skipping vitest');
    mkdirSync(ARTIFACTS, { recursive: true });
    rmSync(RESULTS, { force: true });
    const env = {
      ...process.env,
      QUADRANT_TEST_DATABASE_URL: urls.test,
      QUADRANT_E2E_DATABASE_URL: urls.e2e,
    };
    // Plain logs in CI (tinyrainbow colours whenever FORCE_COLOR is present, whatever its value).
    if (ci && env.FORCE_COLOR === undefined) env.NO_COLOR = '1';
    const code = await runAsync(
      node,
      [BIN('vitest', 'vitest.mjs'), 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${RESULTS}`],
      { stdio: NO_STDIN, env },
    );
    vitestOk = code === 0;
    return vitestOk;
  });

  const results = readResults();
  const passed = results?.numPassedTests ?? 0;
  const failed = results?.numFailedTests ?? 0;
  const brokenFiles = (results?.testResults ?? []).filter((f) => f.status === 'failed' && (f.assertionResults?.length ?? 0) === 0);

  step('summary');
  for (const o of outcomes) info(`${o.ok ? 'ok    ' : 'FAILED'} ${o.name} (${o.seconds} s)`);
  for (const f of brokenFiles) info(`FAILED to run: ${path.relative(ROOT, f.name)}${f.message ? ` — ${f.message.split('\n')[0]}` : ''}`);
  if (!results) info(`no vitest results at ${path.relative(ROOT, RESULTS)}`);
  const allOk = outcomes.every((o) => o.ok) && results !== null;
  process.stdout.write(`\ntests: ${passed} passed, ${failed} failed\n`);
  return allOk && vitestOk && failed === 0 ? 0 : 1;
}

main(test);
