/**
 * Analysis of a Heegaard diagram on a triangle mesh: intersection points, regions, corners, Euler
 * characteristic of each region cut open along the curves, Euler measure by the corner formula and by
 * discrete Gauss–Bonnet (REFERENCE.md; Lipshitz 2006 §4; do Carmo 1976 §4-5; Polthier & Schmies 1998).
 * Typed arrays inside; per-point and per-region plain objects out.
 */
import { fail, ok, type Problem, type Result } from '../base/result.js';
import { eulerCharacteristic } from '../mesh/tri-mesh.js';
import { angleDefects, meshAngles } from '../curvature/angles.js';
import { regionCurvature, smoothRegionCurvature, wedgeShares, type WedgeShares } from '../curvature/gauss-bonnet.js';
import { faceComponents } from './face-components.js';
import { intersectionPoints, type IntersectionPoint } from './points.js';
import { buildRegions, type RegionInfo } from './region-info.js';
import { checkCurves, type CurveCheck } from './validate.js';
import { computeWedges, type Wedges } from './wedges.js';
import type { BasepointKind, HeegaardDiagram } from './types.js';

type DiagramInput = HeegaardDiagram;

const TWO_PI = 2 * Math.PI;
/** Largest tolerated disagreement between the combinatorial and geometric Euler measures. */
export const EULER_MEASURE_TOLERANCE = 1e-9;

/** Everything derived from a valid diagram. */
export interface DiagramAnalysis {
  vertices: number;
  faces: number;
  /** χ(Σ) = V − E + F. */
  eulerCharacteristic: number;
  genus: number;
  /** k: number of alpha curves = number of beta curves. */
  curveCount: number;
  /** Basepoints in the diagram's order, with the region holding each. */
  basepoints: { kind: BasepointKind; index: number; vertex: number; region: number }[];
  points: IntersectionPoint[];
  regions: RegionInfo[];
  /** Region id of each face. */
  faceRegion: Int32Array;
  /** Per half-edge curve label: ±(c + 1) for the curve at position c of diagram.curves, 0 for none. */
  heCurve: Int32Array;
  /** Angle defect 2π − Θ_v per vertex, radians (curvature heat map). */
  vertexCurvature: Float64Array;
  /** Σ_v (2π − Θ_v) / 2π; equals χ(Σ) up to rounding. */
  totalCurvature: number;
  wedges: Wedges;
  /** Angle-proportional smooth-curvature share of every wedge (Polthier & Schmies 1998). */
  wedgeShares: WedgeShares;
  /** Σ_R e(R); equals χ(Σ) = 2 − 2g (Lipshitz 2006, additivity). */
  eulerMeasureTotal: number;
  /** Internal disagreements (e.g. the two Euler measures); empty on a healthy analysis. Never hidden. */
  defects: Problem[];
}

/** Vertices on the curves, each once, in increasing order. O(curve length log). */
function curveVertices(m: DiagramInput['mesh'], L: CurveCheck['labels']): Int32Array {
  const vs = new Int32Array(L.curveHe.length);
  let n = 0;
  for (let i = 0; i < L.curveHe.length; i++) {
    const h = L.curveHe[i], v = m.heVert[h];
    if (L.vertCurveA[v] === L.heCurve[h] - 1) vs[n++] = v; // count a crossing once, by its first curve
  }
  return vs.subarray(0, n).sort();
}

function checkDefects(a: DiagramAnalysis): void {
  for (const r of a.regions) {
    const found: string[] = [];
    if (Math.abs(r.geometricEulerMeasure - r.eulerMeasure) > EULER_MEASURE_TOLERANCE) {
      found.push(`the corner formula gives Euler measure ${r.eulerMeasure} but Gauss–Bonnet gives ${r.geometricEulerMeasure}`);
    }
    if (Math.abs(r.gaussBonnetChi - r.chi) > EULER_MEASURE_TOLERANCE) {
      found.push(`its Euler characteristic is ${r.chi} but its total curvature / 2π is ${r.gaussBonnetChi}`);
    }
    if (found.length === 0) continue;
    r.defect = found.join('; ');
    a.defects.push({ code: 'euler-measure-mismatch', message: `region R_${r.id + 1}: ${r.defect}` });
  }
  if (a.eulerMeasureTotal !== a.eulerCharacteristic) {
    a.defects.push({ code: 'euler-measure-total', message: `the Euler measures of the regions add up to ${a.eulerMeasureTotal}, not χ(Σ) = ${a.eulerCharacteristic}` });
  }
}

/**
 * Analyses a diagram: validation first (any problem gives a failed Result with every message), then
 * regions, wedges, curvature and crossings. O(F) plus O(Σ degree) at curve vertices; about 5 corner-angle
 * passes at 1M triangles.
 */
export function analyzeDiagram(d: HeegaardDiagram): Result<DiagramAnalysis> {
  const check = checkCurves(d);
  if (check.problems.length > 0) return fail(...check.problems);
  const m = d.mesh, L = check.labels;
  const comps = check.regions ?? faceComponents(m, L.heCurve, L.familyBit, 3);
  const angles = meshAngles(m);
  const curveVerts = curveVertices(m, L);
  const wedges = computeWedges(m, L.heCurve, L.familyBit, comps.label, angles.corner, curveVerts);
  const curv = regionCurvature(m, comps.label, comps.count, L.vertCurveA, angles.vertexSum, wedges);
  const shares = wedgeShares(wedges, angles.vertexSum);
  const smooth = smoothRegionCurvature(curv, wedges, shares);
  const table = intersectionPoints(d, L, comps.label);
  const basepoints = d.basepoints.map((p) => ({ kind: p.kind, index: p.index, vertex: p.vertex, region: comps.label[(m.vertHe[p.vertex] / 3) | 0] }));
  const regions = buildRegions(d, L, comps, wedges, curv, smooth, table, basepoints.map((p) => p.region));
  const defects = angleDefects(m, angles.vertexSum);
  let total = 0;
  for (let v = 0; v < m.nV; v++) total += defects[v];
  const analysis: DiagramAnalysis = {
    vertices: m.nV, faces: m.nF, eulerCharacteristic: eulerCharacteristic(m), genus: check.genus, curveCount: check.k,
    basepoints, points: table.points, regions, faceRegion: comps.label, heCurve: L.heCurve,
    vertexCurvature: defects, totalCurvature: total / TWO_PI, wedges, wedgeShares: shares,
    eulerMeasureTotal: regions.reduce((s, r) => s + r.eulerQuarters, 0) / 4, defects: [],
  };
  checkDefects(analysis);
  return ok(analysis);
}

