/**
 * The integer lattice of domains avoiding the blocked basepoints. With J_0 the corner map restricted to regions
 * holding no blocked basepoint (n_z = 0), a domain from x to y with n_z = 0 is an integer solution of
 * J_0 D = 1_x - 1_y; the solutions differ by periodic domains, ker J_0 (Ozsváth–Szabó 2004, §2.4–2.5).
 * One Smith form U J_0 V = diag(d) (Cohen 1993, §2.4.4) gives everything:
 *  - solvability: (U b)_i ≡ 0 mod d_i for i < rank and (U b)_i = 0 beyond, so the class of 1_x in
 *    coker J_0 (its spin^c class, Ozsváth–Szabó 2004, §2.6) is read off from U's rows in O(k) each;
 *  - a particular solution D = V diag(1/d) U b, precomputed per point as integer columns scaled by lcm(d);
 *  - periodic domains: the last columns of V, put in Hermite echelon form.
 */
import { hermiteNormalForm, integerKernel, smithNormalForm, type IntMatrix } from '../algebra/integer-matrix.js';
import type { CombinatorialDiagram } from './combinatorics.js';

/** Which basepoints a domain must avoid: the z basepoints (HF-hat; falls back to all if there is no z) or all. */
export type BlockedBasepoints = 'z' | 'all';

export interface DomainLattice {
  comb: CombinatorialDiagram;
  /** 1 for regions holding a blocked basepoint. */
  blockedRegion: Uint8Array;
  /** Indices of the allowed regions (the columns of J_0). */
  allowed: Int32Array;
  /** Obstruction rows: row t of U restricted to points, as numbers; obsRows[t*P + p]. */
  obsRows: Float64Array;
  /** Modulus of each obstruction row (0: must vanish exactly). */
  obsMod: Float64Array;
  /** Scaled particular solutions: partCols[p*R + r] = L · (V diag(1/d) U)[r][p], in full region numbering. */
  partCols: Float64Array;
  /** The common denominator L = lcm of the non-zero d_i. */
  scale: number;
  /** Periodic domains (full region numbering), Hermite echelon form over the allowed regions. */
  periodic: Int32Array[];
  /** Pivot region (full numbering) of each periodic domain. */
  periodicPivots: number[];
}

const SAFE = 2 ** 50;
const toNum = (x: bigint): number => {
  const n = Number(x);
  if (Math.abs(n) > SAFE) throw new RangeError('integer too large for the fast path');
  return n;
};
const gcdN = (a: number, b: number): number => { a = Math.abs(a); b = Math.abs(b); while (b) [a, b] = [b, a % b]; return a; };

/** The regions holding a blocked basepoint. O(regions) */
export function blockedRegions(comb: CombinatorialDiagram, blocked: BlockedBasepoints = 'z'): Uint8Array {
  const hasZ = comb.basepoints.some((b) => b.kind === 'z');
  const out = new Uint8Array(comb.regions.length);
  comb.regions.forEach((r, i) => {
    for (const b of r.basepoints) if (blocked === 'all' || !hasZ || comb.basepoints[b].kind === 'z') out[i] = 1;
  });
  return out;
}

/** The corner map J restricted to the allowed regions, as an integer matrix (points x allowed). O(P R) */
export function cornerMatrix(comb: CombinatorialDiagram, allowed: Int32Array): IntMatrix {
  const col = new Int32Array(comb.regions.length).fill(-1);
  allowed.forEach((r, j) => { col[r] = j; });
  return comb.points.map((p) => {
    const row = new Array<bigint>(allowed.length).fill(0n);
    p.quadrants.forEach((r, q) => { if (col[r] >= 0) row[col[r]] += q === 0 || q === 2 ? 1n : -1n; });
    return row;
  });
}

/**
 * Builds the lattice (one Smith form, one Hermite form). Throws RangeError when transform entries outgrow
 * doubles (never seen on diagrams of sane size); callers report that as a reason. O(P R min(P,R)) BigInt steps.
 */
export function domainLattice(comb: CombinatorialDiagram, blocked: BlockedBasepoints = 'z'): DomainLattice {
  const P = comb.points.length, R = comb.regions.length;
  const blockedRegion = blockedRegions(comb, blocked);
  const allowed = Int32Array.from([...Array(R).keys()].filter((r) => !blockedRegion[r]));
  const A = cornerMatrix(comb, allowed);
  const n = allowed.length;
  const snf = P > 0 && n > 0 ? smithNormalForm(A) : null;
  const rank = snf ? snf.rank : 0;
  const obs: number[][] = [], mods: number[] = [];
  for (let i = 0; i < P; i++) {
    const d = snf && i < rank ? toNum(snf.diagonal[i]) : 0;
    if (d === 1) continue;
    obs.push(snf ? snf.U[i].map(toNum) : [...Array(P).keys()].map((p) => (p === i ? 1 : 0)));
    mods.push(d);
  }
  let scale = 1;
  for (let i = 0; i < rank; i++) { const d = toNum(snf!.diagonal[i]); scale = (scale / gcdN(scale, d)) * d; }
  const partCols = snf ? particularColumns(snf.U, snf.V, snf.diagonal, rank, scale, allowed, P, R) : new Float64Array(P * R);
  const ker = n === 0 ? { H: [], pivots: [] } : snf ? hermiteNormalForm(kernelFromV(snf.V, rank)) : integerKernel([], n);
  const periodic = ker.H.map((row) => {
    const full = new Int32Array(R);
    row.forEach((v, j) => { full[allowed[j]] = toNum(v); });
    return full;
  });
  return {
    comb, blockedRegion, allowed, obsRows: Float64Array.from(obs.flat()), obsMod: Float64Array.from(mods), partCols,
    scale, periodic, periodicPivots: ker.pivots.map((j) => allowed[j]),
  };
}

/**
 * partCols[p*R + allowed[j]] = Σ_{i < rank} V[j][i] (L / d_i) U[i][p], in doubles over the non-zero entries
 * only: O(Σ_i nnz(V col i) · nnz(U row i)). Entries are checked against 2^50.
 */
function particularColumns(U: IntMatrix, V: IntMatrix, d: bigint[], rank: number, scale: number, allowed: Int32Array, P: number, R: number): Float64Array {
  const out = new Float64Array(P * R);
  for (let i = 0; i < rank; i++) {
    const f = scale / toNum(d[i]);
    const up: number[] = [], uv: number[] = [];
    for (let p = 0; p < P; p++) if (U[i][p] !== 0n) { up.push(p); uv.push(toNum(U[i][p])); }
    for (let j = 0; j < V.length; j++) {
      if (V[j][i] === 0n) continue;
      const v = toNum(V[j][i]) * f, col = allowed[j];
      for (let t = 0; t < up.length; t++) {
        const idx = up[t] * R + col;
        out[idx] += v * uv[t];
        if (Math.abs(out[idx]) > SAFE) throw new RangeError('integer too large for the fast path');
      }
    }
  }
  return out;
}

function kernelFromV(V: IntMatrix, rank: number): IntMatrix {
  const basis: IntMatrix = [];
  for (let j = rank; j < V.length; j++) basis.push(V.map((row) => row[j]));
  return basis;
}

/** Whether Σ_p b_p e_p lies in the image of J_0 (b sparse: points and multiplicities). O(#obstructions · |b|) */
export function inImage(L: DomainLattice, pts: ArrayLike<number>, mult: ArrayLike<number>): boolean {
  const P = L.comb.points.length;
  for (let t = 0; t < L.obsMod.length; t++) {
    let s = 0;
    for (let i = 0; i < pts.length; i++) s += mult[i] * L.obsRows[t * P + pts[i]];
    const m = L.obsMod[t];
    if (m === 0 ? s !== 0 : s % m !== 0) return false;
  }
  return true;
}

/** A domain D with J_0 D = b and n_z = 0, or null when none exists (different spin^c classes). O(R |b|) */
export function particularDomain(L: DomainLattice, pts: ArrayLike<number>, mult: ArrayLike<number>): Int32Array | null {
  if (!inImage(L, pts, mult)) return null;
  const R = L.comb.regions.length;
  const acc = new Float64Array(R);
  for (let i = 0; i < pts.length; i++) {
    const off = pts[i] * R, m = mult[i];
    for (let r = 0; r < R; r++) acc[r] += m * L.partCols[off + r];
  }
  const out = new Int32Array(R);
  for (let r = 0; r < R; r++) out[r] = acc[r] / L.scale;
  return out;
}

/** A domain from x to y with n_z = 0 for the blocked basepoints, or null ("different spin^c classes"). */
export function domainBetween(L: DomainLattice, x: ArrayLike<number>, y: ArrayLike<number>): Int32Array | null {
  const pts = [...Array.from(x), ...Array.from(y)];
  const mult = [...Array.from(x, () => 1), ...Array.from(y, () => -1)];
  return particularDomain(L, pts, mult);
}

/**
 * Spin^c class invariant of generator x: the obstruction rows applied to 1_x (mod d_i), i.e. the class of 1_x in
 * coker J_0 (Ozsváth–Szabó 2004, §2.6). Writes into out (length = #obstructions). O(k · #obstructions)
 */
export function classInvariant(L: DomainLattice, x: ArrayLike<number>, out: Float64Array): void {
  const P = L.comb.points.length;
  for (let t = 0; t < L.obsMod.length; t++) {
    let s = 0;
    for (let i = 0; i < x.length; i++) s += L.obsRows[t * P + x[i]];
    const m = L.obsMod[t];
    out[t] = m === 0 ? s : ((s % m) + m) % m;
  }
}

/**
 * All D0 + Σ c_k P_k with every coefficient in {0, 1}. The periodic basis is in echelon form, so at the pivot of
 * P_k only P_1..P_k contribute and c_k has at most two admissible values: a depth-first search over k with
 * branching ≤ 2 (at most 2^b leaves, b = number of periodic domains). Calls visit(D) with a reused buffer.
 */
export function zeroOneDomains(L: DomainLattice, d0: Int32Array, visit: (d: Int32Array) => void): void {
  const b = L.periodic.length;
  const cur = Int32Array.from(d0);
  const { finalStart, finalCols } = finalColumns(L);
  // Column r is final once c_0..c_{lastRow(r)} are chosen: prune as soon as a final column leaves {0, 1}.
  const ok = (level: number): boolean => {
    for (let i = finalStart[level], e = finalStart[level + 1]; i < e; i++) { const v = cur[finalCols[i]]; if (v !== 0 && v !== 1) return false; }
    return true;
  };
  const dfs = (k: number): void => {
    if (k === b) { visit(cur); return; }
    const Pk = L.periodic[k], piv = L.periodicPivots[k], h = Pk[piv], R = Pk.length;
    for (let t = 0; t <= 1; t++) {
      const num = t - cur[piv];
      if (num % h !== 0) continue;
      const c = num / h;
      if (c !== 0) for (let r = piv; r < R; r++) cur[r] += c * Pk[r];
      if (ok(k + 1)) dfs(k + 1);
      if (c !== 0) for (let r = piv; r < R; r++) cur[r] -= c * Pk[r];
    }
  };
  if (ok(0)) dfs(0);
}

const finalCache = new WeakMap<DomainLattice, { finalStart: Int32Array; finalCols: Int32Array }>();

/** Columns grouped by 1 + the last periodic row touching them (group 0: touched by none). O(b R), cached. */
function finalColumns(L: DomainLattice): { finalStart: Int32Array; finalCols: Int32Array } {
  const hit = finalCache.get(L);
  if (hit) return hit;
  const R = L.comb.regions.length, b = L.periodic.length;
  const level = new Int32Array(R);
  L.periodic.forEach((P, k) => { for (let r = 0; r < R; r++) if (P[r] !== 0) level[r] = k + 1; });
  const finalStart = new Int32Array(b + 2);
  for (let r = 0; r < R; r++) finalStart[level[r] + 1]++;
  for (let i = 0; i <= b; i++) finalStart[i + 1] += finalStart[i];
  const fill = finalStart.slice(), finalCols = new Int32Array(R);
  for (let r = 0; r < R; r++) finalCols[fill[level[r]]++] = r;
  const out = { finalStart, finalCols };
  finalCache.set(L, out);
  return out;
}
