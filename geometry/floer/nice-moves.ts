/**
 * Nice diagrams and the local moves of their differential (Sarkar–Wang 2010, Theorem 3.3 and §3): in a nice
 * diagram the positive index-1 domains with n_z = 0 are exactly the embedded bigons and rectangles, each
 * counted once mod 2. A bigon moves one generator point along its alpha and beta curve; a rectangle swaps the
 * beta curves of two points. For every such candidate move (independent of the rest of x) we list the domains
 * D0 + Σ c_k P_k with coefficients in {0, 1} (lattice.ts) and store how the other points of x change μ:
 *   4μ = 4e(D) + 4n_moved(D) + 2 Σ_{p in x, fixed} 4n_p(D)     (Lipshitz 2006, μ = e + n_x + n_y),
 * so the hot loop only checks the fixed points where D has positive multiplicity (μ = 1 forces them out of x
 * unless the move's own part is below 1). Embedded domains are positive, so nothing is lost by {0, 1}.
 */
import type { CombinatorialDiagram } from './combinatorics.js';
import { pointQuarters } from './domains.js';
import { particularDomain, zeroOneDomains, type DomainLattice } from './lattice.js';

/** One region that makes a diagram not nice. */
export interface NotNiceRegion {
  /** Region id (0-based index into comb.regions). */
  region: number;
  corners: number;
  chi: number;
}

/**
 * Sarkar–Wang 2010, Definition 3.1: nice when every region without a (blocked) basepoint is a bigon or a square,
 * i.e. a disk (chi = 1) with 2 or 4 corners. O(regions)
 */
export function isNice(comb: CombinatorialDiagram, blockedRegion?: Uint8Array): { nice: boolean; notNiceRegions: NotNiceRegion[] } {
  const bad: NotNiceRegion[] = [];
  comb.regions.forEach((r, i) => {
    const blocked = blockedRegion ? blockedRegion[i] === 1 : r.basepoints.length > 0;
    if (blocked) return;
    if (r.chi !== 1 || (r.corners !== 2 && r.corners !== 4)) bad.push({ region: i, corners: r.corners, chi: r.chi });
  });
  return { nice: bad.length === 0, notNiceRegions: bad };
}

/**
 * Moves in compressed form. Key of a rectangle move from points (a, c), alpha(a) < alpha(c): a*P + c; key of a
 * bigon move from point a: P*P + a. Moves of key K are start[K] .. start[K+1].
 */
export interface MoveTable {
  start: Int32Array;
  /** Change of the generator code x -> y. */
  delta: Float64Array;
  /** 4 (e(D) + n at the moved points of x and y). */
  mu0: Int32Array;
  /** Fixed points with positive multiplicity: fixPt[fixStart[m] .. fixStart[m+1]), with 4n_p in fixQ. */
  fixStart: Int32Array;
  fixPt: Int32Array;
  fixQ: Int32Array;
  count: number;
}

interface RawMove { key: number; delta: number; mu0: number; fix: number[] }

/** Euler quarters plus the quarters at the moved points; the fixed points with positive n_p. */
function describe(comb: CombinatorialDiagram, d: Int32Array, moved: number[], key: number, delta: number): RawMove | null {
  let mu0 = 0;
  comb.regions.forEach((r, i) => { mu0 += d[i] * r.eulerQuarters; });
  for (const p of moved) mu0 += pointQuarters(comb.points[p], d);
  if (mu0 > 4) return null; // fixed points only add (D is positive)
  const fix: number[] = [];
  comb.points.forEach((p, i) => {
    if (moved.includes(i)) return;
    const q = pointQuarters(p, d);
    if (q > 0) fix.push(i, q);
  });
  return { key, delta, mu0, fix };
}

/**
 * All bigon and rectangle candidate moves with their {0,1} domains (Sarkar–Wang 2010). rankOf/radix give the
 * generator code (see hf-hat.ts). O(P^2 · targets · (R + 2^b R)).
 */
export function buildMoves(L: DomainLattice, rankOf: Int32Array, radix: Float64Array): MoveTable {
  const comb = L.comb;
  const P = comb.points.length;
  const pts = comb.points;
  const raw: RawMove[] = [];
  const onAB = new Map<number, number[]>();
  pts.forEach((p, i) => { const key = p.alpha * comb.curveCount + p.beta; (onAB.get(key) ?? onAB.set(key, []).get(key)!).push(i); });
  const at = (a: number, b: number) => onAB.get(a * comb.curveCount + b) ?? [];
  const codeOf = (p: number) => rankOf[p] * radix[pts[p].alpha];
  const tryMove = (from: number[], to: number[], key: number) => {
    const d0 = particularDomain(L, [...from, ...to], [...from.map(() => 1), ...to.map(() => -1)]);
    if (!d0) return;
    const delta = to.reduce((s, p) => s + codeOf(p), 0) - from.reduce((s, p) => s + codeOf(p), 0);
    zeroOneDomains(L, d0, (d) => {
      for (let r = 0; r < d.length; r++) if (d[r] !== 0 && L.blockedRegion[r]) return;
      const m = describe(comb, d, [...from, ...to], key, delta);
      if (m) raw.push(m);
    });
  };
  for (let a = 0; a < P; a++) {
    for (const a2 of at(pts[a].alpha, pts[a].beta)) if (a2 !== a) tryMove([a], [a2], P * P + a);
    for (let c = 0; c < P; c++) {
      if (pts[c].alpha <= pts[a].alpha || pts[c].beta === pts[a].beta) continue;
      for (const a2 of at(pts[a].alpha, pts[c].beta)) for (const c2 of at(pts[c].alpha, pts[a].beta)) tryMove([a, c], [a2, c2], a * P + c);
    }
  }
  return packMoves(raw, P * P + P);
}

function packMoves(raw: RawMove[], keys: number): MoveTable {
  raw.sort((m, n) => m.key - n.key);
  const start = new Int32Array(keys + 1);
  for (const m of raw) start[m.key + 1]++;
  for (let i = 0; i < keys; i++) start[i + 1] += start[i];
  const fixStart = new Int32Array(raw.length + 1);
  raw.forEach((m, i) => { fixStart[i + 1] = fixStart[i] + m.fix.length / 2; });
  const fixPt = new Int32Array(fixStart[raw.length]), fixQ = new Int32Array(fixStart[raw.length]);
  raw.forEach((m, i) => { for (let t = 0; t < m.fix.length; t += 2) { fixPt[fixStart[i] + t / 2] = m.fix[t]; fixQ[fixStart[i] + t / 2] = m.fix[t + 1]; } });
  return {
    start, delta: Float64Array.from(raw, (m) => m.delta), mu0: Int32Array.from(raw, (m) => m.mu0),
    fixStart, fixPt, fixQ, count: raw.length,
  };
}
