/**
 * Exact integer matrices (BigInt, row-major arrays of rows) with Smith and Hermite normal forms.
 * Sizes here are small (curves, points, regions of one diagram), so clarity beats speed; nothing in this file
 * runs in a per-generator loop. Algorithms follow H. Cohen, A Course in Computational Algebraic Number
 * Theory (Springer 1993), §2.4.2 (Hermite normal form, Algorithm 2.4.5) and §2.4.4 (Smith normal form,
 * Algorithm 2.4.14), in their plain (not modular) versions.
 */

/** A dense integer matrix as rows of BigInt. */
export type IntMatrix = bigint[][];

/** The m x n zero matrix. O(mn) */
export function zeroMatrix(m: number, n: number): IntMatrix {
  return Array.from({ length: m }, () => new Array<bigint>(n).fill(0n));
}

/** The n x n identity. O(n^2) */
export function identityMatrix(n: number): IntMatrix {
  const a = zeroMatrix(n, n);
  for (let i = 0; i < n; i++) a[i][i] = 1n;
  return a;
}

/** Converts a matrix of safe integers. O(mn) */
export function toIntMatrix(rows: ArrayLike<number>[]): IntMatrix {
  return Array.from(rows, (r) => Array.from(r, (x) => BigInt(x)));
}

/** Matrix product; throws on a shape mismatch (an internal bug). O(mnp) */
export function matMul(a: IntMatrix, b: IntMatrix): IntMatrix {
  const m = a.length, n = b.length, p = n ? b[0].length : 0;
  const c = zeroMatrix(m, p);
  for (let i = 0; i < m; i++) {
    if (a[i].length !== n) throw new Error('matMul: shape mismatch');
    for (let k = 0; k < n; k++) {
      const x = a[i][k];
      if (x === 0n) continue;
      const bk = b[k], ci = c[i];
      for (let j = 0; j < p; j++) ci[j] += x * bk[j];
    }
  }
  return c;
}

export const absBig = (x: bigint): bigint => (x < 0n ? -x : x);

/** Greatest common divisor, non-negative. */
export function gcdBig(a: bigint, b: bigint): bigint {
  a = absBig(a); b = absBig(b);
  while (b) [a, b] = [b, a % b];
  return a;
}

/** Floor division for BigInt (BigInt `/` truncates toward zero). */
export function floorDiv(a: bigint, b: bigint): bigint {
  const q = a / b;
  return (a % b !== 0n && (a < 0n) !== (b < 0n)) ? q - 1n : q;
}

/** Smith normal form U A V = D with U, V unimodular and d_1 | d_2 | ... on the diagonal, d_i >= 0. */
export interface SmithForm {
  /** m x m, unimodular. */
  U: IntMatrix;
  /** n x n, unimodular. */
  V: IntMatrix;
  /** The diagonal of D (length min(m, n)), non-negative, each dividing the next; zeros last. */
  diagonal: bigint[];
  /** Number of non-zero diagonal entries (the rank of A). */
  rank: number;
}

const swapRows = (a: IntMatrix, i: number, j: number): void => { const t = a[i]; a[i] = a[j]; a[j] = t; };
function swapCols(a: IntMatrix, i: number, j: number): void {
  for (const row of a) { const t = row[i]; row[i] = row[j]; row[j] = t; }
}
/** row_i += f * row_j */
function addRow(a: IntMatrix, i: number, j: number, f: bigint): void {
  const ri = a[i], rj = a[j];
  for (let c = 0; c < ri.length; c++) ri[c] += f * rj[c];
}
/** col_i += f * col_j */
function addCol(a: IntMatrix, i: number, j: number, f: bigint): void {
  for (const row of a) row[i] += f * row[j];
}

/** Position of the smallest non-zero |entry| in the block rows >= t, cols >= t, or null. */
function smallestEntry(a: IntMatrix, t: number): [number, number] | null {
  let best: [number, number] | null = null, bv = 0n;
  for (let i = t; i < a.length; i++) {
    for (let j = t; j < a[i].length; j++) {
      const v = absBig(a[i][j]);
      if (v !== 0n && (best === null || v < bv)) { best = [i, j]; bv = v; if (v === 1n) return best; }
    }
  }
  return best;
}

/** Clears row t and column t outside (t,t); returns false when a remainder appeared (pivot must change). */
function clearCross(a: IntMatrix, U: IntMatrix, V: IntMatrix, t: number): boolean {
  const p = a[t][t];
  let clean = true;
  for (let i = t + 1; i < a.length; i++) {
    if (a[i][t] === 0n) continue;
    const q = floorDiv(a[i][t], p);
    addRow(a, i, t, -q); addRow(U, i, t, -q);
    if (a[i][t] !== 0n) clean = false;
  }
  for (let j = t + 1; j < a[t].length; j++) {
    if (a[t][j] === 0n) continue;
    const q = floorDiv(a[t][j], p);
    addCol(a, j, t, -q); addCol(V, j, t, -q);
    if (a[t][j] !== 0n) clean = false;
  }
  return clean;
}

/**
 * Smith normal form with transforms (Cohen 1993, Algorithm 2.4.14, non-modular): repeatedly move the smallest
 * entry to the pivot, reduce its row and column by Euclidean steps, and enforce divisibility by adding a row
 * whose entries the pivot does not divide. Does not modify `a`. Cost O(min(m,n) * m * n * log(max entry)).
 */
export function smithNormalForm(a: IntMatrix): SmithForm {
  const m = a.length, n = m ? a[0].length : 0;
  const A = a.map((r) => r.slice());
  const U = identityMatrix(m), V = identityMatrix(n);
  let t = 0;
  for (; t < Math.min(m, n); t++) {
    for (;;) {
      const pos = smallestEntry(A, t);
      if (!pos) break;
      if (pos[0] !== t) { swapRows(A, t, pos[0]); swapRows(U, t, pos[0]); }
      if (pos[1] !== t) { swapCols(A, t, pos[1]); swapCols(V, t, pos[1]); }
      if (!clearCross(A, U, V, t)) continue;
      const bad = absBig(A[t][t]) === 1n ? -1 : findNonMultiple(A, t);
      if (bad < 0) break;
      addRow(A, t, bad, 1n); addRow(U, t, bad, 1n);
    }
    if (A[t][t] === 0n) break;
    if (A[t][t] < 0n) { for (let j = 0; j < n; j++) A[t][j] = -A[t][j]; for (let j = 0; j < m; j++) U[t][j] = -U[t][j]; }
  }
  const diagonal: bigint[] = [];
  for (let i = 0; i < Math.min(m, n); i++) diagonal.push(A[i][i]);
  return { U, V, diagonal, rank: t };
}

/** A row index > t holding an entry not divisible by the pivot (t,t), or -1. */
function findNonMultiple(a: IntMatrix, t: number): number {
  const p = a[t][t];
  for (let i = t + 1; i < a.length; i++) for (let j = t + 1; j < a[i].length; j++) if (a[i][j] % p !== 0n) return i;
  return -1;
}

/** Row Hermite normal form H = W A (Cohen 1993 §2.4.2, here for rows). */
export interface HermiteForm {
  /** Non-zero rows of the echelon form, pivots strictly increasing, pivot entries positive, entries above a pivot in [0, pivot). */
  H: IntMatrix;
  /** Column of each row's pivot. */
  pivots: number[];
}

/**
 * Row-style Hermite normal form of the row lattice of `a`: the unique echelon basis (Cohen 1993, Algorithm
 * 2.4.5 transposed, by Euclidean row operations). Zero rows are dropped. O(rows * cols * n * log).
 */
export function hermiteNormalForm(a: IntMatrix): HermiteForm {
  const A = a.map((r) => r.slice());
  const n = A.length ? A[0].length : 0;
  const pivots: number[] = [];
  let r = 0;
  for (let c = 0; c < n && r < A.length; c++) {
    for (;;) {
      let best = -1;
      for (let i = r; i < A.length; i++) if (A[i][c] !== 0n && (best < 0 || absBig(A[i][c]) < absBig(A[best][c]))) best = i;
      if (best < 0) break;
      swapRows(A, r, best);
      let done = true;
      for (let i = r + 1; i < A.length; i++) {
        if (A[i][c] === 0n) continue;
        addRow(A, i, r, -floorDiv(A[i][c], A[r][c]));
        if (A[i][c] !== 0n) done = false;
      }
      if (done) break;
    }
    if (r >= A.length || A[r][c] === 0n) continue;
    if (A[r][c] < 0n) A[r] = A[r].map((x) => -x);
    for (let i = 0; i < r; i++) addRow(A, i, r, -floorDiv(A[i][c], A[r][c]));
    pivots.push(c);
    r++;
  }
  return { H: A.slice(0, r), pivots };
}

/**
 * A basis of the integer kernel {v in Z^n : A v = 0} in Hermite echelon form (rows). The last n - rank columns
 * of V in U A V = D span the kernel over Z because V is unimodular (Cohen 1993, §2.4.3); the Hermite form
 * makes the basis canonical. O(SNF + HNF).
 */
export function integerKernel(a: IntMatrix, n = a.length ? a[0].length : 0): HermiteForm {
  if (a.length === 0) return hermiteNormalForm(identityMatrix(n));
  const { V, rank } = smithNormalForm(a);
  const basis: IntMatrix = [];
  for (let j = rank; j < n; j++) basis.push(V.map((row) => row[j]));
  return hermiteNormalForm(basis);
}

/**
 * A basis of the integer kernel, not reduced: the last n - rank columns of V (Cohen 1993, §2.4.3), as rows.
 * Cheaper than integerKernel when the echelon form is not needed. O(SNF)
 */
export function integerKernelBasis(a: IntMatrix, n = a.length ? a[0].length : 0): IntMatrix {
  if (a.length === 0) return identityMatrix(n);
  const { V, rank } = smithNormalForm(a);
  const basis: IntMatrix = [];
  for (let j = rank; j < n; j++) basis.push(V.map((row) => row[j]));
  return basis;
}

/** Abelian group Z^rank ⊕ ⊕ Z/t_i from a Smith diagonal of an m x n presentation matrix (cokernel). */
export function cokernelInvariants(diagonal: bigint[], m: number): { rank: number; torsion: bigint[] } {
  const torsion = diagonal.filter((d) => d > 1n);
  const nonzero = diagonal.filter((d) => d !== 0n).length;
  return { rank: m - nonzero, torsion };
}
