/**
 * Deciding whether a 2-chain is a domain from x to y, and measuring it (Ozsváth–Szabó 2004, §2.4: D in
 * π_2(x, y) iff ∂(∂D ∩ α) = y - x and ∂(∂D ∩ β) = x - y; Lipshitz 2006, §4 for the Maslov index
 * μ = e(D) + n_x(D) + n_y(D)). The corner map J (domains.ts) gives ∂(∂D ∩ α) = -J(D) pointwise, so D goes
 * from x to y iff J(D) = 1_x - 1_y; the sums of J over one curve vanish automatically.
 */
import type { CombinatorialDiagram } from './combinatorics.js';
import {
  basepointMultiplicities, byAlpha, cornerMap, eulerQuarters, generatorProblem, maslovQuarters, pointName, sharedCurveProblem,
  pointQuarters, quartersText,
} from './domains.js';

/** Result of checkDomain; rationals are exact text ("1/2"). */
export interface DomainCheck {
  isDomain: boolean;
  /** Generator x (point indices by alpha) when known. */
  from: number[] | null;
  to: number[] | null;
  /** Why it is not a domain, or why x and y are not determined; null when all is well. */
  reason: string | null;
  /** Curves whose generator points the boundary does not determine (0-based), when from/to are missing. */
  undetermined?: { alphas: number[]; betas: number[] };
  /** Corner map J(D) per point. */
  corners: number[];
  /**
   * ∂D split along the curves: multiplicity of ∂D on the alpha arc leaving each point in alpha's direction
   * (a_NE - a_SE: the region on the left minus the one on the right), and likewise on the beta arc leaving it
   * (a_NW - a_NE when beta runs north, a_SE - a_SW when it runs south). The arc entering p carries the
   * previous point's value, so ∂(∂D ∩ α) at p = in - out = -J(p).
   */
  alphaArcs: number[];
  betaArcs: number[];
  eulerMeasure: string;
  eulerQuarters: number;
  /** Σ a_R · (measured Euler measure of R) when the regions carry one, else null. */
  geometricEulerMeasure: number | null;
  nx: string | null;
  ny: string | null;
  /** n_z(D) per basepoint (all kinds, in the order of comb.basepoints). */
  nz: number[];
  maslovIndex: string | null;
  positive: boolean;
}

export interface DomainEnds {
  from?: number[];
  to?: number[];
}

/** Multiplicities of ∂D on the arcs leaving each point along alpha and along beta. O(points) */
function arcMultiplicities(comb: CombinatorialDiagram, a: ArrayLike<number>): { alphaArcs: number[]; betaArcs: number[] } {
  const alphaArcs = comb.points.map((p) => a[p.quadrants[0]] - a[p.quadrants[3]]);
  const betaArcs = comb.points.map((p) => (p.sign > 0 ? a[p.quadrants[1]] - a[p.quadrants[0]] : a[p.quadrants[3]] - a[p.quadrants[2]]));
  return { alphaArcs, betaArcs };
}

/** Completions of the free curves by points with J = 0, stopping after two. O(matchings visited) */
function completions(comb: CombinatorialDiagram, J: Int32Array, fixed: number[]): number[][] {
  const k = comb.curveCount;
  const usedA = new Uint8Array(k), usedB = new Uint8Array(k);
  for (const i of fixed) { usedA[comb.points[i].alpha] = 1; usedB[comb.points[i].beta] = 1; }
  const freeA = [...Array(k).keys()].filter((a) => !usedA[a]);
  const cands = freeA.map((a) => comb.points.map((_, i) => i).filter((i) => comb.points[i].alpha === a && J[i] === 0));
  const found: number[][] = [];
  const cur: number[] = [];
  const dfs = (t: number): void => {
    if (found.length >= 2) return;
    if (t === freeA.length) { found.push([...cur]); return; }
    for (const i of cands[t]) {
      const b = comb.points[i].beta;
      if (usedB[b]) continue;
      usedB[b] = 1; cur.push(i); dfs(t + 1); cur.pop(); usedB[b] = 0;
    }
  };
  dfs(0);
  return found;
}

/** The corner sets' own problems: multiplicities beyond ±1 and two corners on one curve. */
function cornerProblem(comb: CombinatorialDiagram, J: Int32Array, plus: number[], minus: number[]): string | null {
  for (let i = 0; i < J.length; i++) {
    if (Math.abs(J[i]) > 1) return `the boundary turns ${J[i]} times at ${pointName(comb, i)}; a domain from x to y has corner count -1, 0 or 1 there`;
  }
  return sharedCurveProblem(comb, plus, 'x') ?? sharedCurveProblem(comb, minus, 'y');
}

/** Finds x and y from the corners and the given ends; returns [x, y] or a reason. */
function resolveEnds(comb: CombinatorialDiagram, J: Int32Array, plus: number[], minus: number[], ends: DomainEnds):
  { x: number[]; y: number[] } | { reason: string; undetermined?: { alphas: number[]; betas: number[] } } {
  const setOf = (a: number[]) => new Set(a);
  const derive = (given: number[], name: 'from' | 'to', add: number[], remove: number[]): { reason: string } | { other: number[] } => {
    const prob = generatorProblem(comb, given, name === 'from' ? 'x' : 'y');
    if (prob) return { reason: prob };
    const g = setOf(given);
    const miss = remove.find((i) => !g.has(i));
    if (miss !== undefined) return { reason: `the boundary has a corner at ${pointName(comb, miss)}, which is not in ${name === 'from' ? 'x' : 'y'}` };
    const extra = add.find((i) => g.has(i));
    if (extra !== undefined) return { reason: `${pointName(comb, extra)} is in ${name === 'from' ? 'x' : 'y'} but the boundary says it belongs to only ${name === 'from' ? 'y' : 'x'}` };
    return { other: byAlpha(comb, [...given.filter((i) => !remove.includes(i)), ...add]) };
  };
  if (ends.from) {
    const r = derive(ends.from, 'from', minus, plus);
    if ('reason' in r) return r;
    const x = byAlpha(comb, ends.from), y = r.other;
    if (ends.to && byAlpha(comb, ends.to).join() !== y.join()) return { reason: 'the boundary of this chain goes from x to a different generator than the one given as y' };
    return { x, y };
  }
  if (ends.to) {
    const r = derive(ends.to, 'to', plus, minus);
    if ('reason' in r) return r;
    return { x: r.other, y: byAlpha(comb, ends.to) };
  }
  const comps = completions(comb, J, plus);
  if (comps.length === 0) return { reason: 'the corners cannot be completed to generators: the alpha boundary ends at a point that is not in any generator' };
  if (comps.length === 1) return { x: byAlpha(comb, [...plus, ...comps[0]]), y: byAlpha(comb, [...minus, ...comps[0]]) };
  const usedA = new Set(plus.map((i) => comb.points[i].alpha)), usedB = new Set(plus.map((i) => comb.points[i].beta));
  const k = comb.curveCount;
  const alphas = [...Array(k).keys()].filter((a) => !usedA.has(a)), betas = [...Array(k).keys()].filter((b) => !usedB.has(b));
  return {
    reason: `the boundary does not determine the generator points on ${alphas.map((a) => `alpha_${a + 1}`).join(', ')} (whole curves in the boundary or no corners there); give from and to`,
    undetermined: { alphas, betas },
  };
}

/**
 * Decides whether `coeffs` (one integer per region) is a domain from x to y (Ozsváth–Szabó 2004), finds x and y
 * from its corners or checks the given ones, and measures e, n_x, n_y, n_z, μ (Lipshitz 2006). O(points + regions).
 */
export function checkDomain(comb: CombinatorialDiagram, coeffs: ArrayLike<number>, ends: DomainEnds = {}): DomainCheck {
  const R = comb.regions.length;
  const base = {
    from: null, to: null, corners: [] as number[], alphaArcs: [] as number[], betaArcs: [] as number[], eulerMeasure: '0', eulerQuarters: 0, geometricEulerMeasure: null,
    nx: null, ny: null, nz: [] as number[], maslovIndex: null, positive: false,
  };
  if (coeffs.length !== R) return { ...base, isDomain: false, reason: `expected ${R} region coefficients, got ${coeffs.length}` };
  for (let i = 0; i < R; i++) if (!Number.isSafeInteger(coeffs[i])) return { ...base, isDomain: false, reason: `the coefficient of region ${i + 1} is not an integer` };
  const J = cornerMap(comb, coeffs);
  const eq = eulerQuarters(comb, coeffs);
  const geo = comb.regions.every((r) => r.geometricEuler !== undefined)
    ? comb.regions.reduce((s, r, i) => s + coeffs[i] * (r.geometricEuler as number), 0) : null;
  let positive = true;
  for (let i = 0; i < R; i++) if (coeffs[i] < 0) positive = false;
  const common = {
    corners: Array.from(J), ...arcMultiplicities(comb, coeffs), eulerMeasure: quartersText(eq), eulerQuarters: eq, geometricEulerMeasure: geo,
    nz: basepointMultiplicities(comb, coeffs), positive,
  };
  const plus: number[] = [], minus: number[] = [];
  J.forEach((v, i) => { if (v === 1) plus.push(i); else if (v === -1) minus.push(i); });
  const problem = cornerProblem(comb, J, plus, minus);
  if (problem) return { ...common, from: null, to: null, nx: null, ny: null, maslovIndex: null, isDomain: false, reason: problem };
  const ends2 = resolveEnds(comb, J, plus, minus, ends);
  if ('reason' in ends2) {
    const isDomain = ends2.undetermined !== undefined;
    return { ...common, from: null, to: null, nx: null, ny: null, maslovIndex: null, isDomain, reason: ends2.reason, undetermined: ends2.undetermined };
  }
  const { x, y } = ends2;
  const yProb = generatorProblem(comb, y, 'y') ?? generatorProblem(comb, x, 'x');
  if (yProb) return { ...common, from: x, to: y, nx: null, ny: null, maslovIndex: null, isDomain: false, reason: yProb };
  const nxq = x.reduce((s, i) => s + pointQuarters(comb.points[i], coeffs), 0);
  const nyq = y.reduce((s, i) => s + pointQuarters(comb.points[i], coeffs), 0);
  return {
    ...common, isDomain: true, reason: null, from: x, to: y, nx: quartersText(nxq), ny: quartersText(nyq),
    maslovIndex: quartersText(maslovQuarters(comb, coeffs, x, y)),
  };
}
