// Small process helpers shared by the orchestration scripts. Plain Node ESM, no dependencies, so they run
// before node_modules exists.
import { spawn, spawnSync } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

/** Absolute path of the project root (two levels above this file). */
export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

/** Print a step heading so CI logs are easy to scan. */
export function step(name) {
  process.stdout.write(`\n==> ${name}\n`);
}

/** Print a line prefixed with the script name. */
export function info(message) {
  process.stdout.write(`    ${message}\n`);
}

/** Error that carries a user-facing message; scripts print it without a stack. */
export class UserError extends Error {}

/**
 * Run a command synchronously with inherited stdio; returns the exit code (never throws on non-zero).
 * @param {string} cmd @param {string[]} args @param {import('node:child_process').SpawnSyncOptions} [opts]
 */
export function runSync(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { stdio: 'inherit', cwd: ROOT, ...opts });
  if (r.error) throw r.error;
  return r.status ?? (r.signal ? 1 : 0);
}

/** Run a command and capture stdout/stderr as strings. */
export function capture(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { encoding: 'utf8', cwd: ROOT, ...opts });
  return { status: r.error ? -1 : (r.status ?? 1), stdout: r.stdout ?? '', stderr: r.stderr ?? '', error: r.error };
}

/** Run a command asynchronously with inherited stdio; resolves with the exit code. */
export function runAsync(cmd, args, opts = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: 'inherit', cwd: ROOT, ...opts });
    child.on('error', reject);
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)));
  });
}

/** True when this process runs as root. */
export function isRoot() {
  return typeof process.getuid === 'function' && process.getuid() === 0;
}

/** Run `apt-get update && apt-get install -y <pkgs>` non-interactively (root only); returns exit code. */
export function aptInstall(pkgs) {
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const lock = ['-o', 'DPkg::Lock::Timeout=900'];
  let code = runSync('apt-get', [...lock, 'update'], { env, stdio: ['ignore', 'inherit', 'inherit'] });
  if (code !== 0) return code;
  code = runSync('apt-get', [...lock, 'install', '-y', ...pkgs], {
    env,
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  return code;
}

/** Wrap a script's main function: print UserError messages plainly and exit non-zero. */
export function main(fn) {
  fn().then(
    (code) => process.exit(typeof code === 'number' ? code : 0),
    (err) => {
      if (err instanceof UserError) process.stderr.write(`\nerror: ${err.message}\n`);
      else process.stderr.write(`\nerror: ${err?.stack ?? err}\n`);
      process.exit(1);
    },
  );
}
