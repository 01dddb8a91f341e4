import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { hermiteNormalForm, integerKernel, matMul, smithNormalForm, toIntMatrix, type IntMatrix } from './integer-matrix.js';

const matrixArb = fc.integer({ min: 1, max: 5 }).chain((m) =>
  fc.integer({ min: 1, max: 5 }).chain((n) =>
    fc.array(fc.array(fc.integer({ min: -6, max: 6 }), { minLength: n, maxLength: n }), { minLength: m, maxLength: m })));

const det = (a: IntMatrix): bigint => {
  // Laplace expansion: fine for the 5 x 5 matrices here.
  if (a.length === 1) return a[0][0];
  return a[0].reduce((s, x, j) => s + (j % 2 ? -1n : 1n) * x * det(a.slice(1).map((r) => r.filter((_, c) => c !== j))), 0n);
};

describe('Smith normal form (Cohen 1993, Algorithm 2.4.14)', () => {
  it('gives U A V = D with unimodular U, V and a dividing diagonal', () => {
    fc.assert(fc.property(matrixArb, (rows) => {
      const A = toIntMatrix(rows);
      const { U, V, diagonal, rank } = smithNormalForm(A);
      const D = matMul(matMul(U, A), V);
      D.forEach((r, i) => r.forEach((x, j) => expect(x).toBe(i === j ? diagonal[i] : 0n)));
      expect([1n, -1n]).toContain(det(U));
      expect([1n, -1n]).toContain(det(V));
      for (let i = 0; i + 1 < rank; i++) expect(diagonal[i + 1] % diagonal[i]).toBe(0n);
      diagonal.forEach((d, i) => expect(d !== 0n).toBe(i < rank));
    }), { numRuns: 200 });
  });

  it('finds invariant factors 1, 5 for [[2,1],[1,3]] (common practice)', () => {
    expect(smithNormalForm(toIntMatrix([[2, 1], [1, 3]])).diagonal).toEqual([1n, 5n]);
  });
});

describe('Hermite normal form and integer kernels (Cohen 1993, §2.4.2–2.4.3)', () => {
  it('puts the row lattice in echelon form with reduced entries above pivots', () => {
    fc.assert(fc.property(matrixArb, (rows) => {
      const { H, pivots } = hermiteNormalForm(toIntMatrix(rows));
      H.forEach((r, i) => {
        const p = pivots[i];
        expect(r[p] > 0n).toBe(true);
        for (let j = 0; j < p; j++) expect(r[j]).toBe(0n);
        for (let k = 0; k < i; k++) expect(H[k][p] >= 0n && H[k][p] < r[p]).toBe(true);
        if (i > 0) expect(p > pivots[i - 1]).toBe(true);
      });
    }), { numRuns: 200 });
  });

  it('returns a saturated kernel basis: A v = 0 and the right dimension', () => {
    fc.assert(fc.property(matrixArb, (rows) => {
      const A = toIntMatrix(rows);
      const n = rows[0].length;
      const { H } = integerKernel(A);
      const { rank } = smithNormalForm(A);
      expect(H.length).toBe(n - rank);
      for (const v of H) matMul(A, v.map((x) => [x])).forEach((r) => expect(r[0]).toBe(0n));
    }), { numRuns: 200 });
  });

  it('finds the kernel of [1, 1] spanned by (1, -1) (common practice)', () => {
    expect(integerKernel(toIntMatrix([[1, 1]])).H).toEqual([[1n, -1n]]);
  });
});
