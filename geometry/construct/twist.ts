/**
 * Dehn twist T_a(b) of a curve b along a curve a (Farb–Margalit, A Primer on Mapping Class Groups, 2012,
 * ch. 3): take k = |a ∩ b| nested parallel copies of a on its left, then resolve every crossing of b with a
 * copy the same way — a positive (left) twist turns left onto the copy wherever b meets it — so that b runs
 * once around a at each crossing (GEOMETRY.md, "Dehn twist"). Homology: [T_a(b)] = [b] ± î(a, b)[a]
 * (Farb–Margalit 2012, Prop. 6.3). Cost O(k x (|a| + k) x degree) new vertices and edits.
 */
import { fail, type Result } from '../base/result.js';
import { setEdgeLabel, findHalfEdge, type EditMesh } from '../mesh/edit.js';
import { next } from '../mesh/tri-mesh.js';
import { curveName, type HeegaardDiagram } from '../diagram/types.js';
import { closeDiagram, fan, isIndex, openDiagram, wsLabel } from './labels.js';
import { cutCorner, parallelCopyLeft } from './parallel.js';
import { smoothCurves } from './smooth.js';

/** Position in d.curves of the curve named alpha_<i> / beta_<i> (1-based as users see it), or -1. */
export function curveIndexByName(d: HeegaardDiagram, name: string): number {
  const m = /^(alpha|beta)_?(\d+)$/i.exec(name.trim());
  if (!m) return -1;
  const fam = m[1].toLowerCase(), idx = Number(m[2]) - 1;
  return d.curves.findIndex((c) => c.family === fam && c.index === idx);
}

/** Curve half-edges around c, counter-clockwise: [half-edge, |label|] pairs. */
function curveRays(em: EditMesh, c: number): [number, number][] {
  const out: [number, number][] = [];
  for (const h of fan(em, c)) if (em.heCurve[h] !== 0) out.push([h, Math.abs(em.heCurve[h])]);
  return out;
}

/** Resolves the crossing of b (label B) with a copy (label L) at c; chain edges get label CH. */
function resolveCrossing(em: EditMesh, c: number, B: number, CH: number, negative: boolean): boolean {
  const rays = curveRays(em, c);
  if (rays.length !== 4 || rays[0][1] === rays[1][1] || rays[0][1] !== rays[2][1]) return false;
  const wedges: [number, number][] = [];
  for (let i = 0; i < 4; i++) {
    if (rays[i][1] !== B) continue;
    const tipB = em.heVert[next(rays[i][0])];
    const tipL = em.heVert[next(rays[negative ? (i + 1) % 4 : (i + 3) % 4][0])];
    wedges.push(negative ? [tipB, tipL] : [tipL, tipB]);
  }
  for (const [from, to] of wedges) {
    const chain = cutCorner(em, c, from, to);
    setEdgeLabel(em, findHalfEdge(em, c, chain[0]), 0);
    setEdgeLabel(em, findHalfEdge(em, c, chain[chain.length - 1]), 0);
    for (let s = 0; s + 1 < chain.length; s++) setEdgeLabel(em, findHalfEdge(em, chain[s], chain[s + 1]), CH);
  }
  return true;
}

/** Walks the union of edges labelled with any id in `ids` from half-edge h0 (each vertex on it has exactly two) and relabels it `target` in walking direction. */
function mergeInto(em: EditMesh, ids: Set<number>, target: number, h0: number): boolean {
  const v0 = em.heVert[h0];
  let h = h0;
  for (let guard = 0; guard < 3 * em.nF; guard++) {
    setEdgeLabel(em, h, target);
    const w = em.heVert[next(h)];
    if (w === v0) return true;
    const back = em.heTwin[h];
    let nextH = -1, count = 0;
    for (const g of fan(em, w)) {
      if (g !== back && ids.has(Math.abs(em.heCurve[g]))) { nextH = g; count++; }
    }
    if (count !== 1) return false;
    h = nextH;
  }
  return false;
}

/** Options for dehnTwist. */
export interface TwistOptions {
  /** Twist the other way, T_a^{-1}. */
  negative?: boolean;
  /** Smoothing passes over the new vertices of the twisted curve afterwards (default 3; 0 keeps the raw staircase). */
  smooth?: number;
}

/**
 * Replaces curve number `curve` (position in d.curves) by its Dehn twist along curve number `along`.
 * Refuses when `along` meets another curve of the twisted curve's family (the result would meet it).
 * Returns a new validated diagram; the input is untouched.
 */
export function dehnTwist(d: HeegaardDiagram, curve: number, along: number, options: TwistOptions = {}): Result<HeegaardDiagram> {
  const n = d.curves.length;
  if (!isIndex(curve, n) || !isIndex(along, n)) return fail({ code: 'unknown-curve', message: `curve positions must be 0 to ${n - 1}` });
  const ws0 = openDiagram(d);
  if (!ws0.ok) return ws0;
  const ws = ws0.value, em = ws.em;
  const bc = d.curves[curve], ac = d.curves[along];
  const onB = new Uint8Array(em.nV);
  for (const v of bc.vertices) onB[v] = 1;
  for (let c = 0; c < n; c++) {
    if (c === curve || d.curves[c].family !== bc.family) continue;
    const other = new Set(d.curves[c].vertices);
    const v = ac.vertices.find((x) => other.has(x));
    if (v !== undefined) {
      return fail({ code: 'twist-would-meet', message: `${curveName(ac)} meets ${curveName(d.curves[c])} at vertex ${wsLabel(ws, v)}, so twisting ${curveName(bc)} along it would make ${curveName(bc)} meet ${curveName(d.curves[c])}`, vertices: [wsLabel(ws, v)] });
    }
  }
  const k = curve === along ? 0 : ac.vertices.reduce((s, v) => s + onB[v], 0);
  if (k === 0) return closeDiagram(ws);
  const B = curve + 1, CH = n + k + 1;
  const ids = new Set([B, CH]);
  let cur: number[] = Array.from(ac.vertices);
  const copies: number[][] = [];
  for (let m = 1; m <= k; m++) {
    cur = parallelCopyLeft(em, cur, 1 / (k + 2 - m), n + m);
    copies.push(cur);
    ids.add(n + m);
  }
  for (const copy of copies) {
    for (const c of copy) {
      const rays = curveRays(em, c);
      if (rays.length === 4 && rays.some((r) => r[1] === B) && !resolveCrossing(em, c, B, CH, !!options.negative)) {
        return fail({ code: 'internal-twist', message: `could not resolve the crossing at vertex ${wsLabel(ws, c)}; this is a bug in Quadrant` });
      }
    }
  }
  // Start on an edge of b outside the twisting collar (an original edge, unsplit), so b' keeps b's direction
  // there; inside the collar b' may run along pieces of b backwards when î(a, b) counts opposite signs.
  let h0 = -1;
  const bv = bc.vertices;
  for (let i = 0; i < bv.length && h0 < 0; i++) {
    const h = findHalfEdge(em, bv[i], bv[(i + 1) % bv.length]);
    if (h >= 0 && em.heCurve[h] === B) h0 = h;
  }
  if (h0 < 0 || !mergeInto(em, ids, B, h0)) return fail({ code: 'internal-twist', message: `the twisted ${curveName(bc)} did not close up; this is a bug in Quadrant` });
  for (let h = 0; h < 3 * em.nF; h++) {
    if (Math.abs(em.heCurve[h]) > n) return fail({ code: 'internal-twist', message: `the twisted ${curveName(bc)} fell into several pieces; this is a bug in Quadrant` });
  }
  ws.curves[curve].start = em.heVert[h0];
  const out = closeDiagram(ws);
  const passes = options.smooth ?? 3;
  if (!out.ok || !(Number.isInteger(passes) && passes > 0)) return out;
  // Same connectivity as the validated `out`; only positions of the twisted curve move.
  const smoothed = smoothCurves(out.value, { iterations: Math.min(passes, 100), curves: [curve], fromVertex: d.mesh.nV });
  return smoothed.ok ? smoothed : out;
}
