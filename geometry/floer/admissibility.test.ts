import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { smithNormalForm, toIntMatrix } from '../algebra/integer-matrix.js';
import { nonNegativePeriodicFM } from './admissibility.js';
import { nonNegativePeriodic } from './admissibility-lp.js';

const inSpan = (basis: Int32Array[], v: Int32Array) =>
  smithNormalForm(toIntMatrix([...basis, v])).rank === smithNormalForm(toIntMatrix(basis)).rank;
const offending = (v: unknown) => v instanceof Int32Array && v.every((x) => x >= 0) && v.some((x) => x > 0);

for (const [name, decide] of [['exact simplex (Chvátal 1983)', nonNegativePeriodic], ['Fourier–Motzkin (Schrijver 1986, §12.2)', nonNegativePeriodicFM]] as const) {
  describe(`weak admissibility by ${name} (Ozsváth–Szabó 2004, Definition 4.10)`, () => {
    it('accepts a lattice whose every element has both signs', () => {
      expect(decide([Int32Array.of(1, -1, 0), Int32Array.of(0, 1, -1)])).toBeNull();
    });

    it('finds a non-negative combination hidden in a basis of mixed-sign vectors', () => {
      const basis = [Int32Array.of(1, -1, 2, 0), Int32Array.of(-1, 2, -1, 0)];
      const d = decide(basis);
      expect(offending(d)).toBe(true);
      expect(inSpan(basis, d as Int32Array)).toBe(true);
    });

    it('finds a non-positive periodic domain by negating it', () => {
      expect(Array.from(decide([Int32Array.of(-1, -2, 0)]) as Int32Array)).toEqual([1, 2, 0]);
    });

    it('handles three periodic domains', () => {
      const basis = [Int32Array.of(1, -1, 0, 0, 1), Int32Array.of(0, 1, -1, 0, -1), Int32Array.of(0, 0, 1, -1, 1)];
      expect(decide(basis)).toBeNull(); // entries 1..4 telescope to 0: P >= 0 would need all zero
      const bad = [Int32Array.of(1, -1, 0, 1), Int32Array.of(0, 1, -1, 0), Int32Array.of(0, 0, 1, 0)];
      expect(offending(decide(bad))).toBe(true);
    });
  });
}

describe('the two admissibility deciders', () => {
  it('agree on random small lattices, and every witness lies in the span', () => {
    const arb = fc.integer({ min: 1, max: 3 }).chain((b) =>
      fc.array(fc.array(fc.integer({ min: -3, max: 3 }), { minLength: 6, maxLength: 6 }), { minLength: b, maxLength: b }));
    fc.assert(fc.property(arb, (rows) => {
      const basis = rows.map((r) => Int32Array.from(r));
      if (smithNormalForm(toIntMatrix(basis)).rank < basis.length) return; // a basis must be independent
      const a = nonNegativePeriodic(basis), b = nonNegativePeriodicFM(basis);
      expect(a === null).toBe(b === null);
      if (a !== null) { expect(offending(a)).toBe(true); expect(inSpan(basis, a as Int32Array)).toBe(true); }
    }), { numRuns: 300 });
  });
});
