/**
 * One revision's analysis, from its stored columns to the contract's AnalysisResult: surface stats, curves,
 * basepoints, intersections, regions with both Euler measures (Lipshitz 2006 §4; discrete Gauss–Bonnet,
 * do Carmo 1976), per-face regions and per-vertex defects (compact base64), and the Floer summary
 * (Ozsváth–Szabó 2004) under the generator enumeration limit. Runs in the analysis worker thread, in the
 * seed, and in tests; no database access here.
 */
import {
  analyzeDiagram, curveName, doubleArea, toCombinatorial, vertexLabel,
  type CombinatorialDiagram, type DiagramAnalysis, type HeegaardDiagram,
} from '../../geometry/index.js';
import type { AnalysisResult, Intersection, Region, SurfaceStats } from '../contract/diagrams.js';
import { encodeFloat32Base64, encodeInt32Base64 } from '../contract/mesh-binary.js';
import { loadDiagram, type StoredRow } from '../routes/diagrams/storage.js';
import { computeFloer, FLOER_LIMITS } from './floer-adapter.js';

export type ProgressFn = (fraction: number, stage: string) => void;

export type AnalysisOutcome = { ok: true; result: AnalysisResult } | { ok: false; error: { message: string; problems: string[] } };

function surfaceStatsOf(d: HeegaardDiagram, a: DiagramAnalysis, faceArea: Float64Array): SurfaceStats {
  const m = d.mesh;
  const min: [number, number, number] = [Infinity, Infinity, Infinity];
  const max: [number, number, number] = [-Infinity, -Infinity, -Infinity];
  for (let v = 0; v < m.nV; v++) {
    if (m.vertHe[v] < 0) continue;
    for (let k = 0; k < 3; k++) {
      const x = m.pos[3 * v + k];
      if (x < min[k]) min[k] = x;
      if (x > max[k]) max[k] = x;
    }
  }
  let area = 0;
  for (let f = 0; f < m.nF; f++) area += faceArea[f];
  return {
    vertices: a.vertices, edges: (3 * a.faces) / 2, faces: a.faces, eulerCharacteristic: a.eulerCharacteristic,
    genus: a.genus, area, bbox: { min, max },
  };
}

/** Face areas. O(F). */
function faceAreas(d: HeegaardDiagram): Float64Array {
  const m = d.mesh, out = new Float64Array(m.nF);
  for (let f = 0; f < m.nF; f++) out[f] = doubleArea(m.pos, m.heVert[3 * f], m.heVert[3 * f + 1], m.heVert[3 * f + 2]) / 2;
  return out;
}

function curveLength(d: HeegaardDiagram, vertices: Int32Array): number {
  const p = d.mesh.pos;
  let len = 0;
  for (let i = 0; i < vertices.length; i++) {
    const a = vertices[i], b = vertices[(i + 1) % vertices.length];
    len += Math.hypot(p[3 * a] - p[3 * b], p[3 * a + 1] - p[3 * b + 1], p[3 * a + 2] - p[3 * b + 2]);
  }
  return len;
}

const basepointName = (b: { kind: string; index: number }) => `${b.kind}_${b.index + 1}`;

function regionsOf(a: DiagramAnalysis, faceArea: Float64Array): Region[] {
  const area = new Float64Array(a.regions.length);
  for (let f = 0; f < a.faceRegion.length; f++) area[a.faceRegion[f]] += faceArea[f];
  return a.regions.map((r) => ({
    id: r.id,
    faces: r.faces,
    area: area[r.id],
    chi: r.chi,
    convexCorners: r.convexCorners,
    reflexCorners: r.reflexCorners,
    eulerMeasure: r.eulerMeasure,
    geometricEulerMeasure: r.geometricEulerMeasure,
    curvature: { ...r.curvature },
    difference: r.geometricEulerMeasure - r.eulerMeasure,
    basepoints: r.basepoints.map((i) => basepointName(a.basepoints[i])),
    corners: r.corners.length,
  }));
}

/** Analyses a diagram (already loaded). Never throws for user data: failures become { ok: false }. */
export function analyzeForApi(d: HeegaardDiagram, progress: ProgressFn = () => undefined): AnalysisOutcome {
  progress(0.05, 'regions');
  const r = analyzeDiagram(d);
  if (!r.ok) {
    const problems = r.errors.map((e) => e.message);
    return { ok: false, error: { message: `The diagram is not valid: ${problems[0] ?? 'unknown problem'}`, problems } };
  }
  const a = r.value;
  progress(0.4, 'measures');
  const faceArea = faceAreas(d);
  const intersections: Intersection[] = a.points.map((p, id) => ({
    id, vertex: p.vertex, label: vertexLabel(d, p.vertex), alpha: p.alpha, beta: p.beta, sign: p.sign,
    quadrants: [...p.quadrants] as [number, number, number, number],
  }));
  const comb = toCombinatorial(a);
  progress(0.5, 'floer');
  const floer = computeFloer(comb, FLOER_LIMITS, (f) => progress(0.5 + 0.45 * f, 'floer'));
  progress(0.95, 'packing');
  const result: AnalysisResult = {
    stats: surfaceStatsOf(d, a, faceArea),
    curves: d.curves.map((c) => ({
      name: curveName(c), family: c.family, index: c.index, vertices: Array.from(c.vertices), length: curveLength(d, c.vertices),
    })),
    basepoints: a.basepoints.map((b) => ({ name: basepointName(b), kind: b.kind, index: b.index, vertex: b.vertex, region: b.region })),
    intersections,
    regions: regionsOf(a, faceArea),
    faceRegion: encodeInt32Base64(a.faceRegion),
    vertexDefect: encodeFloat32Base64(a.vertexCurvature),
    warnings: a.defects.map((p) => p.message),
    floer: floer.ok ? floer.summary : null,
    floerUnavailable: floer.ok ? null : floer.reason,
  };
  return { ok: true, result };
}

/** Loads stored columns and analyses them. */
export function analyzeStored(row: StoredRow, progress?: ProgressFn): AnalysisOutcome {
  return analyzeForApi(loadDiagram(row), progress);
}

/**
 * The combinatorial diagram rebuilt from a cached AnalysisResult (no geometry): what domain checks and
 * generator pages need. O(points + regions).
 */
export function combinatorialFromResult(res: AnalysisResult): CombinatorialDiagram {
  const bpIndex = new Map(res.basepoints.map((b, i) => [b.name, i]));
  return {
    genus: res.stats.genus,
    curveCount: res.curves.filter((c) => c.family === 'alpha').length,
    points: res.intersections.map((p) => ({ vertex: p.vertex, label: p.label, alpha: p.alpha, beta: p.beta, sign: p.sign, quadrants: [...p.quadrants] as [number, number, number, number] })),
    regions: res.regions.map((r) => ({
      id: r.id, chi: r.chi, corners: r.corners, eulerQuarters: Math.round(4 * r.eulerMeasure),
      basepoints: r.basepoints.map((n) => bpIndex.get(n) ?? -1).filter((i) => i >= 0),
      geometricEuler: r.geometricEulerMeasure,
    })),
    basepoints: res.basepoints.map((b) => ({ kind: b.kind, index: b.index })),
  };
}
