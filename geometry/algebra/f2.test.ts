import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { rankF2, rankF2Dense, sparseF2FromPairs } from './f2.js';

describe('rank over F2', () => {
  it('agrees between sparse column reduction (ELZ 2002) and dense elimination', () => {
    const arb = fc.array(fc.tuple(fc.integer({ min: 0, max: 40 }), fc.integer({ min: 0, max: 30 })), { maxLength: 200 });
    fc.assert(fc.property(arb, (pairs) => {
      const rows = 41, cols = 31;
      const m = sparseF2FromPairs(rows, cols, Int32Array.from(pairs, (p) => p[0]), Int32Array.from(pairs, (p) => p[1]));
      const bits = Array.from({ length: cols }, () => new Uint32Array(2));
      for (const [r, c] of pairs) bits[c][r >> 5] ^= 1 << (r & 31);
      expect(rankF2(m)).toBe(rankF2Dense(bits, 2));
    }), { numRuns: 200 });
  });

  it('cancels repeated entries mod 2', () => {
    const m = sparseF2FromPairs(2, 2, Int32Array.of(0, 0, 1), Int32Array.of(0, 0, 1));
    expect(rankF2(m)).toBe(1);
  });

  it('gives the boundary of a triangle rank 2 (Edelsbrunner–Harer 2010, §IV.1: H_0 of a circle has rank 1)', () => {
    // vertices 0,1,2; edges 01, 12, 02
    const m = sparseF2FromPairs(3, 3, Int32Array.of(0, 1, 1, 2, 0, 2), Int32Array.of(0, 0, 1, 1, 2, 2));
    expect(rankF2(m)).toBe(2);
  });
});
