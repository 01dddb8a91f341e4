/**
 * Generators x = {x_1..x_k}, x_i in alpha_i ∩ beta_σ(i) (Ozsváth–Szabó 2004, §2.4). A generator is stored as
 * the point indices it uses, ordered by alpha: x[i] is the point on alpha_i. Their number is the permanent of
 * N, N_ij = #(alpha_i ∩ beta_j) (REFERENCE.md, derived), computed by Ryser's formula before anything is listed.
 */
import type { CombinatorialDiagram } from './combinatorics.js';

/** Point indices on each alpha curve, and the N matrix. O(points) */
export interface CurveIncidence {
  k: number;
  /** pointsOnAlpha[i]: indices of the points on alpha_i, ascending. */
  pointsOnAlpha: Int32Array[];
  /** N[i*k + j] = #(alpha_i ∩ beta_j). */
  N: Int32Array;
  /** M[i*k + j] = algebraic intersection alpha_i · beta_j. */
  M: Int32Array;
}

export function curveIncidence(comb: CombinatorialDiagram): CurveIncidence {
  const k = comb.curveCount;
  const lists: number[][] = Array.from({ length: k }, () => []);
  const N = new Int32Array(k * k), M = new Int32Array(k * k);
  comb.points.forEach((p, idx) => {
    lists[p.alpha].push(idx);
    N[p.alpha * k + p.beta]++;
    M[p.alpha * k + p.beta] += p.sign;
  });
  return { k, pointsOnAlpha: lists.map((l) => Int32Array.from(l)), N, M };
}

/**
 * Permanent of a k x k non-negative integer matrix by Ryser's formula (Ryser 1963, Combinatorial Mathematics,
 * ch. 2) over a Gray code of column subsets: perm A = (-1)^k Σ_S (-1)^|S| Π_i Σ_{j in S} a_ij. O(2^k k),
 * exact with BigInt. Returns null for k > 26 (too many subsets to visit).
 */
export function permanent(a: Int32Array, k: number): bigint | null {
  if (k === 0) return 1n;
  if (k > 26) return null;
  const rowSum = new Float64Array(k);
  let total = 0n;
  let bound = 1;
  for (let i = 0; i < k; i++) { let s = 0; for (let j = 0; j < k; j++) s += a[i * k + j]; bound *= Math.max(1, s); }
  const exactInFloat = bound * 2 ** k < 2 ** 52;
  let totalF = 0;
  let size = 0;
  for (let g = 1; g < 2 ** k; g++) {
    // Gray code: the bit that flips between g-1 and g is the lowest set bit of g.
    const j = 31 - Math.clz32(g & -g);
    const adding = ((g ^ (g >> 1)) >> j) & 1;
    const d = adding ? 1 : -1;
    size += d;
    for (let i = 0; i < k; i++) rowSum[i] += d * a[i * k + j];
    const sgn = (k - size) % 2 === 0 ? 1 : -1;
    if (exactInFloat) {
      let p = 1;
      for (let i = 0; i < k && p !== 0; i++) p *= rowSum[i];
      totalF += sgn * p;
    } else {
      let p = 1n;
      for (let i = 0; i < k && p !== 0n; i++) p *= BigInt(rowSum[i]);
      total += sgn > 0 ? p : -p;
    }
  }
  return exactInFloat ? BigInt(totalF) : total;
}

/** Number of generators of a diagram: perm N (Ryser 1963). Null when k is too large to count this way. */
export function countGenerators(comb: CombinatorialDiagram): bigint | null {
  const inc = curveIncidence(comb);
  return permanent(inc.N, inc.k);
}

/**
 * Visits every generator in lexicographic order of (point on alpha_1, point on alpha_2, ...). The callback gets
 * a reused buffer (copy it to keep it) and may return false to stop. Depth-first over alphas with a used-beta
 * mask. O(#generators * k) plus dead ends.
 */
export function forEachGenerator(comb: CombinatorialDiagram, visit: (x: Int32Array) => boolean | void): void {
  const walk = generatorWalk(comb);
  while (walk.advance()) if (visit(walk.x) === false) return;
}

/** Lazily yields generators (fresh arrays) in the order of forEachGenerator; same DFS, O(k) per step. */
export function* generators(comb: CombinatorialDiagram): Generator<Int32Array> {
  const walk = generatorWalk(comb);
  while (walk.advance()) yield walk.x.slice();
}

/**
 * The depth-first walk behind both enumerations: `advance()` moves `x` to the next generator and returns
 * false when there is none. Depth-first over alphas with a used-beta mask; O(k) per step plus dead ends.
 */
function generatorWalk(comb: CombinatorialDiagram): { x: Int32Array; advance(): boolean } {
  const { k, pointsOnAlpha } = curveIncidence(comb);
  const betaOf = Int32Array.from(comb.points, (p) => p.beta);
  const x = new Int32Array(k), cursor = new Int32Array(k).fill(-1), used = new Uint8Array(k);
  let i = 0, done = false;
  const advance = (): boolean => {
    if (done) return false;
    if (k === 0) { done = true; return true; }
    while (i >= 0) {
      if (cursor[i] >= 0) used[betaOf[x[i]]] = 0;
      const list = pointsOnAlpha[i];
      let c = cursor[i] + 1;
      while (c < list.length && used[betaOf[list[c]]]) c++;
      if (c >= list.length) { cursor[i] = -1; i--; continue; }
      cursor[i] = c; x[i] = list[c]; used[betaOf[list[c]]] = 1;
      if (i === k - 1) return true;
      i++;
    }
    done = true;
    return false;
  };
  return { x, advance };
}

/** Sign of a generator: sign(σ) · Π local intersection signs (REFERENCE.md, H_1 and Euler characteristic). O(k^2) */
export function generatorSign(comb: CombinatorialDiagram, x: ArrayLike<number>): 1 | -1 {
  let s = 1;
  const k = x.length;
  for (let i = 0; i < k; i++) {
    s *= comb.points[x[i]].sign;
    for (let j = i + 1; j < k; j++) if (comb.points[x[i]].beta > comb.points[x[j]].beta) s = -s;
  }
  return s > 0 ? 1 : -1;
}

/** One generator for display: its points (0-based indices into comb.points, by alpha) and its sign. */
export interface GeneratorEntry {
  points: number[];
  sign: 1 | -1;
  /** Spin^c class label and relative grading, when gradings were passed to generatorsPage. */
  spinc?: string;
  grading?: number;
}

/** One page of the generator list. */
export interface GeneratorPage {
  offset: number;
  generators: GeneratorEntry[];
  /** Total number of generators (decimal string: it may exceed 2^53), or null when too many curves to count. */
  total: string | null;
  /** True when generators exist beyond this page. */
  more: boolean;
}

/**
 * Generators offset .. offset+limit-1 in enumeration order, with class labels and gradings when `gradings`
 * (from generatorGradings, same diagram) is given. O((offset + limit) * k)
 */
export function generatorsPage(
  comb: CombinatorialDiagram, offset: number, limit: number,
  gradings?: { classOf: Int32Array; grading: Int32Array; labels: string[] },
): GeneratorPage {
  const out: GeneratorEntry[] = [];
  let seen = 0, more = false;
  forEachGenerator(comb, (x) => {
    if (seen++ < offset) return true;
    if (out.length >= limit) { more = true; return false; }
    const e: GeneratorEntry = { points: Array.from(x), sign: generatorSign(comb, x) };
    const g = seen - 1;
    if (gradings && g < gradings.classOf.length) { e.spinc = gradings.labels[gradings.classOf[g]]; e.grading = gradings.grading[g]; }
    out.push(e);
    return true;
  });
  const total = countGenerators(comb);
  return { offset, generators: out, total: total === null ? null : total.toString(), more };
}
