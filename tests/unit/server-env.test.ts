import { describe, expect, it } from 'vitest';
import { EnvError, parseEnv } from '../../server/env.js';

const base = { DATABASE_URL: 'postgres://q:q@127.0.0.1:54329/quadrant' };

describe('environment', () => {
  it('fills development defaults', () => {
    const env = parseEnv(base);
    expect(env).toMatchObject({ NODE_ENV: 'development', PORT: 3000, PUBLIC_ORIGIN: 'http://127.0.0.1:3000' });
    expect(env.SESSION_SECRET.length).toBeGreaterThanOrEqual(16);
  });

  it('derives PUBLIC_ORIGIN from PORT', () => {
    expect(parseEnv({ ...base, PORT: '4100' }).PUBLIC_ORIGIN).toBe('http://127.0.0.1:4100');
  });

  it('requires SESSION_SECRET in production and names the variable', () => {
    expect(() => parseEnv({ ...base, NODE_ENV: 'production' })).toThrow(EnvError);
    expect(() => parseEnv({ ...base, NODE_ENV: 'production' })).toThrow(/SESSION_SECRET: is required when NODE_ENV=production/);
  });

  it('rejects a missing DATABASE_URL and a bad PORT with one line each', () => {
    try {
      parseEnv({ PORT: 'eighty' });
      expect.unreachable();
    } catch (err) {
      expect((err as Error).message).toMatch(/DATABASE_URL/);
      expect((err as Error).message).toMatch(/PORT: must be a whole number/);
    }
  });
});
