/**
 * The analysis report of a diagram as one plain JSON-ready object: what `quadrant analyze --json`
 * prints. Pure (no I/O). Users see 1-based numbers: curves alpha_1.., regions R_1.., intersection points
 * x_1.., vertices as numbered in their file. Curvature values are divided by 2π.
 *
 * Other areas add fields with one line in REPORT_SECTIONS (e.g. generators, h1, periodicDomains).
 */
import {
  analyzeDiagram, curveName, floerReportFields, toCombinatorial, vertexLabel,
  type CombinatorialDiagram, type DiagramAnalysis, type HeegaardDiagram, type Problem, type Result,
} from '../../geometry/index.js';

const QUADRANT_NAMES = ['NE', 'NW', 'SW', 'SE'] as const;

export interface ReportRegion {
  /** 1-based region number (R_1, R_2, ...). */
  id: number;
  faces: number;
  /** Euler characteristic of the region cut open along the curves. */
  eulerCharacteristic: number;
  convexCorners: number;
  reflexCorners: number;
  /** Corners as (1-based intersection point, quadrant NE/NW/SW/SE relative to alpha's direction). */
  corners: { point: number; quadrant: (typeof QUADRANT_NAMES)[number] }[];
  /** e(R) = χ − convex/4 + reflex/4 (Lipshitz 2006). */
  eulerMeasure: number;
  /** The same quantity from discrete Gauss–Bonnet, (interior + boundary + corners). */
  geometricEulerMeasure: number;
  /** Gauss–Bonnet parts divided by 2π. */
  curvature: { interior: number; boundary: number; corners: number };
  /** Curves along the boundary, e.g. ['alpha_1', 'beta_2']. */
  boundary: string[];
  /** Basepoint names inside, e.g. ['z_1']. */
  basepoints: string[];
  /** Present only when the two Euler measures disagree (a defect, never hidden). */
  defect?: string;
}

export interface AnalysisReport {
  surface: { vertices: number; faces: number; eulerCharacteristic: number; genus: number; /** Σ angle defects / 2π. */ totalCurvature: number };
  alpha: number;
  beta: number;
  basepoints: { name: string; kind: 'z' | 'w'; vertex: number; region: number }[];
  intersections: { id: number; vertex: number; alpha: number; beta: number; sign: 1 | -1; quadrants: number[] }[];
  regions: ReportRegion[];
  eulerMeasureTotal: number;
  /** Internal disagreements (never expected; reported, never hidden). */
  defects: string[];
  [extra: string]: unknown;
}

/** Everything a report section may read. */
export interface ReportContext {
  diagram: HeegaardDiagram;
  analysis: DiagramAnalysis;
  combinatorial: CombinatorialDiagram;
}

/** Extra report fields from other areas; add one line per section. Each returns fields to merge in. */
export const REPORT_SECTIONS: ((ctx: ReportContext) => Record<string, unknown>)[] = [
  ({ combinatorial }) => floerReportFields(combinatorial),
];

function regionReport(d: HeegaardDiagram, r: DiagramAnalysis['regions'][number]): ReportRegion {
  const bp = (i: number) => `${d.basepoints[i].kind}_${d.basepoints[i].index + 1}`;
  return {
    id: r.id + 1,
    faces: r.faces,
    eulerCharacteristic: r.chi,
    convexCorners: r.convexCorners,
    reflexCorners: r.reflexCorners,
    corners: r.corners.map((c) => ({ point: c.point + 1, quadrant: QUADRANT_NAMES[c.quadrant] })),
    eulerMeasure: r.eulerMeasure,
    geometricEulerMeasure: r.geometricEulerMeasure,
    curvature: { ...r.curvature },
    boundary: [...r.alphaCurves.map((i) => `alpha_${i + 1}`), ...r.betaCurves.map((i) => `beta_${i + 1}`)],
    basepoints: r.basepoints.map(bp),
    ...(r.defect ? { defect: r.defect } : {}),
  };
}

/** Builds the report from an analysis already computed. O(points + regions + sections). */
export function reportFromAnalysis(d: HeegaardDiagram, a: DiagramAnalysis): AnalysisReport {
  const report: AnalysisReport = {
    surface: { vertices: a.vertices, faces: a.faces, eulerCharacteristic: a.eulerCharacteristic, genus: a.genus, totalCurvature: a.totalCurvature },
    alpha: d.curves.filter((c) => c.family === 'alpha').length,
    beta: d.curves.filter((c) => c.family === 'beta').length,
    basepoints: a.basepoints.map((b) => ({ name: `${b.kind}_${b.index + 1}`, kind: b.kind, vertex: vertexLabel(d, b.vertex), region: b.region + 1 })),
    intersections: a.points.map((p, i) => ({ id: i + 1, vertex: p.label, alpha: p.alpha + 1, beta: p.beta + 1, sign: p.sign, quadrants: p.quadrants.map((r) => r + 1) })),
    regions: a.regions.map((r) => regionReport(d, r)),
    eulerMeasureTotal: a.eulerMeasureTotal,
    defects: a.defects.map((p) => p.message),
  };
  const ctx: ReportContext = { diagram: d, analysis: a, combinatorial: toCombinatorial(a) };
  for (const section of REPORT_SECTIONS) Object.assign(report, section(ctx));
  return report;
}

/** Analyses the diagram and builds its report; invalid diagrams give the validation problems. */
export function analysisReport(d: HeegaardDiagram): Result<AnalysisReport, Problem> {
  const a = analyzeDiagram(d);
  if (!a.ok) return a;
  return { ok: true, value: reportFromAnalysis(d, a.value) };
}

/** Names used in text output. */
export const reportNames = { curveName, QUADRANT_NAMES };
