#!/usr/bin/env node
// Install dependencies with `npm ci` when node_modules is missing or package-lock.json changed since the
// last install. Plain Node ESM: runs before node_modules exists.
//
// "Changed" is decided by a hash of package-lock.json kept in node_modules/.quadrant-install.json. When the
// hash differs, the installed tree (npm's hidden lockfile node_modules/.package-lock.json) is compared with
// the lockfile first; a tree that already matches is adopted without reinstalling.
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { ROOT, UserError, info, main, runSync, step } from './lib/run.mjs';

const LOCK = path.join(ROOT, 'package-lock.json');
const NODE_MODULES = path.join(ROOT, 'node_modules');
const MARKER = path.join(NODE_MODULES, '.quadrant-install.json');
const HIDDEN_LOCK = path.join(NODE_MODULES, '.package-lock.json');

function lockHash() {
  return createHash('sha256').update(readFileSync(LOCK)).digest('hex');
}

/** True when every package npm reports installed matches the lockfile, and nothing required is missing. */
function treeMatchesLock() {
  if (!existsSync(HIDDEN_LOCK)) return false;
  const want = JSON.parse(readFileSync(LOCK, 'utf8')).packages ?? {};
  const have = JSON.parse(readFileSync(HIDDEN_LOCK, 'utf8')).packages ?? {};
  for (const [key, meta] of Object.entries(want)) {
    if (key === '') continue;
    const got = have[key];
    if (!got) {
      if (meta.optional || meta.devOptional) continue;
      return false;
    }
    if (got.version !== meta.version) return false;
  }
  for (const key of Object.keys(have)) if (!(key in want)) return false;
  return true;
}

/** Make sure node_modules matches package-lock.json; returns true when npm ci ran. */
export function bootstrapDeps() {
  step('dependencies');
  if (!existsSync(LOCK)) throw new UserError('package-lock.json is missing; it must be committed.');
  const hash = lockHash();
  if (existsSync(NODE_MODULES)) {
    let marker = null;
    try {
      marker = JSON.parse(readFileSync(MARKER, 'utf8'));
    } catch {
      marker = null;
    }
    if (marker?.lockHash === hash) {
      info('node_modules is up to date with package-lock.json');
      return false;
    }
    if (treeMatchesLock()) {
      writeFileSync(MARKER, JSON.stringify({ lockHash: hash, adoptedAt: new Date().toISOString() }) + '\n');
      info('node_modules already matches package-lock.json');
      return false;
    }
    info('package-lock.json changed since the last install; running npm ci');
  } else {
    info('node_modules is missing; running npm ci');
  }
  const code = runSync('npm', ['ci', '--no-audit', '--no-fund'], { stdio: ['ignore', 'inherit', 'inherit'] });
  if (code !== 0) throw new UserError(`npm ci failed with exit code ${code}`);
  writeFileSync(MARKER, JSON.stringify({ lockHash: hash, installedAt: new Date().toISOString() }) + '\n');
  return true;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  main(async () => {
    bootstrapDeps();
    return 0;
  });
}
