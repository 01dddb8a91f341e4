/**
 * Parallel copies and corner cuts on a labelled mesh (GEOMETRY.md, "Parallel copy of a curve on one
 * side"): split the chords (unlabelled-by-the-cycle edges with both ends on the cycle), then split every
 * spoke inside the left wedges; the spoke points join up into a cycle parallel to the original.
 */
import { assert } from '../base/assert.js';
import { findHalfEdge, setEdgeLabel, splitEdge, type EditMesh } from '../mesh/edit.js';
import { next, prev } from '../mesh/tri-mesh.js';
import { fan } from './labels.js';

/** Splits, at t from the first vertex, each listed vertex pair that is still an edge; returns the new vertices. */
export function splitPairs(em: EditMesh, pairs: number[], t: number): number[] {
  const out: number[] = [];
  for (let k = 0; k < pairs.length; k += 2) {
    const h = findHalfEdge(em, pairs[k], pairs[k + 1]);
    assert(h >= 0, `splitPairs: ${pairs[k]} and ${pairs[k + 1]} are not joined`);
    out.push(splitEdge(em, h, t));
  }
  return out;
}

/** Splits every edge with both ends on the cycle that is not one of the cycle's own edges. O(n x degree). */
export function splitChords(em: EditMesh, cyc: ArrayLike<number>): void {
  const inC = new Uint8Array(em.nV);
  for (let i = 0; i < cyc.length; i++) inC[cyc[i]] = 1;
  const own = new Set<string>();
  for (let i = 0; i < cyc.length; i++) {
    const a = cyc[i], b = cyc[(i + 1) % cyc.length];
    own.add(a < b ? `${a},${b}` : `${b},${a}`);
  }
  const pairs: number[] = [];
  for (let i = 0; i < cyc.length; i++) {
    const a = cyc[i];
    for (const h of fan(em, a)) {
      const b = em.heVert[next(h)];
      if (b > a && inC[b] && !own.has(`${a},${b}`)) pairs.push(a, b);
    }
  }
  splitPairs(em, pairs, 0.5);
}

/**
 * The spokes on the left of the closed cycle at cyc[i]: outgoing half-edges strictly between the cycle's
 * outgoing edge and its incoming edge, counter-clockwise (faces are CCW, so the left of a -> b is the face of
 * a -> b). Returned as far-end vertices in CCW order. O(degree).
 */
export function leftSpokes(em: EditMesh, cyc: ArrayLike<number>, i: number): number[] {
  const n = cyc.length, v = cyc[i], nxt = cyc[(i + 1) % n], prv = cyc[(i + n - 1) % n];
  let h = findHalfEdge(em, v, nxt);
  assert(h >= 0, 'leftSpokes: cycle is not an edge path');
  const out: number[] = [];
  for (let guard = 0; guard < 10000; guard++) {
    h = em.heTwin[prev(h)];
    const w = em.heVert[next(h)];
    if (w === prv) return out;
    out.push(w);
  }
  assert(false, 'leftSpokes: fan does not close');
}

/**
 * Builds a parallel copy of the closed cycle on its left at fraction t of each spoke, labels it `label`
 * and returns it (same direction as cyc). O(n x degree).
 */
export function parallelCopyLeft(em: EditMesh, cyc: ArrayLike<number>, t: number, label: number): number[] {
  splitChords(em, cyc);
  const pairs: number[] = [];
  const perVertex: number[] = [];
  for (let i = 0; i < cyc.length; i++) {
    const sp = leftSpokes(em, cyc, i);
    assert(sp.length > 0, 'parallelCopyLeft: an empty wedge after chord splitting');
    for (let j = sp.length - 1; j >= 0; j--) pairs.push(cyc[i], sp[j]);
    perVertex.push(sp.length);
  }
  const copy = splitPairs(em, pairs, t);
  for (let i = 0; i < copy.length; i++) {
    const h = findHalfEdge(em, copy[i], copy[(i + 1) % copy.length]);
    assert(h >= 0, 'parallelCopyLeft: consecutive spoke points are not joined');
    setEdgeLabel(em, h, label);
  }
  return copy;
}

/**
 * Cuts the corner of vertex c between its outgoing half-edges toward `from` and `to` (counter-clockwise
 * from `from` to `to`): splits every spoke of that wedge at 1/2 and returns the chain of new vertices,
 * from the `from` side to the `to` side. The inner halves keep the labels; callers relabel. O(degree).
 */
export function cutCorner(em: EditMesh, c: number, from: number, to: number): number[] {
  let h = findHalfEdge(em, c, from);
  assert(h >= 0, 'cutCorner: not joined');
  const pairs = [c, from];
  for (let guard = 0; guard < 10000; guard++) {
    h = em.heTwin[prev(h)];
    const w = em.heVert[next(h)];
    pairs.push(c, w);
    if (w === to) return splitPairs(em, pairs, 0.5);
  }
  assert(false, 'cutCorner: fan does not close');
}
