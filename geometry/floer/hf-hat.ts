/**
 * HF-hat of a nice diagram over F2 (Sarkar–Wang 2010): generators enumerated into typed arrays, the differential
 * from the precomputed bigon/rectangle moves (nice-moves.ts), homology by sparse F2 column reduction per
 * (spin^c class, grading) block (algebra/f2.ts). A multi-pointed diagram (k curves, k - g + 1 basepoints)
 * computes HF-hat(Y) ⊗ V^{k-g} with V of rank 2 (Manolescu–Ozsváth–Sarkar 2009, §2; Ozsváth–Szabó 2008).
 * Hot loop: per generator, the C(k,2) pairs of its points index the move table; no objects, no BigInt.
 */
import { reduceF2, sparseF2FromPairs } from '../algebra/f2.js';
import type { CombinatorialDiagram } from './combinatorics.js';
import { curveIncidence, forEachGenerator } from './generators.js';
import { domainLattice, type BlockedBasepoints, type DomainLattice } from './lattice.js';
import { buildMoves, type MoveTable } from './nice-moves.js';
import { classesAndGradings, type ClassesAndGradings } from './spinc-grading.js';

/** All generators of a diagram in typed arrays, with codes ascending in enumeration order. */
export interface GeneratorTable {
  k: number;
  count: number;
  /** Row-major count x k: gens[g*k + i] is the point of generator g on alpha_i. */
  gens: Int32Array;
  /** Mixed-radix code (alpha_1 most significant), strictly increasing. */
  codes: Float64Array;
  rankOf: Int32Array;
  radix: Float64Array;
}

/** Enumerates all generators into typed arrays (count must be known: perm N). O(count · k) */
export function generatorTable(comb: CombinatorialDiagram, count: number): GeneratorTable {
  const { k, pointsOnAlpha } = curveIncidence(comb);
  const rankOf = new Int32Array(comb.points.length);
  pointsOnAlpha.forEach((l) => l.forEach((p, r) => { rankOf[p] = r; }));
  const radix = new Float64Array(k);
  let m = 1;
  for (let i = k - 1; i >= 0; i--) { radix[i] = m; m *= Math.max(1, pointsOnAlpha[i].length); }
  if (m > 2 ** 53) throw new RangeError('generator codes exceed 2^53');
  const gens = new Int32Array(count * k), codes = new Float64Array(count);
  let g = 0;
  forEachGenerator(comb, (x) => {
    let c = 0;
    for (let i = 0; i < k; i++) { gens[g * k + i] = x[i]; c += rankOf[x[i]] * radix[i]; }
    codes[g++] = c;
  });
  return { k, count: g, gens, codes, rankOf, radix };
}

/**
 * Open-addressing hash from generator code to index (linear probing, load <= 1/2). Codes are integers below
 * 2^53; the hash mixes their low and high 32-bit halves. O(1) expected per lookup.
 */
export class CodeIndex {
  private keys: Float64Array;
  private vals: Int32Array;
  private mask: number;
  constructor(codes: Float64Array, n: number) {
    let cap = 16;
    while (cap < 2 * n) cap *= 2;
    this.mask = cap - 1;
    this.keys = new Float64Array(cap).fill(-1);
    this.vals = new Int32Array(cap);
    for (let i = 0; i < n; i++) {
      let h = this.slot(codes[i]);
      while (this.keys[h] >= 0) h = (h + 1) & this.mask;
      this.keys[h] = codes[i]; this.vals[h] = i;
    }
  }
  private slot(c: number): number {
    const lo = c >>> 0, hi = (c / 4294967296) >>> 0;
    return (Math.imul(lo ^ Math.imul(hi, 0x85ebca6b), 0x9e3779b1) >>> 0) & this.mask;
  }
  /** Index of code c, or -1. */
  get(c: number): number {
    let h = this.slot(c);
    for (;;) {
      const k = this.keys[h];
      if (k === c) return this.vals[h];
      if (k < 0) return -1;
      h = (h + 1) & this.mask;
    }
  }
}

/** Growable pair of Int32 columns. */
class EdgeList {
  src = new Int32Array(1024); tgt = new Int32Array(1024); n = 0;
  push(s: number, t: number): void {
    if (this.n === this.src.length) {
      const a = new Int32Array(this.n * 2), b = new Int32Array(this.n * 2);
      a.set(this.src); b.set(this.tgt); this.src = a; this.tgt = b;
    }
    this.src[this.n] = s; this.tgt[this.n++] = t;
  }
}

/** The differential as (source, target) pairs, repeated pairs to be cancelled mod 2. O(count · k^2 · moves) */
export function differentialEdges(T: GeneratorTable, M: MoveTable, P: number, alphaOf: Int32Array, onProgress?: (f: number) => void): EdgeList {
  const { k, count, gens, codes } = T;
  const edges = new EdgeList();
  const index = new CodeIndex(codes, count);
  const PP = P * P;
  const every = Math.max(1, count >> 5);
  const emit = (g: number, x: Int32Array, key: number) => {
    for (let m = M.start[key], e = M.start[key + 1]; m < e; m++) {
      let q = M.mu0[m];
      for (let f = M.fixStart[m], fe = M.fixStart[m + 1]; f < fe; f++) {
        const p = M.fixPt[f];
        if (x[alphaOf[p]] === p) q += 2 * M.fixQ[f];
      }
      if (q !== 4) continue;
      const y = index.get(codes[g] + M.delta[m]);
      if (y >= 0) edges.push(g, y);
    }
  };
  for (let g = 0; g < count; g++) {
    const x = gens.subarray(g * k, g * k + k);
    for (let i = 0; i < k; i++) {
      const a = x[i];
      if (M.start[PP + a] !== M.start[PP + a + 1]) emit(g, x, PP + a);
      const row = a * P;
      for (let j = i + 1; j < k; j++) {
        const key = row + x[j];
        if (M.start[key] !== M.start[key + 1]) emit(g, x, key);
      }
    }
    if (onProgress && g % every === 0) onProgress(g / count);
  }
  return edges;
}

/** Homology of one spin^c class: ranks by relative grading. */
export interface SpincHomology {
  /** Class id (0-based, in order of first generator). */
  spinc: number;
  /** ε(first generator of this class, generator 0) in Smith coordinates: "0", "(2 mod 5)", ... */
  label: string;
  /** Index of the class's first generator in enumeration order. */
  root: number;
  generators: number;
  /** Rank of the complex's homology (HF-hat ⊗ V^{k-g} when multi-pointed). */
  rawRank: number;
  /** rawRank / 2^{k-g} when that is an integer; null otherwise (e.g. knot grids, where V shifts the class). */
  rank: number | null;
  /** 0 for an integer (torsion) grading; otherwise gradings are mod this number. */
  gradingModulus: number;
  /** Raw ranks by relative grading (lowest generator grading 0), non-zero entries only, ascending. */
  byGrading: { grading: number; rawRank: number }[];
}

export interface HfHatResult {
  rawRank: number;
  rank: number;
  generators: number;
  differentialEntries: number;
  bySpinc: SpincHomology[];
}

export interface HfHatOptions {
  blocked?: BlockedBasepoints;
  onProgress?: (fraction: number) => void;
  /** Reuse a lattice built elsewhere. */
  lattice?: DomainLattice;
}

/**
 * HF-hat of a nice diagram with `count` generators (Sarkar–Wang 2010). Precondition: isNice; weak admissibility
 * holds automatically for nice diagrams is NOT assumed — callers check it. O(count · k^2 + Σ block reductions).
 */
export function hfHatNice(comb: CombinatorialDiagram, count: number, opts: HfHatOptions = {}): HfHatResult {
  const progress = opts.onProgress ?? (() => {});
  const L = opts.lattice ?? domainLattice(comb, opts.blocked ?? 'z');
  const T = generatorTable(comb, count);
  progress(0.1);
  const M = buildMoves(L, T.rankOf, T.radix);
  const alphaOf = Int32Array.from(comb.points, (p) => p.alpha);
  const E = differentialEdges(T, M, comb.points.length, alphaOf, (f) => progress(0.1 + 0.3 * f));
  const CG = classesAndGradings(L, T.gens, T.count);
  progress(0.45);
  const bySpinc = blockHomology(T.count, E, CG, comb.curveCount - comb.genus, (f) => progress(0.45 + 0.55 * f));
  progress(1);
  const rawRank = bySpinc.reduce((s, c) => s + c.rawRank, 0);
  return { rawRank, rank: rawRank / 2 ** (comb.curveCount - comb.genus), generators: T.count, differentialEntries: E.n, bySpinc };
}

/** Ranks per (class, grading) block: rank H_B = |B| - rank ∂|_B - rank ∂|_{B+1}. */
function blockHomology(n: number, E: EdgeList, CG: ClassesAndGradings, extra: number, progress: (f: number) => void): SpincHomology[] {
  const nc = CG.roots.length;
  const minG = new Array<number>(nc).fill(Infinity), maxG = new Array<number>(nc).fill(-Infinity);
  for (let g = 0; g < n; g++) { const c = CG.classOf[g]; minG[c] = Math.min(minG[c], CG.grading[g]); maxG[c] = Math.max(maxG[c], CG.grading[g]); }
  const base: number[] = [];
  let nb = 0;
  for (let c = 0; c < nc; c++) { base.push(nb); nb += maxG[c] - minG[c] + 1; }
  const blockOf = new Int32Array(n), local = new Int32Array(n), size = new Int32Array(nb);
  for (let g = 0; g < n; g++) { const b = base[CG.classOf[g]] + CG.grading[g] - minG[CG.classOf[g]]; blockOf[g] = b; local[g] = size[b]++; }
  // Edges grouped by source block (counting sort).
  const eStart = new Int32Array(nb + 1);
  for (let e = 0; e < E.n; e++) eStart[blockOf[E.src[e]] + 1]++;
  for (let b = 0; b < nb; b++) eStart[b + 1] += eStart[b];
  const fill = eStart.slice(0, nb), rows = new Int32Array(E.n), cols = new Int32Array(E.n);
  const target = new Int32Array(nb).fill(-1);
  for (let e = 0; e < E.n; e++) {
    const b = blockOf[E.src[e]], t = blockOf[E.tgt[e]];
    if (target[b] >= 0 && target[b] !== t) throw new Error('differential does not map one grading block to one');
    target[b] = t;
    rows[fill[b]] = local[E.tgt[e]]; cols[fill[b]++] = local[E.src[e]];
  }
  const rankOut = new Float64Array(nb), rankIn = new Float64Array(nb);
  // Members of each block in generator order (local index order), for clearing (Chen–Kerber 2011).
  const memStart = new Int32Array(nb + 1);
  for (let b = 0; b < nb; b++) memStart[b + 1] = memStart[b] + size[b];
  const members = new Int32Array(n);
  for (let g = 0; g < n; g++) members[memStart[blockOf[g]] + local[g]] = g;
  const cleared = new Uint8Array(n);
  let done = 0;
  for (let c = 0; c < nc; c++) {
    const clearing = CG.modulus[c] === 0;
    for (let gr = maxG[c]; gr >= minG[c]; gr--) {
      const b = base[c] + gr - minG[c];
      if (target[b] < 0) continue;
      const s = eStart[b], e = eStart[b + 1], t = target[b];
      let skipLocal: Uint8Array | null = null;
      if (clearing) {
        skipLocal = new Uint8Array(size[b]);
        for (let i = 0; i < size[b]; i++) skipLocal[i] = cleared[members[memStart[b] + i]];
      }
      const red = reduceF2(sparseF2FromPairs(size[t], size[b], rows.subarray(s, e), cols.subarray(s, e)), skipLocal);
      if (clearing) for (const r of red.pivotRows) cleared[members[memStart[t] + r]] = 1;
      rankOut[b] = red.rank; rankIn[t] += red.rank;
      done += e - s;
      progress(done / Math.max(1, E.n));
    }
  }
  return CG.roots.map((root, c) => {
    const byGrading: { grading: number; rawRank: number }[] = [];
    let raw = 0, gens = 0;
    for (let gr = minG[c]; gr <= maxG[c]; gr++) {
      const b = base[c] + gr - minG[c];
      gens += size[b];
      const h = size[b] - rankOut[b] - rankIn[b];
      if (h > 0) byGrading.push({ grading: gr, rawRank: h });
      raw += h;
    }
    return { spinc: c, label: CG.labels[c], root, generators: gens, rawRank: raw, rank: raw % 2 ** extra === 0 ? raw / 2 ** extra : null, gradingModulus: CG.modulus[c], byGrading };
  });
}
