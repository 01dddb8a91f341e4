/**
 * Catmull–Clark subdivision of a closed quad mesh (Catmull & Clark 1978, "Recursively generated B-spline
 * surfaces on arbitrary topological meshes"), keeping edge paths: a curve given as a vertex cycle along
 * edges becomes the cycle through the same vertices and the new edge points between them. Old vertices
 * keep their indices; edge points follow (nV + e), then face points (nV + nE + q). Orientation of every
 * quad is preserved. O(V + Q) per level.
 */
import { assert } from '../base/assert.js';

export interface QuadMesh {
  pos: Float64Array;
  /** Four vertex indices per quad, counter-clockwise seen from outside. */
  quads: Int32Array;
}

interface QuadEdges {
  nE: number;
  /** Edge of quad side 4q + k (from corner k to corner k + 1). */
  edgeOf: Int32Array;
  /** CSR by smaller endpoint, for looking edges up by their ends. */
  loStart: Int32Array;
  loEdge: Int32Array;
  hi: Int32Array;
}

/** Undirected edges of a quad mesh. O(Q + sum deg^2). */
function quadEdges(quads: Int32Array, nV: number): QuadEdges {
  const nS = quads.length;
  const end = (s: number): number => quads[s % 4 === 3 ? s - 3 : s + 1];
  const loStart = new Int32Array(nV + 1);
  for (let s = 0; s < nS; s++) loStart[Math.min(quads[s], end(s)) + 1]++;
  for (let v = 0; v < nV; v++) loStart[v + 1] += loStart[v];
  const fill = loStart.slice(0, nV), bySide = new Int32Array(nS);
  for (let s = 0; s < nS; s++) bySide[fill[Math.min(quads[s], end(s))]++] = s;
  const edgeOf = new Int32Array(nS).fill(-1);
  const loEdge = new Int32Array(nS), hi = new Int32Array(nS);
  let nE = 0;
  for (let v = 0; v < nV; v++) {
    let write = loStart[v];
    for (let i = loStart[v]; i < loStart[v + 1]; i++) {
      const s = bySide[i];
      if (edgeOf[s] >= 0) continue;
      const h = Math.max(quads[s], end(s)), e = nE++;
      edgeOf[s] = e;
      for (let j = i + 1; j < loStart[v + 1]; j++) {
        const t = bySide[j];
        if (edgeOf[t] < 0 && Math.max(quads[t], end(t)) === h) edgeOf[t] = e;
      }
      loEdge[write] = e; hi[write++] = h;
    }
    for (let i = write; i < loStart[v + 1]; i++) loEdge[i] = -1;
  }
  return { nE, edgeOf, loStart, loEdge, hi };
}

/** The edge joining a and b, or -1. O(degree). */
function findEdge(t: QuadEdges, a: number, b: number): number {
  const lo = Math.min(a, b), h = Math.max(a, b);
  for (let i = t.loStart[lo]; i < t.loStart[lo + 1]; i++) if (t.loEdge[i] >= 0 && t.hi[i] === h) return t.loEdge[i];
  return -1;
}

/** One Catmull–Clark step on a closed quad mesh; curves are vertex cycles along edges. */
export function catmullClark(m: QuadMesh, curves: Int32Array[]): { mesh: QuadMesh; curves: Int32Array[] } {
  const nV = m.pos.length / 3, nQ = m.quads.length / 4, q4 = m.quads;
  const t = quadEdges(q4, nV);
  const nE = t.nE, out = new Float64Array(3 * (nV + nE + nQ));
  const F = 3 * (nV + nE);
  // Face points: centroids.
  for (let q = 0; q < nQ; q++) {
    for (let k = 0; k < 4; k++) for (let d = 0; d < 3; d++) out[F + 3 * q + d] += 0.25 * m.pos[3 * q4[4 * q + k] + d];
  }
  // Edge points: average of the two ends and the two face points. Vertex sums for Q and R.
  const faceSum = new Float64Array(3 * nV), midSum = new Float64Array(3 * nV), valence = new Int32Array(nV);
  const seen = new Uint8Array(nE);
  for (let s = 0; s < 4 * nQ; s++) {
    const q = s >> 2, a = q4[s], b = q4[s % 4 === 3 ? s - 3 : s + 1], e = t.edgeOf[s];
    const E = 3 * (nV + e);
    for (let d = 0; d < 3; d++) {
      out[E + d] += 0.25 * (0.5 * (m.pos[3 * a + d] + m.pos[3 * b + d]) + out[F + 3 * q + d]);
      faceSum[3 * a + d] += out[F + 3 * q + d];
    }
    if (seen[e]) continue;
    seen[e] = 1;
    valence[a]++; valence[b]++;
    for (let d = 0; d < 3; d++) {
      const mid = 0.5 * (m.pos[3 * a + d] + m.pos[3 * b + d]);
      midSum[3 * a + d] += mid; midSum[3 * b + d] += mid;
    }
  }
  // Old vertices: (Q + 2R + (n − 3) P) / n, with n faces = n edges on a closed surface.
  for (let v = 0; v < nV; v++) {
    const n = valence[v];
    for (let d = 0; d < 3; d++) out[3 * v + d] = (faceSum[3 * v + d] / n + (2 * midSum[3 * v + d]) / n + (n - 3) * m.pos[3 * v + d]) / n;
  }
  const quads = new Int32Array(16 * nQ);
  for (let q = 0; q < nQ; q++) {
    for (let k = 0; k < 4; k++) {
      const o = 16 * q + 4 * k;
      quads[o] = q4[4 * q + k];
      quads[o + 1] = nV + t.edgeOf[4 * q + k];
      quads[o + 2] = nV + nE + q;
      quads[o + 3] = nV + t.edgeOf[4 * q + ((k + 3) & 3)];
    }
  }
  const newCurves = curves.map((c) => {
    const r = new Int32Array(2 * c.length);
    for (let i = 0; i < c.length; i++) {
      const e = findEdge(t, c[i], c[(i + 1) % c.length]);
      assert(e >= 0, `catmullClark: curve step ${c[i]}–${c[(i + 1) % c.length]} is not an edge`);
      r[2 * i] = c[i]; r[2 * i + 1] = nV + e;
    }
    return r;
  });
  return { mesh: { pos: out, quads }, curves: newCurves };
}

/** Splits every quad (a, b, c, d) along its shorter diagonal into two triangles, keeping orientation. O(Q). */
export function triangulateQuads(m: QuadMesh): Int32Array {
  const nQ = m.quads.length / 4, tris = new Int32Array(6 * nQ), p = m.pos;
  const d2 = (u: number, v: number): number =>
    (p[3 * u] - p[3 * v]) ** 2 + (p[3 * u + 1] - p[3 * v + 1]) ** 2 + (p[3 * u + 2] - p[3 * v + 2]) ** 2;
  for (let q = 0; q < nQ; q++) {
    const a = m.quads[4 * q], b = m.quads[4 * q + 1], c = m.quads[4 * q + 2], d = m.quads[4 * q + 3];
    const o = 6 * q;
    if (d2(a, c) <= d2(b, d)) tris.set([a, b, c, a, c, d], o);
    else tris.set([a, b, d, b, c, d], o);
  }
  return tris;
}
