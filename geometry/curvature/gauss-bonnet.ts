/**
 * Discrete Gauss–Bonnet on the regions of a diagram (REFERENCE.md "Discrete Gauss–Bonnet on a mesh
 * region"; do Carmo 1976 §4-5; Polthier & Schmies 1998). For a region R cut open along the curves:
 *   Σ_interior (2π − Θ_v) + Σ_wedges (π − θ_w) = 2π χ(R)      (exact identity)
 * and, splitting wedges into smooth boundary points and corners,
 *   2π e(R) = Σ_interior K_v + Σ_smooth (π − θ_w) + Σ_corners (π/2 − θ_c)   (Lipshitz 2006, Euler measure).
 * All sums here are in radians; callers divide by 2π. Sums are compensated (Neumaier 1974) so that the
 * identity holds to ~1e-12 even at millions of vertices.
 */
import type { TriMesh } from '../mesh/tri-mesh.js';
import type { Wedges } from '../diagram/wedges.js';

const TWO_PI = 2 * Math.PI;
const HALF_PI = Math.PI / 2;

/** Per-region curvature parts, in radians, indexed by region id. */
export interface RegionCurvature {
  /** Σ over vertices inside R (off the curves) of 2π − Θ_v. */
  interior: Float64Array;
  /** Σ over smooth boundary wedges of π − θ_w (discrete geodesic curvature of the boundary). */
  boundary: Float64Array;
  /** Σ over corner wedges of π/2 − θ_c (turning beyond the ideal right angle). */
  corners: Float64Array;
  /** Σ over all wedges of π − θ_w: with interior, the plain Gauss–Bonnet total 2π χ(R). */
  wedgeTotal: Float64Array;
}

/** Neumaier-compensated accumulation into s[i] with compensation c[i]. O(1). */
function addTo(s: Float64Array, c: Float64Array, i: number, x: number): void {
  const t = s[i] + x;
  c[i] += Math.abs(s[i]) >= Math.abs(x) ? (s[i] - t) + x : (x - t) + s[i];
  s[i] = t;
}

/**
 * Curvature parts of every region. onCurve[v] >= 0 marks curve vertices; faceRegion gives each face's
 * region; vertexSum is Θ_v. O(V + wedges).
 */
export function regionCurvature(
  m: TriMesh, faceRegion: Int32Array, nRegions: number, onCurve: Int32Array, vertexSum: Float64Array, w: Wedges,
): RegionCurvature {
  const parts = [0, 1, 2, 3].map(() => [new Float64Array(nRegions), new Float64Array(nRegions)]);
  const [interior, boundary, corners, total] = parts;
  for (let v = 0; v < m.nV; v++) {
    const h = m.vertHe[v];
    if (h < 0 || onCurve[v] >= 0) continue;
    addTo(interior[0], interior[1], faceRegion[(h / 3) | 0], TWO_PI - vertexSum[v]);
  }
  for (let k = 0; k < w.count; k++) {
    const r = w.region[k], th = w.angle[k];
    addTo(total[0], total[1], r, Math.PI - th);
    if (w.corner[k]) addTo(corners[0], corners[1], r, HALF_PI - th);
    else addTo(boundary[0], boundary[1], r, Math.PI - th);
  }
  const done = (p: Float64Array[]): Float64Array => p[0].map((x, i) => x + p[1][i]);
  return { interior: done(interior), boundary: done(boundary), corners: done(corners), wedgeTotal: done(total) };
}

/** Smooth-curvature shares of the boundary wedges (Polthier & Schmies 1998). */
export interface WedgeShares {
  /** K_w = (θ_w / Θ_v)(2π − Θ_v): the wedge's angle-proportional share of its vertex's defect. */
  gauss: Float64Array;
  /** κ_w = π − 2π θ_w / Θ_v: the wedge's geodesic curvature; K_w + κ_w = π − θ_w. */
  geodesic: Float64Array;
}

/** Angle-proportional shares for every wedge. Per vertex Σ_w K_w = 2π − Θ_v. O(wedges). */
export function wedgeShares(w: Wedges, vertexSum: Float64Array): WedgeShares {
  const gauss = new Float64Array(w.count), geodesic = new Float64Array(w.count);
  for (let k = 0; k < w.count; k++) {
    const theta = vertexSum[w.vertex[k]], frac = w.angle[k] / theta;
    gauss[k] = frac * (TWO_PI - theta);
    geodesic[k] = Math.PI - TWO_PI * frac;
  }
  return { gauss, geodesic };
}

/**
 * Approximate ∫∫_R K dA of the smooth surface the mesh samples: interior defects plus the boundary
 * wedges' angle-proportional shares. Converges like O(h²) on smooth surfaces (GEOMETRY.md; Polthier &
 * Schmies 1998), where the interior defects alone converge like O(h). Radians, per region. O(wedges).
 */
export function smoothRegionCurvature(c: RegionCurvature, w: Wedges, shares: WedgeShares): Float64Array {
  const s = Float64Array.from(c.interior), comp = new Float64Array(s.length);
  for (let k = 0; k < w.count; k++) addTo(s, comp, w.region[k], shares.gauss[k]);
  return s.map((x, i) => x + comp[i]);
}
