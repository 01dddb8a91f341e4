/**
 * Intersection points of alpha and beta curves with their quadrants (geometry/floer/combinatorics.ts):
 * in an orientation-preserving chart with alpha_i running east in its own direction, the wedges
 * counter-clockwise from the east ray are NE (0), NW (1), SW (2), SE (3); the sign alpha·beta is +1 when
 * beta's direction is the north ray, i.e. when (alpha', beta') is a positive basis for the outward normal.
 */
import { prev, type TriMesh } from '../mesh/tri-mesh.js';
import type { CurveLabels } from './curve-edges.js';
import { vertexLabel, type HeegaardDiagram } from './types.js';

/** One crossing of alpha_i and beta_j. */
export interface IntersectionPoint {
  /** Mesh vertex, 0-based. */
  vertex: number;
  /** The vertex number a user sees (file numbering). */
  label: number;
  /** 0-based alpha index. */
  alpha: number;
  /** 0-based beta index. */
  beta: number;
  /** Local intersection sign alpha·beta. */
  sign: 1 | -1;
  /** Region ids in the quadrants NE, NW, SW, SE. */
  quadrants: [number, number, number, number];
}

/** Points plus, per point, the four curve half-edges (outgoing, CCW from alpha's outgoing ray). */
export interface PointTable {
  points: IntersectionPoint[];
  /** 4 per point: the half-edge starting quadrant q of point p is rayHe[4p + q]. */
  rayHe: Int32Array;
  /** Point index of each vertex, or -1. */
  pointOfVertex: Int32Array;
}

/**
 * All crossings, ordered by alpha index and then along alpha in its own direction from its first vertex.
 * O(total alpha length x vertex degree).
 */
export function intersectionPoints(d: HeegaardDiagram, L: CurveLabels, faceRegion: Int32Array): PointTable {
  const m: TriMesh = d.mesh;
  const alphas = d.curves.map((c, i) => ({ c, i })).filter((x) => x.c.family === 'alpha').sort((x, y) => x.c.index - y.c.index);
  const points: IntersectionPoint[] = [];
  const rays: number[] = [];
  const pointOfVertex = new Int32Array(m.nV).fill(-1);
  for (const { c: curve, i: a } of alphas) {
    for (const v of curve.vertices) {
      if (L.vertCurveB[v] < 0) continue;
      const b = L.vertCurveA[v] === a ? L.vertCurveB[v] : L.vertCurveA[v];
      let h = m.vertHe[v];
      while (L.heCurve[h] !== a + 1) h = m.heTwin[prev(h)];
      const e: number[] = [];
      do {
        if (L.heCurve[h] !== 0) e.push(h);
        h = m.heTwin[prev(h)];
      } while (e.length < 4);
      pointOfVertex[v] = points.length;
      rays.push(...e);
      points.push({
        vertex: v,
        label: vertexLabel(d, v),
        alpha: curve.index,
        beta: d.curves[b].index,
        sign: L.heCurve[e[1]] > 0 ? 1 : -1,
        quadrants: [faceRegion[(e[0] / 3) | 0], faceRegion[(e[1] / 3) | 0], faceRegion[(e[2] / 3) | 0], faceRegion[(e[3] / 3) | 0]],
      });
    }
  }
  return { points, rayHe: Int32Array.from(rays), pointOfVertex };
}
