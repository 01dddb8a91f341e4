/**
 * Weak admissibility as an exact linear program (Ozsváth–Szabó 2004, Definition 4.10). With span(P) the
 * rational span of the periodic basis and N a basis of its orthogonal complement (an integer kernel,
 * algebra/integer-matrix.ts), a non-zero periodic domain with no negative coefficient exists iff
 *   { s >= 0 : N s = 0, Σ s = 1 }
 * is non-empty. Decided by phase I of the simplex method on an integer (fraction-free) tableau with Bland's
 * rule, which cannot cycle (Chvátal 1983, Linear Programming, ch. 3; Schrijver 1986, §11). A feasible basic
 * solution, scaled to integers, is the offending periodic domain. Polynomial in practice, exact always.
 */
import { gcdBig, integerKernelBasis, toIntMatrix } from '../algebra/integer-matrix.js';

/** Divides a row by the gcd of its entries. */
function reduceRow(r: bigint[]): void {
  let g = 0n;
  for (const x of r) if (x !== 0n) { g = gcdBig(g, x); if (g === 1n) return; }
  if (g > 1n) for (let i = 0; i < r.length; i++) r[i] /= g;
}

/** row_i <- row_i * piv - row_r * row_i[q], reduced; keeps the positive row scale since piv > 0. */
function eliminate(ri: bigint[], rr: bigint[], q: number): void {
  const f = ri[q];
  if (f === 0n) return;
  const piv = rr[q];
  for (let j = 0; j < ri.length; j++) ri[j] = ri[j] * piv - rr[j] * f;
  reduceRow(ri);
}

/** Phase I simplex: a vector s >= 0 with A s = b (b >= 0), or null. Columns of A are the variables. */
function phaseOne(A: bigint[][], b: bigint[], maxPivots: number): bigint[] | null | 'undecided' {
  const m = A.length, n = m ? A[0].length : 0;
  const width = n + m + 1;
  const T = A.map((row, i) => {
    const r = new Array<bigint>(width).fill(0n);
    for (let j = 0; j < n; j++) r[j] = row[j];
    r[n + i] = 1n; r[width - 1] = b[i];
    return r;
  });
  const basis = Array.from({ length: m }, (_, i) => n + i);
  const obj = new Array<bigint>(width).fill(0n);
  for (const r of T) for (let j = 0; j < n; j++) obj[j] += r[j];
  for (const r of T) obj[width - 1] += r[width - 1];
  for (let it = 0; it < maxPivots; it++) {
    const q = obj.findIndex((x, j) => j < n + m && x > 0n);
    if (q < 0) break;
    let r = -1;
    for (let i = 0; i < m; i++) {
      if (T[i][q] <= 0n) continue;
      if (r < 0) { r = i; continue; }
      const lhs = T[i][width - 1] * T[r][q], rhs = T[r][width - 1] * T[i][q];
      if (lhs < rhs || (lhs === rhs && basis[i] < basis[r])) r = i;
    }
    if (r < 0) return 'undecided'; // unbounded phase I cannot happen (w >= 0); defensive
    for (let i = 0; i < m; i++) if (i !== r) eliminate(T[i], T[r], q);
    eliminate(obj, T[r], q);
    basis[r] = q;
    if (it === maxPivots - 1) return 'undecided';
  }
  if (obj[width - 1] !== 0n) return null;
  // Feasible: read s from the basic rows (value = rhs / pivot entry), scaled to a common denominator.
  let den = 1n;
  for (let i = 0; i < m; i++) if (basis[i] < n) den = (den / (gcdBig(den, T[i][basis[i]]) || 1n)) * T[i][basis[i]];
  const s = new Array<bigint>(n).fill(0n);
  for (let i = 0; i < m; i++) if (basis[i] < n) s[basis[i]] = (T[i][width - 1] * den) / T[i][basis[i]];
  return s;
}

/**
 * A non-zero periodic domain (in the span of `basis`) with all coefficients >= 0, null when none exists (the
 * diagram is weakly admissible for this lattice), or 'undecided' past `maxPivots` simplex pivots.
 */
export function nonNegativePeriodic(basis: Int32Array[], maxPivots = 100_000): Int32Array | null | 'undecided' {
  if (basis.length === 0) return null;
  const R = basis[0].length;
  // Every element of the span has coefficient sum 0: a non-negative one must vanish.
  if (basis.every((P) => P.reduce((x, y) => x + y, 0) === 0)) return null;
  const support = [...Array(R).keys()].filter((r) => basis.some((P) => P[r] !== 0));
  const B = toIntMatrix(basis.map((P) => support.map((r) => P[r])));
  const N = integerKernelBasis(B, support.length); // rows orthogonal to every P_k
  const A = [...N, support.map(() => 1n)];
  const rhs = [...N.map(() => 0n), 1n];
  const s = phaseOne(A, rhs, maxPivots);
  if (s === null || s === 'undecided') return s;
  let g = 0n;
  for (const x of s) g = gcdBig(g, x);
  const out = new Int32Array(R);
  support.forEach((r, j) => { out[r] = Number(g > 1n ? s[j] / g : s[j]); });
  return out;
}
