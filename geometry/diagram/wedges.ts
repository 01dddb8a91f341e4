/**
 * Wedges (GEOMETRY.md, "Regions"): at a vertex on the curves, each curve half-edge leaving it starts a
 * wedge — the fan of faces counter-clockwise up to the next curve half-edge. A wedge is one vertex of
 * its region cut open along the curves; it is a corner when its two sides lie on curves of different
 * families (then the region fills exactly one quadrant of the crossing).
 */
import { prev, type TriMesh } from '../mesh/tri-mesh.js';

/** Wedges as parallel typed arrays, grouped by vertex in increasing vertex order. */
export interface Wedges {
  count: number;
  vertex: Int32Array;
  region: Int32Array;
  /** Sum of the corner angles of the wedge's faces at its vertex. */
  angle: Float64Array;
  /** Curve half-edge (outgoing from vertex) that starts the wedge; the wedge's faces follow it CCW. */
  startHe: Int32Array;
  /** Curve half-edge (outgoing) that ends the wedge, counter-clockwise after startHe. */
  endHe: Int32Array;
  /** 1 when the two sides are on curves of different families (a corner), else 0. */
  corner: Uint8Array;
}

/**
 * All wedges at the vertices listed in curveVerts. heCurve and familyBit as in CurveLabels; faceRegion
 * the region of each face; angle the corner angle at the tail of each half-edge. O(Σ degree of curve
 * vertices).
 */
export function computeWedges(
  m: TriMesh, heCurve: Int32Array, familyBit: Uint8Array, faceRegion: Int32Array, angle: Float64Array, curveVerts: Int32Array,
): Wedges {
  let count = 0;
  for (let i = 0; i < curveVerts.length; i++) {
    const first = m.vertHe[curveVerts[i]];
    let h = first;
    do { if (heCurve[h] !== 0) count++; h = m.heTwin[prev(h)]; } while (h !== first);
  }
  const w: Wedges = {
    count, vertex: new Int32Array(count), region: new Int32Array(count), angle: new Float64Array(count),
    startHe: new Int32Array(count), endHe: new Int32Array(count), corner: new Uint8Array(count),
  };
  let k = 0;
  for (let i = 0; i < curveVerts.length; i++) {
    const v = curveVerts[i];
    let h0 = m.vertHe[v];
    while (heCurve[h0] === 0) h0 = m.heTwin[prev(h0)];
    const stop = h0;
    do { // one wedge from curve half-edge h0 to the next curve half-edge
      let sum = 0;
      let h = h0;
      do { sum += angle[h]; h = m.heTwin[prev(h)]; } while (heCurve[h] === 0);
      const c0 = heCurve[h0], c1 = heCurve[h];
      w.vertex[k] = v;
      w.region[k] = faceRegion[(h0 / 3) | 0];
      w.angle[k] = sum;
      w.startHe[k] = h0;
      w.endHe[k] = h;
      w.corner[k] = familyBit[(c0 < 0 ? -c0 : c0) - 1] !== familyBit[(c1 < 0 ? -c1 : c1) - 1] ? 1 : 0;
      k++;
      h0 = h;
    } while (h0 !== stop);
  }
  return w;
}
