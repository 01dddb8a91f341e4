/**
 * One entry point for the lab and the CLI: generator count, H_1(Y), periodic domains, weak admissibility,
 * niceness and, for nice admissible diagrams of sane size, HF-hat with its spin^c splitting and relative
 * gradings. Each part cites its source in its own file.
 */
import { nonNegativePeriodic } from './admissibility-lp.js';
import type { CombinatorialDiagram } from './combinatorics.js';
import { countGenerators, forEachGenerator, generatorSign } from './generators.js';
import { hfHatNice, type SpincHomology } from './hf-hat.js';
import { firstHomology, type H1Summary } from './homology-h1.js';
import { blockedRegions, domainBetween, domainLattice, type BlockedBasepoints, type DomainLattice } from './lattice.js';
import { byAlpha, generatorProblem } from './domains.js';
import { generatorTable } from './hf-hat.js';
import { classesAndGradings } from './spinc-grading.js';
import { isNice, type NotNiceRegion } from './nice-moves.js';

export interface FloerSummaryOptions {
  /** Refuse to enumerate more generators than this (default 2,000,000). */
  generatorLimit?: number;
  /** Basepoints a domain must avoid: 'z' (HF-hat, default) or 'all' (tilde complexes of grids). */
  blocked?: BlockedBasepoints;
  /** Fraction done, for long runs. */
  onProgress?: (fraction: number) => void;
  /** Skip the chain complex (everything else is cheap). */
  skipHomology?: boolean;
}

export interface FloerSummary {
  /** Number of generators (perm N, Ryser 1963) as a decimal string; null when k is too large to count. */
  generators: string | null;
  h1: H1Summary;
  /**
   * Number of independent periodic domains avoiding the blocked basepoints: b_1(Y) when k = g; multi-pointed
   * diagrams add k - g more (e.g. row minus column annuli of a grid) [derived].
   */
  periodicDomains: number;
  /** A basis of the periodic domains in Hermite echelon form, one integer per region each. */
  periodicDomainBasis: number[][];
  /** null when undecided (elimination too large). */
  weaklyAdmissible: boolean | null;
  /** A non-zero periodic domain with all coefficients of one sign (one integer per region). */
  offendingPeriodicDomain?: number[];
  nice: boolean;
  notNiceRegions?: NotNiceRegion[];
  hfHat: { rank: number; rawRank: number; bySpinc: SpincHomology[] } | null;
  hfHatReason?: string;
  /**
   * The signed count of generators, Σ sign(x), beside det M; for a rational homology sphere with k = g also
   * |H_1(Y)|, which it must equal up to sign (Ozsváth–Szabó 2004: χ(HF-hat(Y)) = ±|H_1(Y)|). Absent when
   * there are more generators than the limit.
   */
  signedCount?: SignedCountCheck;
}

export interface SignedCountCheck {
  /** Σ over generators of sign(σ) · Π local signs, decimal. */
  value: string;
  /** det M of the algebraic intersection matrix, decimal. */
  determinant: string;
  /** |H_1(Y)| when Y is a rational homology sphere and k = g, else null. */
  h1Order: string | null;
  /** value = det M, and |value| = |H_1(Y)| when h1Order is given. */
  agrees: boolean;
}

/** Enumerates the generators once to add their signs. O(#generators · k^2). */
function signedCountCheck(comb: CombinatorialDiagram, h1: H1Summary): SignedCountCheck {
  let total = 0;
  forEachGenerator(comb, (x) => { total += generatorSign(comb, x); });
  const h1Order = comb.curveCount === comb.genus && h1.rank === 0 ? h1.order : null;
  const value = BigInt(total);
  const abs = value < 0n ? -value : value;
  const agrees = value === BigInt(h1.determinant) && (h1Order === null || abs === BigInt(h1Order));
  return { value: value.toString(), determinant: h1.determinant, h1Order, agrees };
}

/** Checks that make HF-hat meaningful for this diagram, else the reason in words. */
function hfHatObstacle(comb: CombinatorialDiagram, count: bigint | null, limit: number, admissible: boolean | null, nice: boolean, lattice: DomainLattice | null): string | null {
  const k = comb.curveCount, g = comb.genus;
  const zs = comb.basepoints.filter((b) => b.kind === 'z').length || comb.basepoints.length;
  if (zs !== k - g + 1) return `a diagram with ${k} alpha curves on a genus ${g} surface needs ${k - g + 1} basepoints, this one has ${zs}`;
  if (!lattice) return 'the domain lattice is too large for exact arithmetic in this build';
  if (admissible === false) return 'the diagram is not weakly admissible (a periodic domain has coefficients of one sign), so HF-hat is not defined from it';
  if (admissible === null) return 'weak admissibility could not be decided (too many periodic domains)';
  if (!nice) return 'the diagram is not nice (Sarkar–Wang 2010): some region without a basepoint is not a bigon or a square';
  if (count === null) return 'too many curves to count generators';
  if (count > BigInt(limit)) return `${count} generators exceed the limit of ${limit}`;
  return null;
}

/** Everything Quadrant computes about a diagram's Floer side. Cost: dominated by HF-hat, O(#generators · k^2). */
export function floerSummary(comb: CombinatorialDiagram, options: FloerSummaryOptions = {}): FloerSummary {
  const limit = options.generatorLimit ?? 2_000_000;
  const blocked = options.blocked ?? 'z';
  const count = countGenerators(comb);
  const h1 = firstHomology(comb);
  let lattice: DomainLattice | null = null;
  try { lattice = domainLattice(comb, blocked); } catch (e) { if (!(e instanceof RangeError)) throw e; }
  const periodicDomains = lattice ? lattice.periodic.length : 0;
  let weaklyAdmissible: boolean | null = null;
  let offending: number[] | undefined;
  if (lattice) {
    const w = nonNegativePeriodic(lattice.periodic);
    weaklyAdmissible = w === 'undecided' ? null : w === null;
    if (w instanceof Int32Array) offending = Array.from(w);
  }
  const niceR = isNice(comb, blockedRegions(comb, blocked));
  const out: FloerSummary = {
    generators: count === null ? null : count.toString(), h1, periodicDomains,
    periodicDomainBasis: lattice ? lattice.periodic.map((p) => Array.from(p)) : [], weaklyAdmissible,
    nice: niceR.nice, hfHat: null,
  };
  if (offending) out.offendingPeriodicDomain = offending;
  if (!niceR.nice) out.notNiceRegions = niceR.notNiceRegions;
  if (count !== null && count <= BigInt(limit)) out.signedCount = signedCountCheck(comb, h1);
  const obstacle = options.skipHomology ? 'not requested' : hfHatObstacle(comb, count, limit, weaklyAdmissible, niceR.nice, lattice);
  if (obstacle) { out.hfHatReason = obstacle; return out; }
  try {
    const r = hfHatNice(comb, Number(count), { blocked, onProgress: options.onProgress, lattice: lattice! });
    out.hfHat = { rank: r.rank, rawRank: r.rawRank, bySpinc: r.bySpinc };
  } catch (e) {
    if (!(e instanceof RangeError)) throw e;
    out.hfHatReason = `exact arithmetic outgrew this build: ${e.message}`;
  }
  return out;
}

/**
 * The Floer fields of a user-facing analysis report (`quadrant analyze --json`): region numbers 1-based
 * (R_1, ...), per-generator data left out. Same cost as floerSummary.
 */
export function floerReportFields(comb: CombinatorialDiagram, options: FloerSummaryOptions = {}): Record<string, unknown> {
  const s = floerSummary(comb, { generatorLimit: 200_000, ...options });
  return {
    generators: s.generators,
    h1: s.h1,
    periodicDomains: s.periodicDomains,
    periodicDomainBasis: s.periodicDomainBasis,
    weaklyAdmissible: s.weaklyAdmissible,
    ...(s.offendingPeriodicDomain ? { offendingPeriodicDomain: s.offendingPeriodicDomain } : {}),
    nice: s.nice,
    ...(s.notNiceRegions ? { notNiceRegions: s.notNiceRegions.map((r) => ({ ...r, region: r.region + 1 })) } : {}),
    hfHat: s.hfHat,
    ...(s.signedCount ? { signedCount: s.signedCount } : {}),
    ...(s.hfHatReason ? { hfHatReason: s.hfHatReason } : {}),
  };
}

/** Spin^c class and relative grading of every generator, consistent with floerSummary's bySpinc. */
export interface GeneratorGradings {
  classOf: Int32Array;
  grading: Int32Array;
  labels: string[];
  modulus: number[];
}

/**
 * Classes (Ozsváth–Szabó 2004, §2.6) and relative Maslov gradings of all generators, indexed in enumeration
 * order; null with a reason when there are more than `generatorLimit` generators or exact arithmetic outgrows
 * doubles. O(#generators · k (k + #obstructions)).
 */
export function generatorGradings(comb: CombinatorialDiagram, options: FloerSummaryOptions = {}): GeneratorGradings | { reason: string } {
  const limit = options.generatorLimit ?? 2_000_000;
  const count = countGenerators(comb);
  if (count === null || count > BigInt(limit)) return { reason: `${count ?? 'too many'} generators exceed the limit of ${limit}` };
  try {
    const L = domainLattice(comb, options.blocked ?? 'z');
    const T = generatorTable(comb, Number(count));
    const CG = classesAndGradings(L, T.gens, T.count);
    return { classOf: CG.classOf, grading: CG.grading, labels: CG.labels, modulus: CG.modulus };
  } catch (e) {
    if (e instanceof RangeError) return { reason: `exact arithmetic outgrew this build: ${e.message}` };
    throw e;
  }
}

/** A domain from x to y with n_z = 0 (one integer per region), or the reason there is none. O(R k) after the lattice. */
export function findDomain(comb: CombinatorialDiagram, x: number[], y: number[], blocked: BlockedBasepoints = 'z'): { domain: number[] } | { reason: string } {
  for (const [g, name] of [[x, 'x'], [y, 'y']] as const) {
    const p = generatorProblem(comb, g, name);
    if (p) return { reason: p };
  }
  let L: DomainLattice;
  try { L = domainLattice(comb, blocked); } catch { return { reason: 'the domain lattice is too large for exact arithmetic in this build' }; }
  const d = domainBetween(L, byAlpha(comb, x), byAlpha(comb, y));
  if (!d) return { reason: 'x and y lie in different spin^c classes: no domain from x to y avoids the basepoints' };
  return { domain: Array.from(d) };
}
