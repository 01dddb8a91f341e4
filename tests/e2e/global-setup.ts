/**
 * Global setup of the e2e project: a migrated, freshly seeded database, the client built into dist/, and
 * the real server (`node --import tsx server/index.ts`) as a child process on a free port. Tests get the
 * base URL with `inject('baseUrl')` (or `process.env.QUADRANT_E2E_BASE_URL`); see tests/e2e/browser.ts.
 *
 * Needs QUADRANT_E2E_DATABASE_URL (scripts/test.mjs sets it). The database is wiped and re-seeded.
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { createWriteStream, existsSync, mkdirSync } from 'node:fs';
import { createServer } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    /** e.g. http://127.0.0.1:41234 — the server under test, serving the built client. */
    baseUrl: string;
  }
}

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
export const ARTIFACTS_DIR = path.join(ROOT, 'test-artifacts');

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => resolve(port));
    });
  });
}

function buildClientIfMissing(): void {
  if (existsSync(path.join(ROOT, 'dist', 'index.html'))) return;
  const r = spawnSync(process.execPath, [path.join(ROOT, 'node_modules', 'vite', 'bin', 'vite.js'), 'build'], { cwd: ROOT, stdio: 'inherit' });
  if (r.status !== 0) throw new Error('e2e setup: `vite build` failed; see the output above.');
}

/** Scrypt cost for demo passwords in tests (the default, 15, costs ~100 ms per sign-in). */
const TEST_PASSWORD_LOG_N = 12;

/** Drops every application schema (tables, migrations journal, job queues), leaving an empty `public`. */
async function resetDatabase(url: string): Promise<void> {
  const pg = (await import('pg')).default;
  const client = new pg.Client({ connectionString: url, application_name: 'quadrant-e2e-reset' });
  await client.connect();
  try {
    await client.query('SET client_min_messages TO WARNING');
    const { rows } = await client.query<{ name: string }>(
      `SELECT schema_name AS name FROM information_schema.schemata
        WHERE schema_name NOT LIKE 'pg\\_%' AND schema_name <> 'information_schema'`,
    );
    for (const { name } of rows) await client.query(`DROP SCHEMA "${name.replace(/"/g, '""')}" CASCADE`);
    await client.query('CREATE SCHEMA IF NOT EXISTS public');
  } finally {
    await client.end();
  }
}

/** Empty database → migrations → the demo seed (server/seed's seedAll). */
async function prepareDatabase(url: string): Promise<void> {
  await resetDatabase(url);
  const { migrateDatabase } = await import('../../server/db/migrate.js');
  await migrateDatabase(url);
  const { createDb, createPool } = await import('../../server/db/client.js');
  const { seedAll } = await import('../../server/seed/index.js');
  const pool = createPool(url, 2);
  try {
    await seedAll(createDb(pool), { passwordLogN: TEST_PASSWORD_LOG_N });
  } finally {
    await pool.end();
  }
}

async function waitForHealth(baseUrl: string, child: ChildProcess, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  let last = '';
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`e2e setup: the server exited with code ${child.exitCode}; see test-artifacts/e2e-server.log`);
    try {
      const res = await fetch(`${baseUrl}/api/health`);
      if (res.ok) return;
      last = `HTTP ${res.status}`;
    } catch (err) {
      last = err instanceof Error ? err.message : String(err);
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`e2e setup: ${baseUrl}/api/health did not answer 200 within ${timeoutMs / 1000}s (last: ${last})`);
}

function stop(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const force = setTimeout(() => child.kill('SIGKILL'), 8000);
    child.once('exit', () => {
      clearTimeout(force);
      resolve();
    });
    child.kill('SIGTERM');
  });
}

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const databaseUrl = process.env.QUADRANT_E2E_DATABASE_URL;
  if (!databaseUrl) {
    throw new Error('e2e setup: QUADRANT_E2E_DATABASE_URL is not set (npm test sets it; or `npm run db:start` and export it).');
  }
  mkdirSync(ARTIFACTS_DIR, { recursive: true });
  buildClientIfMissing();

  await prepareDatabase(databaseUrl);

  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const log = createWriteStream(path.join(ARTIFACTS_DIR, 'e2e-server.log'));
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: ROOT,
    env: {
      ...process.env,
      NODE_ENV: 'test',
      PORT: String(port),
      HOST: '127.0.0.1',
      DATABASE_URL: databaseUrl,
      PUBLIC_ORIGIN: baseUrl,
      // Browser tests sign in often from one address; keep the limiter on but out of their way.
      LOGIN_RATE_LIMIT: process.env.LOGIN_RATE_LIMIT ?? '500',
      PASSWORD_SCRYPT_LOG_N: String(TEST_PASSWORD_LOG_N),
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.pipe(log);
  child.stderr?.pipe(log);

  try {
    await waitForHealth(baseUrl, child);
  } catch (err) {
    await stop(child);
    throw err;
  }
  project.provide('baseUrl', baseUrl);
  process.env.QUADRANT_E2E_BASE_URL = baseUrl;

  return async () => {
    await stop(child);
    log.end();
  };
}
