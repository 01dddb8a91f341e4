/**
 * Turns the server's answers (mesh binary + cached analysis) into what the view and the panels need:
 * decoded per-face regions, faces per region, viewer curves and points, face masks and colours.
 * Pure and cheap (O(F) per change), no three.js.
 */
import { decodeFloat32Base64, decodeInt32Base64, type AnalysisResult, type MeshBinary } from '../../../server/contract/index.js';
import { faceColorsFromRegions, hexToRgb, robustExtent, symmetricExtent, vertexColorsFromValues } from '../../viewer/color-scale';
import type { ViewerCurve, ViewerPoint } from '../../viewer/types';
import { basepointLabel, curveLabel, pointLabel } from './format';

export interface RegionIndex {
  /** Region id per face. */
  faceRegion: Int32Array;
  /** Faces of each region. */
  facesOf: number[][];
}

/** Decodes faceRegion and groups faces by region. O(F). */
export function regionIndex(result: AnalysisResult, nRegions: number): RegionIndex {
  const faceRegion = decodeInt32Base64(result.faceRegion);
  const facesOf: number[][] = Array.from({ length: nRegions }, () => []);
  for (let f = 0; f < faceRegion.length; f++) facesOf[faceRegion[f]]?.push(f);
  return { faceRegion, facesOf };
}

/** Mask of the faces whose region is in `regions`. O(F). */
export function regionMask(faceRegion: Int32Array, regions: Iterable<number>): Uint8Array | null {
  const set = new Set(regions);
  if (set.size === 0) return null;
  const m = new Uint8Array(faceRegion.length);
  for (let f = 0; f < faceRegion.length; f++) if (set.has(faceRegion[f])) m[f] = 1;
  return m;
}

export function viewerCurves(mesh: MeshBinary): ViewerCurve[] {
  return mesh.curves.map((c) => ({ id: `${c.family}${c.index}`, family: c.family, label: curveLabel(c.family, c.index), vertices: c.vertices }));
}

export type PointNaming = 'names' | 'vertices';

export function viewerPoints(mesh: MeshBinary, result: AnalysisResult | null, naming: PointNaming): ViewerPoint[] {
  const pts: ViewerPoint[] = [];
  for (const x of result?.intersections ?? []) {
    pts.push({ id: `x${x.id}`, vertex: x.vertex, kind: 'intersection', label: naming === 'names' ? pointLabel(x.id) : String(x.label) });
  }
  for (const b of mesh.basepoints) pts.push({ id: `${b.kind}${b.index}`, vertex: b.vertex, kind: b.kind, label: basepointLabel(b.kind, b.index) });
  return pts;
}

export type ColorMode = 'plain' | 'domain' | 'euler' | 'eulerGB' | 'defect' | 'periodic';

export const COLOR_MODE_LABELS: Record<ColorMode, string> = {
  plain: 'Plain surface',
  domain: 'Domain coefficient',
  euler: 'Euler measure (corners)',
  eulerGB: 'Euler measure (Gauss–Bonnet)',
  defect: 'Curvature defect per vertex',
  periodic: 'Periodic domain',
};

export interface Coloring {
  faceColors: Float32Array | null;
  vertexColors: Float32Array | null;
  /** Legend range [−extent, extent] and title, or null for the plain surface. */
  legend: { title: string; extent: number; unit?: string } | null;
}

const NEUTRAL = hexToRgb('#e9e6dc');

/** Colours for the chosen quantity. O(F + V). */
export function coloring(
  mode: ColorMode,
  result: AnalysisResult | null,
  index: RegionIndex | null,
  domain: Record<number, number>,
  periodic: number[] | null,
): Coloring {
  const none: Coloring = { faceColors: null, vertexColors: null, legend: null };
  if (!result || !index || mode === 'plain') return none;
  if (mode === 'defect') {
    const d = decodeFloat32Base64(result.vertexDefect);
    const extent = robustExtent(d);
    return { faceColors: null, vertexColors: vertexColorsFromValues(d, extent), legend: { title: 'Angle defect 2π − Σθ (95% of vertices within)', extent, unit: 'rad' } };
  }
  const n = result.regions.length;
  const values = new Float64Array(n);
  let title = COLOR_MODE_LABELS[mode];
  for (let r = 0; r < n; r++) {
    const reg = result.regions[r];
    values[r] = mode === 'euler' ? reg.eulerMeasure
      : mode === 'eulerGB' ? reg.geometricEulerMeasure
      : mode === 'domain' ? domain[r] ?? 0
      : periodic?.[r] ?? 0;
  }
  if (mode === 'periodic' && !periodic) title = 'Periodic domain (none chosen)';
  const extent = mode === 'domain' || mode === 'periodic' ? Math.max(1, symmetricExtent(values)) : symmetricExtent(values);
  return { faceColors: faceColorsFromRegions(index.faceRegion, values, extent, NEUTRAL), vertexColors: null, legend: { title, extent } };
}
