/**
 * The Floer part of an analysis and of generator pages: the geometry core's floerSummary (Ozsváth–Szabó
 * 2004; Sarkar–Wang 2010) mapped onto the contract. Large generator enumerations are refused with a reason
 * (the limits below), never attempted.
 */
import {
  classesAndGradings, domainLattice, floerSummary, formatH1, generatorTable, generatorsPage, countGenerators,
  type CombinatorialDiagram,
} from '../../geometry/index.js';
import type { FloerSummary, GeneratorsPageResponse } from '../contract/diagrams.js';

export const FLOER_LIMITS = {
  /** Most generators the HF-hat computation enumerates (in the worker). */
  maxGenerators: 200_000,
  /** Most generators a generators page classifies by spin^c and grading (on request, cached). */
  maxClassifiedGenerators: 50_000,
};

export type FloerOutcome = { ok: true; summary: FloerSummary } | { ok: false; reason: string };

/** Runs floerSummary and maps it. Never throws for user data. */
export function computeFloer(comb: CombinatorialDiagram, limits = FLOER_LIMITS, onProgress?: (f: number) => void): FloerOutcome {
  if (comb.curveCount === 0) return { ok: false, reason: 'The diagram has no alpha and beta curves yet.' };
  try {
    const s = floerSummary(comb, { generatorLimit: limits.maxGenerators, onProgress });
    const count = s.generators === null ? null : BigInt(s.generators);
    const summary: FloerSummary = {
      generatorCount: s.generators,
      h1: formatH1(s.h1),
      b1: s.h1.rank,
      torsion: s.h1.torsion.map(Number),
      h1Order: s.h1.order,
      periodicDomains: s.periodicDomainBasis.map((coefficients) => ({ coefficients })),
      weaklyAdmissible: s.weaklyAdmissible,
      admissibilityWitness: s.offendingPeriodicDomain ? { coefficients: s.offendingPeriodicDomain } : null,
      nice: s.nice,
      notNiceRegions: (s.notNiceRegions ?? []).map((r) => ({ region: r.region, corners: r.corners, chi: r.chi })),
      homology: s.hfHat
        ? {
          rank: s.hfHat.rank,
          rawRank: s.hfHat.rawRank,
          bySpinc: s.hfHat.bySpinc.map((c) => ({
            spinc: c.label, generators: c.generators, rank: c.rank, rawRank: c.rawRank, gradingModulus: c.gradingModulus,
            byGrading: c.byGrading.map((g) => ({ grading: g.grading, rank: g.rawRank })),
          })),
        }
        : null,
      homologyUnavailable: s.hfHat ? null : (s.hfHatReason ?? 'not computed'),
      generatorsClassified: count !== null && count <= BigInt(limits.maxClassifiedGenerators),
      signedCount: s.signedCount ?? null,
    };
    return { ok: true, summary };
  } catch (e) {
    return { ok: false, reason: `The Floer computations stopped: ${e instanceof Error ? e.message : String(e)}` };
  }
}

interface Classified {
  k: number;
  gens: Int32Array;
  spinc: string[];
  classOf: Int32Array;
  grading: Int32Array;
}
const classifiedCache = new Map<string, Classified | null>();
const CACHE_SIZE = 8;

/** All generators with class and grading, or null past the limit / when the lattice is out of range. */
function classifyAll(cacheKey: string, comb: CombinatorialDiagram, limit: number): Classified | null {
  if (classifiedCache.has(cacheKey)) {
    const hit = classifiedCache.get(cacheKey)!;
    classifiedCache.delete(cacheKey);
    classifiedCache.set(cacheKey, hit);
    return hit;
  }
  let out: Classified | null = null;
  const count = countGenerators(comb);
  if (count !== null && count <= BigInt(limit)) {
    try {
      const table = generatorTable(comb, Number(count));
      const L = domainLattice(comb, 'z');
      const cg = classesAndGradings(L, table.gens, table.count);
      out = { k: table.k, gens: table.gens, spinc: cg.labels, classOf: cg.classOf, grading: cg.grading };
    } catch (e) {
      if (!(e instanceof RangeError)) throw e;
    }
  }
  classifiedCache.set(cacheKey, out);
  while (classifiedCache.size > CACHE_SIZE) classifiedCache.delete(classifiedCache.keys().next().value as string);
  return out;
}

/**
 * One page of generators in enumeration order, with spin^c class and relative grading when the count is
 * within maxClassifiedGenerators (computed once per revision and kept in a small LRU). O(count · k^2) the
 * first time, O(limit · k) after.
 */
export function generatorsPageFor(cacheKey: string, comb: CombinatorialDiagram, offset: number, limit: number, limits = FLOER_LIMITS): GeneratorsPageResponse {
  const all = classifyAll(cacheKey, comb, limits.maxClassifiedGenerators);
  const page = generatorsPage(comb, offset, limit);
  return {
    total: page.total ?? 'unknown',
    offset,
    limit,
    generators: page.generators.map((g, i) => {
      const idx = offset + i;
      return {
        index: idx,
        points: g.points,
        sign: g.sign,
        spinc: all ? all.spinc[all.classOf[idx]] : null,
        grading: all ? all.grading[idx] : null,
      };
    }),
  };
}
