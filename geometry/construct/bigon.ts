/**
 * Removing an empty bigon (the inverse of a finger move; an isotopy of the beta curve, Ozsváth–Szabó 2004):
 * a region that is a disk with two corners x, y and no basepoint, bounded by an alpha arc and a beta arc.
 * The beta arc is pushed across the alpha arc: beta' leaves beta's vertex p before x, runs parallel to the
 * alpha arc on its far side through the midpoints of the spokes there (as in a parallel copy, GEOMETRY.md)
 * and rejoins beta at the vertex q after y. x and y stop being intersection points.
 */
import { fail, type Result } from '../base/result.js';
import { findHalfEdge, setEdgeLabel, type EditMesh } from '../mesh/edit.js';
import { faceOf, next } from '../mesh/tri-mesh.js';
import { analyzeDiagram } from '../diagram/analyze.js';
import type { HeegaardDiagram } from '../diagram/types.js';
import { closeDiagram, fan, openDiagram, wsLabel } from './labels.js';
import { splitChords, splitPairs } from './parallel.js';

/** Vertices of the curve arc from x leaving along neighbour `first` until y (inclusive). */
function arcFrom(cycle: Int32Array, x: number, first: number, y: number): number[] {
  const n = cycle.length, i = cycle.indexOf(x);
  const step = cycle[(i + 1) % n] === first ? 1 : -1;
  const out = [x];
  for (let k = 1; k <= n; k++) {
    const v = cycle[(((i + step * k) % n) + n) % n];
    out.push(v);
    if (v === y) return out;
  }
  return out;
}

/**
 * Far ends of the spokes of v strictly between the rays to `from` and `to`, in the rotational sense whose
 * faces avoid the region mask; from the `from` side to the `to` side.
 */
function sector(em: EditMesh, v: number, from: number, to: number, inR: (f: number) => boolean): number[] {
  const ring = fan(em, v), tips = ring.map((h) => em.heVert[next(h)]);
  const i = tips.indexOf(from), j = tips.indexOf(to), n = ring.length;
  const ccw: number[] = [], cw: number[] = [];
  let touchesCcw = false, touchesCw = false;
  for (let k = (i + 1) % n; ; k = (k + 1) % n) {
    if (inR(faceOf(ring[(k - 1 + n) % n]))) touchesCcw = true;
    if (k === j) break;
    ccw.push(tips[k]);
  }
  for (let k = (i - 1 + n) % n; ; k = (k - 1 + n) % n) {
    if (inR(faceOf(ring[k]))) touchesCw = true;
    if (k === j) break;
    cw.push(tips[k]);
  }
  return touchesCcw && !touchesCw ? cw : ccw;
}

/**
 * Removes the empty bigon `region` (an id from analyzeDiagram) by pushing its beta arc across its alpha arc.
 * Refuses regions that are not bigons, that hold a basepoint, or whose arcs are not simple. Returns a new,
 * fully validated diagram with two fewer intersection points.
 */
export function removeBigon(d: HeegaardDiagram, region: number): Result<HeegaardDiagram> {
  const an = analyzeDiagram(d);
  if (!an.ok) return an;
  const a = an.value, R = Number.isInteger(region) ? a.regions.find((r) => r.id === region) : undefined;
  if (!R) return fail({ code: 'unknown-region', message: `there is no region ${Number.isInteger(region) ? region + 1 : String(region)}` });
  if (R.chi !== 1 || R.corners.length !== 2) return fail({ code: 'not-a-bigon', message: `region ${region + 1} is not a bigon (it has ${R.corners.length} corners and Euler characteristic ${R.chi})` });
  if (R.basepoints.length) return fail({ code: 'bigon-not-empty', message: `region ${region + 1} holds a basepoint; removing it would move a curve across the basepoint` });
  const [px, py] = R.corners.map((c) => a.points[c.point]);
  if (px.alpha !== py.alpha || px.beta !== py.beta) return fail({ code: 'not-a-bigon', message: `region ${region + 1} is bounded by more than one alpha or beta curve` });
  const ws0 = openDiagram(d);
  if (!ws0.ok) return ws0;
  const ws = ws0.value, em = ws.em;
  const inR = (f: number) => f < a.faceRegion.length && a.faceRegion[f] === region;
  const ci = d.curves.findIndex((c) => c.family === 'alpha' && c.index === px.alpha);
  const cb = d.curves.findIndex((c) => c.family === 'beta' && c.index === px.beta);
  const x = px.vertex, y = py.vertex;
  // Each arc starts along the ray at x that bounds the region.
  const rayInR = (c: number) => fan(em, x).find((h) => Math.abs(em.heCurve[h]) === c + 1 && (inR(faceOf(h)) || inR(faceOf(em.heTwin[h]))));
  const hA = rayInR(ci), hB = rayInR(cb);
  if (hA === undefined || hB === undefined) return fail({ code: 'not-a-bigon', message: `could not follow the sides of region ${region + 1}` });
  const alphaArc = arcFrom(d.curves[ci].vertices, x, em.heVert[next(hA)], y);
  const betaArc = arcFrom(d.curves[cb].vertices, x, em.heVert[next(hB)], y);
  const bv = d.curves[cb].vertices, n = bv.length, ix = bv.indexOf(x), iy = bv.indexOf(y);
  const forward = bv[(ix + 1) % n] === betaArc[1];
  const p = forward ? bv[(ix - 1 + n) % n] : bv[(ix + 1) % n];
  const q = forward ? bv[(iy + 1) % n] : bv[(iy - 1 + n) % n];
  splitChords(em, alphaArc);
  const m = alphaArc.length - 1;
  const pairs: number[] = [x, p];
  for (const w of sector(em, x, p, alphaArc[1], inR)) pairs.push(x, w);
  for (let i = 1; i < m; i++) for (const w of sector(em, alphaArc[i], alphaArc[i - 1], alphaArc[i + 1], inR)) pairs.push(alphaArc[i], w);
  for (const w of sector(em, y, alphaArc[m - 1], q, inR)) pairs.push(y, w);
  pairs.push(y, q);
  const chain = splitPairs(em, pairs, 0.5);
  for (let i = 0; i + 1 < betaArc.length; i++) setEdgeLabel(em, findHalfEdge(em, betaArc[i], betaArc[i + 1]), 0);
  setEdgeLabel(em, findHalfEdge(em, x, chain[0]), 0);
  setEdgeLabel(em, findHalfEdge(em, y, chain[chain.length - 1]), 0);
  for (let i = 0; i + 1 < chain.length; i++) {
    const h = findHalfEdge(em, chain[i], chain[i + 1]);
    if (h < 0) return fail({ code: 'internal-bigon', message: `could not push beta across the bigon near vertex ${wsLabel(ws, x)}; this is a bug in Quadrant` });
    setEdgeLabel(em, h, forward ? cb + 1 : -(cb + 1));
  }
  ws.curves[cb].start = p;
  return closeDiagram(ws);
}
