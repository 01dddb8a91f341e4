import { describe, expect, it } from 'vitest';
import { nonNegativePeriodic } from './admissibility.js';

describe('weak admissibility by Fourier–Motzkin (Ozsváth–Szabó 2004, Definition 4.10; Schrijver 1986, §12.2)', () => {
  it('accepts a lattice whose every element has both signs', () => {
    expect(nonNegativePeriodic([Int32Array.of(1, -1, 0), Int32Array.of(0, 1, -1)])).toBeNull();
  });

  it('finds a non-negative combination hidden in a basis of mixed-sign vectors', () => {
    const P1 = Int32Array.of(1, -1, 2, 0), P2 = Int32Array.of(-1, 2, -1, 0);
    const d = nonNegativePeriodic([P1, P2]);
    expect(d).toBeInstanceOf(Int32Array);
    const v = d as Int32Array;
    expect(v.every((x) => x >= 0) && v.some((x) => x > 0)).toBe(true);
    // v lies in the span: v = a P1 + b P2 with a = v_0 + ..., check by solving the first two coordinates
    const b = v[0] + v[1], a = v[0] + b;
    expect(Array.from(v)).toEqual(Array.from(P1, (x, i) => a * x + b * P2[i]));
  });

  it('finds a non-positive periodic domain by negating it', () => {
    const d = nonNegativePeriodic([Int32Array.of(-1, -2, 0)]);
    expect(Array.from(d as Int32Array)).toEqual([1, 2, 0]);
  });

  it('handles three periodic domains', () => {
    const basis = [Int32Array.of(1, -1, 0, 0, 1), Int32Array.of(0, 1, -1, 0, -1), Int32Array.of(0, 0, 1, -1, 1)];
    expect(nonNegativePeriodic(basis)).toBeNull(); // entries 1..4 sum to 0 telescopically: P>=0 would need all zero
    const bad = [Int32Array.of(1, -1, 0, 1), Int32Array.of(0, 1, -1, 0), Int32Array.of(0, 0, 1, 0)];
    const d = nonNegativePeriodic(bad) as Int32Array;
    expect(d.every((x) => x >= 0) && d.some((x) => x > 0)).toBe(true);
  });
});
