/**
 * Password hashing with scrypt (node:crypto): per-user random salt, constant-time comparison.
 * Stored format: `scrypt$<logN>$<r>$<p>$<salt base64>$<hash base64>` so parameters can be raised later
 * (`needsRehash`). Percival 2009, "Stronger key derivation via sequential memory-hard functions";
 * parameters N = 2^15, r = 8, p = 1 follow OWASP's password storage guidance (common practice).
 */
import { randomBytes, scrypt as scryptCb, timingSafeEqual, type ScryptOptions } from 'node:crypto';

const KEY_LENGTH = 32;
const SALT_LENGTH = 16;
export const DEFAULT_LOG_N = 15;
const R = 8;
const P = 1;

function scrypt(password: string, salt: Buffer, keylen: number, options: ScryptOptions): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    scryptCb(password.normalize('NFKC'), salt, keylen, options, (err, key) => (err ? reject(err) : resolve(key)));
  });
}

function options(logN: number, r: number, p: number): ScryptOptions {
  const N = 2 ** logN;
  // scrypt needs 128 * N * r bytes; allow twice that.
  return { N, r, p, maxmem: 256 * N * r + 1024 * 1024 };
}

/** Hash a password with a fresh salt. Cost: ~50–100 ms at logN 15 (memory 32 MiB). */
export async function hashPassword(password: string, logN: number = DEFAULT_LOG_N): Promise<string> {
  const salt = randomBytes(SALT_LENGTH);
  const key = await scrypt(password, salt, KEY_LENGTH, options(logN, R, P));
  return ['scrypt', logN, R, P, salt.toString('base64'), key.toString('base64')].join('$');
}

interface Parsed {
  logN: number;
  r: number;
  p: number;
  salt: Buffer;
  key: Buffer;
}

function parse(stored: string): Parsed | null {
  const parts = stored.split('$');
  if (parts.length !== 6 || parts[0] !== 'scrypt') return null;
  const [logN, r, p] = parts.slice(1, 4).map(Number);
  if (![logN, r, p].every((n) => Number.isInteger(n) && n > 0) || logN > 22) return null;
  const salt = Buffer.from(parts[4], 'base64');
  const key = Buffer.from(parts[5], 'base64');
  if (salt.length === 0 || key.length === 0) return null;
  return { logN, r, p, salt, key };
}

/** True when `password` matches `stored`. Constant-time comparison; malformed hashes never match. */
export async function verifyPassword(password: string, stored: string): Promise<boolean> {
  const parsed = parse(stored);
  if (!parsed) return false;
  const key = await scrypt(password, parsed.salt, parsed.key.length, options(parsed.logN, parsed.r, parsed.p));
  return key.length === parsed.key.length && timingSafeEqual(key, parsed.key);
}

/** True when `stored` was made with weaker parameters than `logN` (rehash after a successful sign-in). */
export function needsRehash(stored: string, logN: number = DEFAULT_LOG_N): boolean {
  const parsed = parse(stored);
  return !parsed || parsed.logN < logN || parsed.r < R;
}
