/**
 * H_1(Y) from the algebraic intersection matrix M_ij = alpha_i · beta_j: H_1(Y) ≅ coker M for k = g, and
 * coker M ≅ H_1(Y) ⊕ Z^{k-g} for multi-pointed diagrams (REFERENCE.md, "H_1 and Euler characteristic";
 * standard). Invariant factors from the Smith normal form (Cohen 1993, §2.4.4).
 */
import { smithNormalForm, toIntMatrix } from '../algebra/integer-matrix.js';
import type { CombinatorialDiagram } from './combinatorics.js';
import { curveIncidence } from './generators.js';

/** H_1(Y) ≅ Z^rank ⊕ ⊕ Z/torsion_i (torsion_i > 1, each dividing the next). */
export interface H1Summary {
  rank: number;
  torsion: number[];
  /** |H_1(Y)| when finite (rank 0), as a decimal string; null otherwise. */
  order: string | null;
  /** det M (the signed generator count, Ozsváth–Szabó 2004), decimal string. */
  determinant: string;
}

/** Abelian group presented by a square or rectangular integer matrix (its cokernel). O(k^3) BigInt */
export function cokernel(rows: ArrayLike<number>[]): { rank: number; torsion: bigint[] } {
  const m = rows.length;
  if (m === 0) return { rank: 0, torsion: [] };
  const { diagonal } = smithNormalForm(toIntMatrix(rows));
  return { rank: m - diagonal.filter((d) => d !== 0n).length, torsion: diagonal.filter((d) => d > 1n) };
}

/** Determinant by fraction-free Bareiss elimination (Bareiss 1968). O(k^3) BigInt */
export function determinant(rows: ArrayLike<number>[]): bigint {
  const n = rows.length;
  const a = rows.map((r) => Array.from(r, (x) => BigInt(x)));
  let sign = 1n, prev = 1n;
  for (let k = 0; k < n - 1; k++) {
    if (a[k][k] === 0n) {
      const s = a.findIndex((r, i) => i > k && r[k] !== 0n);
      if (s < 0) return 0n;
      [a[k], a[s]] = [a[s], a[k]]; sign = -sign;
    }
    for (let i = k + 1; i < n; i++) for (let j = k + 1; j < n; j++) a[i][j] = (a[i][j] * a[k][k] - a[i][k] * a[k][j]) / prev;
    prev = a[k][k];
  }
  return n === 0 ? 1n : sign * a[n - 1][n - 1];
}

/** H_1(Y) of the diagram (multi-pointed: the Z^{k-g} summand removed). O(k^3) */
export function firstHomology(comb: CombinatorialDiagram): H1Summary {
  const { k, M } = curveIncidence(comb);
  const rows = Array.from({ length: k }, (_, i) => M.subarray(i * k, (i + 1) * k));
  const ck = cokernel(rows);
  const rank = Math.max(0, ck.rank - (k - comb.genus));
  const torsion = ck.torsion.map((t) => Number(t));
  const order = rank === 0 ? ck.torsion.reduce((x, y) => x * y, 1n).toString() : null;
  return { rank, torsion, order, determinant: determinant(rows).toString() };
}

/** H_1 as a user reads it: "0", "Z", "Z/5", "Z^2 ⊕ Z/3". O(#torsion). */
export function formatH1(h: Pick<H1Summary, 'rank' | 'torsion'>): string {
  const parts: string[] = [];
  if (h.rank === 1) parts.push('Z');
  else if (h.rank > 1) parts.push(`Z^${h.rank}`);
  for (const t of h.torsion) parts.push(`Z/${t}`);
  return parts.length ? parts.join(' ⊕ ') : '0';
}
