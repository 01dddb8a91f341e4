/**
 * Domains D = Σ a_R R as integer coefficients per region (REFERENCE.md, "Domains and the Maslov index").
 * With the binding quadrant convention of combinatorics.ts, the corner map
 *   J(D)_p = (a_NE + a_SW) - (a_NW + a_SE)
 * is the alpha-boundary's boundary at p: D goes from x to y iff J(D) = 1_x - 1_y (Ozsváth–Szabó 2004, §2.4;
 * the local form is derived in REFERENCE.md). Multiplicities n_p are kept in quarters so everything is exact:
 * 4 n_p(D) = sum of the four quadrant coefficients (Lipshitz 2006, §4), 4 e(D) = Σ a_R eulerQuarters(R).
 */
import type { CombinatorialDiagram, CombinatorialPoint } from './combinatorics.js';

/** J(D) per point. O(points) */
export function cornerMap(comb: CombinatorialDiagram, coeffs: ArrayLike<number>): Int32Array {
  const out = new Int32Array(comb.points.length);
  comb.points.forEach((p, i) => {
    const q = p.quadrants;
    out[i] = coeffs[q[0]] + coeffs[q[2]] - coeffs[q[1]] - coeffs[q[3]];
  });
  return out;
}

/** 4 n_p(D): the sum of the four quadrant coefficients at point p (Lipshitz 2006). O(1) */
export const pointQuarters = (p: CombinatorialPoint, coeffs: ArrayLike<number>): number =>
  coeffs[p.quadrants[0]] + coeffs[p.quadrants[1]] + coeffs[p.quadrants[2]] + coeffs[p.quadrants[3]];

/** 4 e(D) = Σ a_R (4 chi(R) - corners(R)) (Lipshitz 2006, §4). O(regions) */
export function eulerQuarters(comb: CombinatorialDiagram, coeffs: ArrayLike<number>): number {
  let s = 0;
  comb.regions.forEach((r, i) => { s += coeffs[i] * r.eulerQuarters; });
  return s;
}

/** 4 μ(D) for D from x to y: 4 e(D) + 4 n_x(D) + 4 n_y(D) (Lipshitz 2006, Corollary 4.3). O(regions + k) */
export function maslovQuarters(comb: CombinatorialDiagram, coeffs: ArrayLike<number>, x: ArrayLike<number>, y: ArrayLike<number>): number {
  let s = eulerQuarters(comb, coeffs);
  for (let i = 0; i < x.length; i++) s += pointQuarters(comb.points[x[i]], coeffs);
  for (let i = 0; i < y.length; i++) s += pointQuarters(comb.points[y[i]], coeffs);
  return s;
}

/** An exact rational q/4 as text: "1", "-1/2", "3/4". */
export function quartersText(q: number): string {
  if (q % 4 === 0) return String(q / 4);
  if (q % 2 === 0) return `${q / 2}/2`;
  return `${q}/4`;
}

/** n_z(D) for each basepoint: the coefficient of the region holding it. O(regions) */
export function basepointMultiplicities(comb: CombinatorialDiagram, coeffs: ArrayLike<number>): number[] {
  const out = new Array<number>(comb.basepoints.length).fill(0);
  comb.regions.forEach((r, i) => { for (const b of r.basepoints) out[b] = coeffs[i]; });
  return out;
}

/** How a user sees a point: "vertex 17 (alpha_1 ∩ beta_2)". */
export function pointName(comb: CombinatorialDiagram, i: number): string {
  const p = comb.points[i];
  return `vertex ${p.label ?? p.vertex + 1} (alpha_${p.alpha + 1} ∩ beta_${p.beta + 1})`;
}

/** Checks that a list of point indices is a generator: k points, one on each alpha and each beta. */
export function generatorProblem(comb: CombinatorialDiagram, pts: readonly number[], name: string): string | null {
  const k = comb.curveCount;
  if (pts.some((i) => !Number.isInteger(i) || i < 0 || i >= comb.points.length)) return `${name} names something that is not an intersection point`;
  if (pts.length !== k) return `${name} has ${pts.length} points but a generator has one point on each of the ${k} alpha curves`;
  return sharedCurveProblem(comb, pts, name);
}

/** Names the first alpha or beta curve that holds two of the points, or null. O(#points). */
export function sharedCurveProblem(comb: CombinatorialDiagram, pts: readonly number[], name: string): string | null {
  const a = new Set<number>(), b = new Set<number>();
  for (const i of pts) {
    const p = comb.points[i];
    if (a.has(p.alpha)) return `${name} would use two points on alpha_${p.alpha + 1}`;
    if (b.has(p.beta)) return `${name} would use two points on beta_${p.beta + 1}`;
    a.add(p.alpha); b.add(p.beta);
  }
  return null;
}

/** Orders generator points by alpha index. */
export const byAlpha = (comb: CombinatorialDiagram, pts: readonly number[]): number[] =>
  [...pts].sort((i, j) => comb.points[i].alpha - comb.points[j].alpha);
