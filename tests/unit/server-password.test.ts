import { describe, expect, it } from 'vitest';
import { hashPassword, needsRehash, verifyPassword } from '../../server/auth/password.js';

// scrypt: Percival 2009; parameters N = 2^15, r = 8, p = 1 per OWASP Password Storage Cheat Sheet.
describe('password hashing', () => {
  it('verifies the right password and rejects a wrong one', async () => {
    const hash = await hashPassword('quadrant-demo', 10);
    expect(await verifyPassword('quadrant-demo', hash)).toBe(true);
    expect(await verifyPassword('quadrant-demo!', hash)).toBe(false);
  });

  it('salts every hash, so equal passwords give different hashes', async () => {
    const a = await hashPassword('same password', 10);
    const b = await hashPassword('same password', 10);
    expect(a).not.toBe(b);
  });

  it('stores the algorithm and its parameters in the hash', async () => {
    expect(await hashPassword('x'.repeat(12))).toMatch(/^scrypt\$15\$8\$1\$[A-Za-z0-9+/=]+\$[A-Za-z0-9+/=]+$/);
  });

  it('treats a malformed stored hash as no match instead of throwing', async () => {
    expect(await verifyPassword('anything', 'not-a-hash')).toBe(false);
    expect(await verifyPassword('anything', 'scrypt$99$8$1$AAAA$BBBB')).toBe(false);
  });

  it('asks for a rehash when the stored cost is below the current one', async () => {
    const weak = await hashPassword('quadrant-demo', 10);
    expect(needsRehash(weak, 15)).toBe(true);
    expect(needsRehash(weak, 10)).toBe(false);
  });

  it('normalises Unicode so composed and decomposed input match (NFKC)', async () => {
    const hash = await hashPassword('Varga-Moreau é', 10);
    expect(await verifyPassword('Varga-Moreau e\u0301', hash)).toBe(true);
  });
});
