#!/usr/bin/env node
// npm start: dependencies → PostgreSQL → database `quadrant` → migrations → demo seed → client build (when
// stale) → serve on http://127.0.0.1:3000 (PORT overrides). Plain Node ESM; runs before node_modules exists.
import { spawn } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { bootstrapDeps } from './bootstrap-deps.mjs';
import { ROOT, UserError, info, main, runAsync, step } from './lib/run.mjs';
import { ensureCluster, redact } from './lib/pg-cluster.mjs';

const TSX = ['--import', 'tsx'];

/** Newest modification time (ms) of any file under the given paths. O(files). */
function newestMtime(paths) {
  let newest = 0;
  const visit = (p) => {
    if (!existsSync(p)) return;
    const st = statSync(p);
    if (st.isDirectory()) {
      for (const name of readdirSync(p)) if (name !== 'node_modules') visit(path.join(p, name));
    } else newest = Math.max(newest, st.mtimeMs);
  };
  for (const p of paths) visit(p);
  return newest;
}

/** True when dist/ is missing or older than any client source. */
export function clientBuildIsStale() {
  const index = path.join(ROOT, 'dist', 'index.html');
  if (!existsSync(index)) return true;
  const built = statSync(index).mtimeMs;
  const sources = ['src', 'geometry', 'server/contract', 'index.html', 'vite.config.ts', 'public', 'package-lock.json'];
  return newestMtime(sources.map((s) => path.join(ROOT, s))) > built;
}

async function start() {
  bootstrapDeps();

  step('database server');
  let databaseUrl = process.env.DATABASE_URL;
  if (databaseUrl) info(`using DATABASE_URL (${redact(databaseUrl)})`);
  else databaseUrl = ensureCluster().url('quadrant');

  step('database quadrant');
  const { ensureDatabase } = await import('./lib/database.mjs');
  info((await ensureDatabase(databaseUrl)) ? 'created database quadrant' : 'database exists');

  step('migrations and demo data');
  const env = { ...process.env, DATABASE_URL: databaseUrl };
  if ((await runAsync(process.execPath, [...TSX, 'server/db/setup.ts'], { env })) !== 0) {
    throw new UserError('migrating or seeding the database failed (see above).');
  }

  step('client build');
  if (clientBuildIsStale()) {
    if ((await runAsync(process.execPath, [path.join(ROOT, 'node_modules/vite/bin/vite.js'), 'build'])) !== 0) {
      throw new UserError('vite build failed (see above).');
    }
  } else info('dist/ is up to date');

  const port = process.env.PORT || '3000';
  step(`serve on http://127.0.0.1:${port}`);
  const child = spawn(process.execPath, [...TSX, 'server/index.ts'], {
    cwd: ROOT,
    stdio: 'inherit',
    env: { NODE_ENV: 'development', ...env, PORT: port },
  });
  const forward = (signal) => () => {
    if (child.exitCode === null) child.kill(signal);
  };
  for (const s of ['SIGINT', 'SIGTERM', 'SIGHUP']) process.on(s, forward(s));
  return new Promise((resolve) => child.on('exit', (code, signal) => resolve(code ?? (signal ? 0 : 1))));
}

main(start);
