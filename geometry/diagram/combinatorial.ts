/**
 * The combinatorial shadow of an analysed diagram, exactly as geometry/floer/combinatorics.ts specifies:
 * points with sign and quadrant regions (NE, NW, SW, SE counter-clockwise from alpha's own direction),
 * regions with χ, corner count and 4e(R), and basepoints. Pure data; O(points + regions).
 */
import type { CombinatorialDiagram } from '../floer/combinatorics.js';
import type { DiagramAnalysis } from './analyze.js';

/** Strips the geometry from an analysis, keeping what the Floer computations need. */
export function toCombinatorial(a: DiagramAnalysis): CombinatorialDiagram {
  return {
    genus: a.genus,
    curveCount: a.curveCount,
    points: a.points.map((p) => ({ vertex: p.vertex, label: p.label, alpha: p.alpha, beta: p.beta, sign: p.sign, quadrants: [...p.quadrants] as [number, number, number, number] })),
    regions: a.regions.map((r) => ({ id: r.id, chi: r.chi, corners: r.corners.length, eulerQuarters: r.eulerQuarters, basepoints: [...r.basepoints], geometricEuler: r.geometricEulerMeasure })),
    basepoints: a.basepoints.map((b) => ({ kind: b.kind, index: b.index })),
  };
}
