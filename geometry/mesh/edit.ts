/**
 * Growable directed-edge mesh with per-half-edge curve labels, and the local edits every diagram
 * operation is built from: edge splits (1 -> 2 triangles on each side) and face splits (1 -> 3).
 * Capacities grow x2; edits only append, so face and vertex ids stay valid except where stated.
 * Directed edges after Campagna, Kobbelt, Seidel 1998; label layout as in GEOMETRY.md.
 */
import { assert } from '../base/assert.js';
import { next, prev, type TriMesh } from './tri-mesh.js';

/** A TriMesh with spare capacity and curve labels. */
export interface EditMesh extends TriMesh {
  /** +(c+1) if curve c runs along half-edge h, -(c+1) if it runs along h's twin, 0 = none. */
  heCurve: Int32Array;
}

function grownF64(a: Float64Array, n: number): Float64Array {
  const b = new Float64Array(n);
  b.set(a.subarray(0, Math.min(a.length, n)));
  return b;
}
function grownI32(a: Int32Array, n: number, fill = 0): Int32Array {
  const b = new Int32Array(n);
  if (fill !== 0) b.fill(fill);
  b.set(a.subarray(0, Math.min(a.length, n)));
  return b;
}

/** Copies a mesh (and optional labels) into a fresh EditMesh; the input is untouched. O(V + F). */
export function toEditMesh(m: TriMesh, heCurve?: Int32Array): EditMesh {
  const capV = Math.max(16, 2 * m.nV), capH = Math.max(48, 6 * m.nF);
  const labels = new Int32Array(capH);
  if (heCurve) labels.set(heCurve.subarray(0, 3 * m.nF));
  return {
    nV: m.nV, nF: m.nF, version: m.version + 1,
    pos: grownF64(m.pos.subarray(0, 3 * m.nV), 3 * capV),
    heVert: grownI32(m.heVert.subarray(0, 3 * m.nF), capH),
    heTwin: grownI32(m.heTwin.subarray(0, 3 * m.nF), capH, -1),
    vertHe: grownI32(m.vertHe.subarray(0, m.nV), capV, -1),
    heCurve: labels,
  };
}

/** Makes room for addV more vertices and addF more faces (capacities at least double). Amortised O(1). */
export function ensureCapacity(m: EditMesh, addV: number, addF: number): void {
  if (m.nV + addV > m.vertHe.length) {
    const cap = Math.max(2 * m.vertHe.length, m.nV + addV);
    m.pos = grownF64(m.pos, 3 * cap);
    m.vertHe = grownI32(m.vertHe, cap, -1);
  }
  if (3 * (m.nF + addF) > m.heVert.length) {
    const cap = Math.max(2 * m.heVert.length, 3 * (m.nF + addF));
    m.heVert = grownI32(m.heVert, cap);
    m.heTwin = grownI32(m.heTwin, cap, -1);
    m.heCurve = grownI32(m.heCurve, cap);
  }
}

/** A trimmed plain TriMesh copy (no spare capacity, labels dropped). O(V + F). */
export function compactMesh(m: EditMesh): TriMesh {
  return {
    nV: m.nV, nF: m.nF, version: m.version,
    pos: m.pos.slice(0, 3 * m.nV), heVert: m.heVert.slice(0, 3 * m.nF),
    heTwin: m.heTwin.slice(0, 3 * m.nF), vertHe: m.vertHe.slice(0, m.nV),
  };
}

/** The half-edge a -> b, or -1 when a and b are not joined. Walks a's closed fan: O(degree). */
export function findHalfEdge(m: TriMesh, a: number, b: number): number {
  const first = m.vertHe[a];
  if (first < 0) return -1;
  let h = first, guard = 0;
  do {
    if (m.heVert[next(h)] === b) return h;
    h = m.heTwin[prev(h)];
  } while (h >= 0 && h !== first && ++guard < 100000);
  return -1;
}

/** Sets the curve label of the edge of h: `label` on h and `-label` on its twin. O(1). */
export function setEdgeLabel(m: EditMesh, h: number, label: number): void {
  m.heCurve[h] = label;
  const t = m.heTwin[h];
  if (t >= 0) m.heCurve[t] = -label;
}

/**
 * Splits the edge of half-edge h = a -> b at a + t (b - a), 0 < t < 1, splitting both triangles beside it
 * and joining the new vertex m to both opposite corners (GEOMETRY.md, "Operations"). Both halves keep
 * the edge's curve label. Afterwards h runs a -> m and its twin m -> a; other half-edge ids of the two
 * faces may now belong to the new faces. Returns m. Closed meshes only. O(1) amortised.
 */
export function splitEdge(m: EditMesh, h: number, t: number): number {
  const g = m.heTwin[h];
  assert(g >= 0, `splitEdge: half-edge ${h} has no twin`);
  ensureCapacity(m, 1, 2);
  const hn = next(h), hp = prev(h), gp = prev(g);
  const a = m.heVert[h], b = m.heVert[hn], c = m.heVert[hp], d = m.heVert[gp];
  const mv = m.nV++;
  for (let k = 0; k < 3; k++) m.pos[3 * mv + k] = m.pos[3 * a + k] + t * (m.pos[3 * b + k] - m.pos[3 * a + k]);
  const f1 = m.nF++, f2 = m.nF++;
  const h1 = 3 * f1, h2 = 3 * f2;
  const twBC = m.heTwin[hn], twDB = m.heTwin[gp];
  const lBC = m.heCurve[hn], lDB = m.heCurve[gp];
  // Face of h becomes (a, m, c); new face (m, b, c).
  m.heVert[hn] = mv;
  m.heVert[h1] = mv; m.heVert[h1 + 1] = b; m.heVert[h1 + 2] = c;
  // Face of g becomes (m, a, d); new face (b, m, d).
  m.heVert[g] = mv;
  m.heVert[h2] = b; m.heVert[h2 + 1] = mv; m.heVert[h2 + 2] = d;
  // Twins.
  m.heTwin[h1] = h2; m.heTwin[h2] = h1;
  m.heTwin[h1 + 1] = twBC; if (twBC >= 0) m.heTwin[twBC] = h1 + 1;
  m.heTwin[hn] = h1 + 2; m.heTwin[h1 + 2] = hn;
  m.heTwin[h2 + 2] = twDB; if (twDB >= 0) m.heTwin[twDB] = h2 + 2;
  m.heTwin[gp] = h2 + 1; m.heTwin[h2 + 1] = gp;
  // Labels: halves of the split edge keep the label; the two new spokes are unlabelled.
  m.heCurve[h1] = m.heCurve[h]; m.heCurve[h2] = m.heCurve[g];
  m.heCurve[h1 + 1] = lBC; m.heCurve[hn] = 0; m.heCurve[h1 + 2] = 0;
  m.heCurve[h2 + 2] = lDB; m.heCurve[gp] = 0; m.heCurve[h2 + 1] = 0;
  // Handles: only b can have lost its outgoing half-edge.
  m.vertHe[b] = h1 + 1;
  m.vertHe[mv] = h1;
  m.version++;
  return mv;
}

/**
 * Splits face f at the point with barycentric coordinates (w0, w1, w2) of its corners into three
 * triangles around a new vertex, which it returns. Labels of the face's edges are kept. O(1) amortised.
 */
export function splitFace(m: EditMesh, f: number, w0: number, w1: number, w2: number): number {
  ensureCapacity(m, 1, 2);
  const h0 = 3 * f;
  const a = m.heVert[h0], b = m.heVert[h0 + 1], c = m.heVert[h0 + 2];
  const s = w0 + w1 + w2;
  const mv = m.nV++;
  for (let k = 0; k < 3; k++) {
    m.pos[3 * mv + k] = (w0 * m.pos[3 * a + k] + w1 * m.pos[3 * b + k] + w2 * m.pos[3 * c + k]) / s;
  }
  const f1 = m.nF++, f2 = m.nF++;
  const h1 = 3 * f1, h2 = 3 * f2;
  const twBC = m.heTwin[h0 + 1], twCA = m.heTwin[h0 + 2];
  const lBC = m.heCurve[h0 + 1], lCA = m.heCurve[h0 + 2];
  // f = (a, b, m); f1 = (b, c, m); f2 = (c, a, m).
  m.heVert[h0 + 2] = mv;
  m.heVert[h1] = b; m.heVert[h1 + 1] = c; m.heVert[h1 + 2] = mv;
  m.heVert[h2] = c; m.heVert[h2 + 1] = a; m.heVert[h2 + 2] = mv;
  m.heTwin[h1] = twBC; if (twBC >= 0) m.heTwin[twBC] = h1;
  m.heTwin[h2] = twCA; if (twCA >= 0) m.heTwin[twCA] = h2;
  m.heCurve[h1] = lBC; m.heCurve[h2] = lCA;
  // Spokes: b->m (h0+1) with m->b (h1+2); c->m (h1+1) with m->c (h2+2); a->m (h2+1) with m->a (h0+2).
  m.heTwin[h0 + 1] = h1 + 2; m.heTwin[h1 + 2] = h0 + 1;
  m.heTwin[h1 + 1] = h2 + 2; m.heTwin[h2 + 2] = h1 + 1;
  m.heTwin[h2 + 1] = h0 + 2; m.heTwin[h0 + 2] = h2 + 1;
  m.heCurve[h0 + 1] = 0; m.heCurve[h0 + 2] = 0; m.heCurve[h1 + 1] = 0; m.heCurve[h1 + 2] = 0;
  m.heCurve[h2 + 1] = 0; m.heCurve[h2 + 2] = 0;
  m.vertHe[c] = h2; // c's old handle c->a moved to h2
  m.vertHe[mv] = h0 + 2;
  m.version++;
  return mv;
}

/** Checks that labels are antisymmetric across twins. Returns the first offending half-edge or -1. O(F). */
export function checkLabelSymmetry(m: EditMesh): number {
  for (let h = 0; h < 3 * m.nF; h++) if (m.heCurve[m.heTwin[h]] !== -m.heCurve[h]) return h;
  return -1;
}
