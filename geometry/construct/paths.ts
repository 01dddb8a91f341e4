/**
 * Small building blocks shared by the constructions: labelling an ordered vertex cycle, tracing the
 * cycle through a set of marked vertices, inserting an isoline of a function (GEOMETRY.md: "curves as
 * isolines"), and choosing a basepoint far from every curve.
 */
import { assert } from '../base/assert.js';
import { findHalfEdge, setEdgeLabel, splitEdge, type EditMesh } from '../mesh/edit.js';
import { next } from '../mesh/tri-mesh.js';
import { fan } from './labels.js';

/** Labels the closed vertex cycle vs (consecutive vertices joined by edges) with `label`, in order. O(n x degree). */
export function labelCycle(em: EditMesh, vs: ArrayLike<number>, label: number): void {
  for (let i = 0; i < vs.length; i++) {
    const h = findHalfEdge(em, vs[i], vs[(i + 1) % vs.length]);
    assert(h >= 0, `labelCycle: vertices ${vs[i]} and ${vs[(i + 1) % vs.length]} are not joined`);
    setEdgeLabel(em, h, label);
  }
}

/**
 * The cycle through marked vertices that starts at `start`, each marked vertex having exactly two marked
 * neighbours (asserted). `firstStep`, when given, fixes the direction. O(length x degree).
 */
export function traceMarked(em: EditMesh, mark: Uint8Array, start: number, firstStep = -1): number[] {
  const out = [start];
  let prevV = -1, v = start;
  for (let guard = 0; guard < em.nV; guard++) {
    const nb: number[] = [];
    for (const h of fan(em, v)) { const w = em.heVert[next(h)]; if (mark[w]) nb.push(w); }
    assert(nb.length === 2, `traceMarked: vertex ${v} has ${nb.length} marked neighbours`);
    let w = prevV < 0 ? (firstStep >= 0 ? firstStep : nb[0]) : (nb[0] === prevV ? nb[1] : nb[0]);
    if (prevV < 0) assert(nb.includes(w), 'traceMarked: first step is not a marked neighbour');
    if (w === start) return out;
    out.push(w);
    prevV = v; v = w;
  }
  assert(false, 'traceMarked: cycle does not close');
}

/**
 * Inserts the zero set of phi (one value per vertex, NaN = ignore edges there) by splitting every edge
 * whose ends have opposite signs at the linear zero; the splits join up inside each triangle. Values must
 * miss 0 at vertices (callers choose levels with a margin). Returns a 0/1 mark of the new vertices. O(E).
 */
export function insertZeroSet(em: EditMesh, phi: Float64Array): Uint8Array {
  const cuts: number[] = [];
  for (let h = 0; h < 3 * em.nF; h++) {
    const a = em.heVert[h], b = em.heVert[next(h)];
    if (a > b) continue;
    const fa = phi[a], fb = phi[b];
    if (Number.isNaN(fa) || Number.isNaN(fb)) continue;
    assert(fa !== 0 && fb !== 0, 'insertZeroSet: a vertex lies on the level set');
    if ((fa < 0) !== (fb < 0)) cuts.push(a, b, fa / (fa - fb));
  }
  const mark = new Uint8Array(em.nV + cuts.length / 3 + 8);
  for (let k = 0; k < cuts.length; k += 3) {
    const h = findHalfEdge(em, cuts[k], cuts[k + 1]);
    mark[splitEdge(em, h, cuts[k + 2])] = 1;
  }
  return mark;
}

/** Grows a 0/1 vertex mark to the mesh's current vertex count. */
export function growMark(mark: Uint8Array, n: number): Uint8Array {
  if (mark.length >= n) return mark;
  const m = new Uint8Array(n);
  m.set(mark);
  return m;
}

/** True when some curve runs through v. O(degree). */
export function onCurve(em: EditMesh, v: number): boolean {
  for (const h of fan(em, v)) if (em.heCurve[h] !== 0) return true;
  return false;
}

/**
 * The vertex off all curves and not in `avoid` that is farthest (in edge hops) from every curve — a
 * basepoint in the middle of its region. `within`, when given, restricts candidates. O(V x degree).
 */
export function farthestFreeVertex(em: EditMesh, avoid: number[] = [], within?: (v: number) => boolean): number {
  const dist = new Int32Array(em.nV).fill(-1);
  let queue: number[] = [];
  for (let v = 0; v < em.nV; v++) if (onCurve(em, v)) { dist[v] = 0; queue.push(v); }
  while (queue.length) {
    const nextQ: number[] = [];
    for (const v of queue) {
      for (const h of fan(em, v)) {
        const w = em.heVert[next(h)];
        if (dist[w] < 0) { dist[w] = dist[v] + 1; nextQ.push(w); }
      }
    }
    queue = nextQ;
  }
  let best = -1;
  for (let v = 0; v < em.nV; v++) {
    if (dist[v] <= 0 || avoid.includes(v) || (within && !within(v))) continue;
    if (best < 0 || dist[v] > dist[best]) best = v;
  }
  return best;
}
