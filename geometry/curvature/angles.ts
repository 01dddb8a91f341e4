/**
 * Corner angles and angle defects of a triangle mesh: the discrete Gaussian curvature of a polyhedral
 * surface is the angle defect K_v = 2π − Θ_v at each vertex (Polthier & Schmies 1998, §2; the discrete
 * Gauss–Bonnet theorem Σ K_v = 2π χ, do Carmo 1976 §4-5 for the smooth statement).
 */
import type { TriMesh } from '../mesh/tri-mesh.js';

const TWO_PI = 2 * Math.PI;

/** Corner angles (angle at the tail of each half-edge inside its face) and each vertex's angle sum Θ_v. */
export interface MeshAngles {
  /** Length 3 nF: angle at heVert[h] between h and the reversed prev(h), by atan2(|u×v|, u·v). */
  corner: Float64Array;
  /** Length nV: Θ_v, the sum of corner angles at v. */
  vertexSum: Float64Array;
}

/**
 * All corner angles and vertex angle sums in one pass over the faces, inlined (no calls per corner).
 * Angles by atan2(|u×v|, u·v), never a clamped acos (GEOMETRY.md). O(F).
 */
export function meshAngles(m: TriMesh): MeshAngles {
  const nF = m.nF, pos = m.pos, hv = m.heVert;
  const corner = new Float64Array(3 * nF);
  const vertexSum = new Float64Array(m.nV);
  for (let f = 0; f < nF; f++) {
    const a = hv[3 * f], b = hv[3 * f + 1], c = hv[3 * f + 2];
    const ax = pos[3 * a], ay = pos[3 * a + 1], az = pos[3 * a + 2];
    const bx = pos[3 * b], by = pos[3 * b + 1], bz = pos[3 * b + 2];
    const cx = pos[3 * c], cy = pos[3 * c + 1], cz = pos[3 * c + 2];
    const abx = bx - ax, aby = by - ay, abz = bz - az; // a -> b
    const bcx = cx - bx, bcy = cy - by, bcz = cz - bz; // b -> c
    const cax = ax - cx, cay = ay - cy, caz = az - cz; // c -> a
    // Face normal (twice the area); its length is |u × v| at every corner of the triangle.
    const nx = aby * bcz - abz * bcy, ny = abz * bcx - abx * bcz, nz = abx * bcy - aby * bcx;
    const s = Math.sqrt(nx * nx + ny * ny + nz * nz);
    const angA = Math.atan2(s, -(abx * cax + aby * cay + abz * caz));
    const angB = Math.atan2(s, -(bcx * abx + bcy * aby + bcz * abz));
    const angC = Math.atan2(s, -(cax * bcx + cay * bcy + caz * bcz));
    corner[3 * f] = angA; corner[3 * f + 1] = angB; corner[3 * f + 2] = angC;
    vertexSum[a] += angA; vertexSum[b] += angB; vertexSum[c] += angC;
  }
  return { corner, vertexSum };
}

/**
 * Angle defect K_v = 2π − Θ_v per vertex (0 for unused vertices): the viewer's curvature heat map.
 * Σ_v K_v = 2π χ(Σ) on a closed mesh (discrete Gauss–Bonnet). O(V).
 */
export function angleDefects(m: TriMesh, vertexSum: Float64Array): Float64Array {
  const out = new Float64Array(m.nV);
  for (let v = 0; v < m.nV; v++) if (m.vertHe[v] >= 0) out[v] = TWO_PI - vertexSum[v];
  return out;
}
