/**
 * Spin^c classes and relative Maslov gradings of a list of generators (Ozsváth–Szabó 2004, §2.6 and §4.1):
 * x and y share a class iff 1_x - 1_y is in the image of J_0 (lattice.ts), and then
 *   gr(x) - gr(y) = μ(φ) - 2 n_z(φ) = μ(φ) for the n_z = 0 domain φ in π_2(x, y).
 * With the precomputed particular-solution columns G_p (scaled by L), the domain from x to the class root r is
 * Σ_p (1_x - 1_r)_p G_p / L, and μ = e + n_x + n_r is a quadratic form in the points of x: O(k^2) per generator.
 * When the class is not torsion, μ of periodic domains is a multiple of d = gcd μ(P_k) (the divisibility of
 * c_1, Ozsváth–Szabó 2004, §4.2.3) and gradings are taken mod d.
 */
import type { CombinatorialDiagram } from './combinatorics.js';
import { classInvariant, type DomainLattice } from './lattice.js';

export interface ClassesAndGradings {
  /** Class id per generator (0-based, in order of first appearance). */
  classOf: Int32Array;
  /**
   * Relative grading per generator: gr(x) - gr(lowest generator of its class), so the lowest is 0; reduced to
   * [0, modulus) when the class modulus is non-zero.
   */
  grading: Int32Array;
  /** Per class: index of its root generator (its first generator in the given order). */
  roots: number[];
  /**
   * Per class: ε(root, first generator) in coker J_0 coordinates from the Smith form (Ozsváth–Szabó 2004,
   * §2.4: ε(x, y) = 0 iff a domain exists): "0" for the class of the first generator, else e.g. "(2 mod 5)".
   */
  labels: string[];
  /** Per class: grading modulus (0 = integer grading, torsion class). */
  modulus: number[];
}

const gcdN = (a: number, b: number): number => { a = Math.abs(a); b = Math.abs(b); while (b) [a, b] = [b, a % b]; return a; };

/** Point-level tables: E[p] = 4L e(G_p), NQ[q*P + p] = 4L n_q(G_p) (quarters times the scale). O(P (P + R)) */
function tables(L: DomainLattice): { E: Float64Array; NQ: Float64Array } {
  const comb = L.comb, P = comb.points.length, R = comb.regions.length;
  const E = new Float64Array(P), NQ = new Float64Array(P * P);
  for (let p = 0; p < P; p++) {
    const off = p * R;
    let e = 0;
    for (let r = 0; r < R; r++) e += L.partCols[off + r] * comb.regions[r].eulerQuarters;
    E[p] = e;
    for (let q = 0; q < P; q++) {
      const qd = comb.points[q].quadrants;
      NQ[q * P + p] = L.partCols[off + qd[0]] + L.partCols[off + qd[1]] + L.partCols[off + qd[2]] + L.partCols[off + qd[3]];
    }
  }
  return { E, NQ };
}

/** Grading modulus of the class of root x: gcd over the periodic basis of μ(P) = e(P) + 2 n_x(P). O(b (R + k)) */
function classModulus(comb: CombinatorialDiagram, L: DomainLattice, x: ArrayLike<number>): number {
  let g = 0;
  for (const Pd of L.periodic) {
    let q = 0;
    comb.regions.forEach((r, i) => { q += Pd[i] * r.eulerQuarters; });
    for (let i = 0; i < x.length; i++) {
      const qd = comb.points[x[i]].quadrants;
      q += 2 * (Pd[qd[0]] + Pd[qd[1]] + Pd[qd[2]] + Pd[qd[3]]);
    }
    g = gcdN(g, q / 4);
  }
  return g;
}

/** Classes and gradings of generators gens (count x k, row-major). O(count · k · (k + #obstructions)) */
export function classesAndGradings(L: DomainLattice, gens: Int32Array, count: number): ClassesAndGradings {
  const comb = L.comb, k = comb.curveCount, P = comb.points.length;
  const { E, NQ } = tables(L);
  const m = L.obsMod.length;
  const first = new Float64Array(m), tmp = new Float64Array(m);
  const classOf = new Int32Array(count), grading = new Int32Array(count);
  const keyToClass = new Map<string, number>();
  const roots: number[] = [], modulus: number[] = [];
  const rootData: { base: number; rowCol: Float64Array }[] = [];
  const labels: string[] = [];
  const scale4 = 4 * L.scale;
  for (let g = 0; g < count; g++) {
    const x = gens.subarray(g * k, g * k + k);
    classInvariant(L, x, g === 0 ? first : tmp);
    let cls = 0;
    if (g > 0) {
      let same = true;
      for (let t = 0; t < m; t++) if (tmp[t] !== first[t]) { same = false; break; }
      if (!same) {
        const key = tmp.join(',');
        cls = keyToClass.get(key) ?? -1;
        if (cls < 0) { cls = roots.length; keyToClass.set(key, cls); }
      }
    }
    if (cls === roots.length) {
      roots.push(g);
      modulus.push(classModulus(comb, L, x));
      rootData.push(rootTables(x, E, NQ, P));
      labels.push(g === 0 ? '0' : classLabel(L, tmp, first));
    }
    classOf[g] = cls;
    const rd = rootData[cls];
    let s = -rd.base;
    for (let i = 0; i < k; i++) {
      const p = x[i];
      s += E[p] + rd.rowCol[p];
      const row = p * P;
      for (let j = 0; j < k; j++) s += NQ[row + x[j]];
    }
    let gr = Math.round(s / scale4);
    const mod = modulus[cls];
    if (mod) gr = ((gr % mod) + mod) % mod;
    grading[g] = gr;
  }
  normalize(classOf, grading, modulus);
  return { classOf, grading, roots, modulus, labels };
}

/** Shifts integer-graded classes so their lowest generator has grading 0. O(count) */
function normalize(classOf: Int32Array, grading: Int32Array, modulus: number[]): void {
  const min = new Array<number>(modulus.length).fill(Infinity);
  for (let g = 0; g < classOf.length; g++) if (grading[g] < min[classOf[g]]) min[classOf[g]] = grading[g];
  for (let g = 0; g < classOf.length; g++) if (!modulus[classOf[g]]) grading[g] -= min[classOf[g]];
}

/** "(a mod d, b)" from the obstruction coordinates that differ from the first generator's. */
function classLabel(L: DomainLattice, v: Float64Array, first: Float64Array): string {
  const parts: string[] = [];
  for (let t = 0; t < v.length; t++) {
    const d = L.obsMod[t];
    const diff = d ? (((v[t] - first[t]) % d) + d) % d : v[t] - first[t];
    if (diff !== 0) parts.push(d ? `${diff} mod ${d}` : String(diff));
  }
  return `(${parts.join(', ')})`;
}

/** For root r: base = Σ_{p∈r} E[p] + Σ_{q,p∈r} NQ[q,p]; rowCol[p] = Σ_{q∈r} NQ[q,p] - Σ_{p'∈r} NQ[p,p']. */
function rootTables(r: ArrayLike<number>, E: Float64Array, NQ: Float64Array, P: number): { base: number; rowCol: Float64Array } {
  const rowCol = new Float64Array(P);
  let base = 0;
  for (let i = 0; i < r.length; i++) {
    base += E[r[i]];
    for (let j = 0; j < r.length; j++) base += NQ[r[i] * P + r[j]];
  }
  for (let p = 0; p < P; p++) {
    let s = 0;
    for (let i = 0; i < r.length; i++) s += NQ[r[i] * P + p] - NQ[p * P + r[i]];
    rowCol[p] = s;
  }
  return { base, rowCol };
}
