/**
 * The Floer part of an analysis: the geometry core's floerSummary mapped onto the contract's FloerSummary.
 * Large generator enumerations are refused with a reason (the limits below), never attempted.
 */
import type { CombinatorialDiagram } from '../../geometry/index.js';
import type { FloerSummary } from '../contract/diagrams.js';

/** Limits handed to floerSummary. */
export const FLOER_LIMITS = {
  /** Most generators the homology computation enumerates. */
  maxGenerators: 200_000,
};

export type FloerOutcome = { ok: true; summary: FloerSummary } | { ok: false; reason: string };

/** Placeholder until floerSummary lands in geometry/index.ts. */
export function computeFloer(comb: CombinatorialDiagram, limits: typeof FLOER_LIMITS): FloerOutcome {
  void comb;
  void limits;
  return { ok: false, reason: 'The Floer computations are not available in this build.' };
}
