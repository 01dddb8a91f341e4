/**
 * Subdivision of a whole diagram, 1 -> 4 triangles: midpoint (positions kept, new vertices at edge
 * midpoints) or Loop (Loop 1987, with Warren's weights: beta = 3/(8n) for valence n > 3, 3/16 for n = 3;
 * edge points 3/8 (a + b) + 1/8 (c + d)). Curves are carried along: a curve half-edge a -> b becomes
 * a -> m -> b (GEOMETRY.md, "Subdivision"), so regions keep their chi, corners and Euler measure.
 * Loop moves vertices and shrinks the surface; re-project before comparing with analytic values.
 */
import { fail, type Result } from '../base/result.js';
import { buildTriMesh, next, prev, type TriMesh } from '../mesh/tri-mesh.js';
import { findHalfEdge } from '../mesh/edit.js';
import type { HeegaardDiagram } from '../diagram/types.js';
import { checkDiagram } from './labels.js';

export type SubdivisionScheme = 'midpoint' | 'loop';

/** Edge-vertex index for every half-edge (shared with its twin), numbered from nV. O(F). */
function edgeVertices(m: TriMesh): { edgeVert: Int32Array; nE: number } {
  const edgeVert = new Int32Array(3 * m.nF).fill(-1);
  let nE = 0;
  for (let h = 0; h < 3 * m.nF; h++) {
    if (edgeVert[h] >= 0) continue;
    edgeVert[h] = m.nV + nE;
    const t = m.heTwin[h];
    if (t >= 0) edgeVert[t] = m.nV + nE;
    nE++;
  }
  return { edgeVert, nE };
}

/** New positions: copies + midpoints, or Loop's even and odd masks (Warren weights). O(V + F). */
function newPositions(m: TriMesh, edgeVert: Int32Array, nE: number, loop: boolean): Float64Array {
  const out = new Float64Array(3 * (m.nV + nE));
  const P = m.pos;
  if (!loop) out.set(P.subarray(0, 3 * m.nV));
  else {
    const sum = new Float64Array(3 * m.nV), val = new Int32Array(m.nV);
    for (let h = 0; h < 3 * m.nF; h++) {
      const a = m.heVert[h], b = m.heVert[next(h)];
      val[a]++;
      for (let k = 0; k < 3; k++) sum[3 * a + k] += P[3 * b + k];
    }
    for (let v = 0; v < m.nV; v++) {
      const n = val[v];
      const beta = n > 3 ? 3 / (8 * n) : 3 / 16;
      for (let k = 0; k < 3; k++) out[3 * v + k] = n === 0 ? P[3 * v + k] : (1 - n * beta) * P[3 * v + k] + beta * sum[3 * v + k];
    }
  }
  for (let h = 0; h < 3 * m.nF; h++) {
    const t = m.heTwin[h];
    if (t >= 0 && t < h) continue;
    const e = edgeVert[h], a = m.heVert[h], b = m.heVert[next(h)];
    const c = m.heVert[prev(h)], d = t >= 0 ? m.heVert[prev(t)] : -1;
    for (let k = 0; k < 3; k++) {
      out[3 * e + k] = !loop || d < 0
        ? 0.5 * (P[3 * a + k] + P[3 * b + k])
        : 0.375 * (P[3 * a + k] + P[3 * b + k]) + 0.125 * (P[3 * c + k] + P[3 * d + k]);
    }
  }
  return out;
}

/**
 * Subdivides every triangle into four and carries curves and basepoints along. Returns a new, validated
 * diagram with 4x the faces; the input is untouched. O(V + F + curve length x degree).
 */
export function subdivideDiagram(d: HeegaardDiagram, scheme: SubdivisionScheme = 'midpoint'): Result<HeegaardDiagram> {
  const m = d.mesh;
  if (scheme !== 'midpoint' && scheme !== 'loop') return fail({ code: 'bad-parameter', message: `unknown subdivision scheme '${String(scheme)}'; use midpoint or loop` });
  if (m.nF > 4_000_000) return fail({ code: 'too-large', message: `the mesh has ${m.nF} triangles; subdividing it would exceed 16 million` });
  const { edgeVert, nE } = edgeVertices(m);
  const pos = newPositions(m, edgeVert, nE, scheme === 'loop');
  const tris = new Int32Array(12 * m.nF);
  for (let f = 0; f < m.nF; f++) {
    const a = m.heVert[3 * f], b = m.heVert[3 * f + 1], c = m.heVert[3 * f + 2];
    const ab = edgeVert[3 * f], bc = edgeVert[3 * f + 1], ca = edgeVert[3 * f + 2];
    tris.set([a, ab, ca, ab, b, bc, ca, bc, c, ab, bc, ca], 12 * f);
  }
  const curves: HeegaardDiagram['curves'] = [];
  for (const cv of d.curves) {
    const vs = cv.vertices, out = new Int32Array(2 * vs.length);
    for (let i = 0; i < vs.length; i++) {
      const h = findHalfEdge(m, vs[i], vs[(i + 1) % vs.length]);
      if (h < 0) return fail({ code: 'curve-not-edge-path', message: `${cv.family}_${cv.index + 1} is not an edge path` });
      out[2 * i] = vs[i];
      out[2 * i + 1] = edgeVert[h];
    }
    curves.push({ family: cv.family, index: cv.index, vertices: out });
  }
  const mesh = buildTriMesh(pos, tris).mesh;
  return checkDiagram({ mesh, curves, basepoints: d.basepoints.map((b) => ({ ...b })), vertexLabels: d.vertexLabels });
}
