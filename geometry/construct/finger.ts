/**
 * Finger move: push an arc of a curve b along an edge path across curves of the other family (an isotopy
 * of b; each crossed curve gains two intersection points and a bigon appears, Sarkar–Wang 2010 §3).
 * The new arc is the link of the path — the loop through the midpoints of every edge leaving the path
 * (GEOMETRY.md: "offset loop around a short arc from b across a, spliced into b").
 */
import { fail, type Problem, type Result } from '../base/result.js';
import { findHalfEdge, setEdgeLabel, type EditMesh } from '../mesh/edit.js';
import { next } from '../mesh/tri-mesh.js';
import { curveName, type HeegaardDiagram } from '../diagram/types.js';
import { closeDiagram, fan, isIndex, openDiagram, wsLabel, type Workspace } from './labels.js';
import { splitPairs } from './parallel.js';
import { growMark, traceMarked } from './paths.js';

/** Curve ids (label magnitudes) through v, counter-clockwise with their half-edges. */
function raysAt(em: EditMesh, v: number): { h: number; id: number }[] {
  const out: { h: number; id: number }[] = [];
  for (const h of fan(em, v)) if (em.heCurve[h] !== 0) out.push({ h, id: Math.abs(em.heCurve[h]) });
  return out;
}

/** Checks a finger path for curve id B; returns a problem or null. */
function checkPath(ws: Workspace, B: number, path: number[]): Problem | null {
  const em = ws.em, fam = ws.curves[B - 1].family;
  const at = (v: number) => wsLabel(ws, v);
  const bad = (code: string, message: string, v: number): Problem => ({ code, message, vertices: [at(v)] });
  if (!Array.isArray(path) || path.length < 2) return { code: 'finger-too-short', message: 'a finger path needs at least two vertices' };
  for (const v of path) if (!isIndex(v, em.nV)) return { code: 'finger-bad-vertex', message: `${String(v)} is not a vertex index of the surface` };
  if (new Set(path).size !== path.length) return bad('finger-not-simple', `the finger path visits vertex ${at(path[0])} or another vertex twice`, path[0]);
  if (!raysAt(em, path[0]).some((r) => r.id === B)) return bad('finger-start', `the finger path must start on ${curveName(ws.curves[B - 1])}`, path[0]);
  for (let i = 0; i + 1 < path.length; i++) {
    const h = findHalfEdge(em, path[i], path[i + 1]);
    if (h < 0) return bad('finger-not-edge-path', `vertices ${at(path[i])} and ${at(path[i + 1])} are not joined by an edge`, path[i]);
    if (em.heCurve[h] !== 0) return bad('finger-along-curve', `the finger path runs along a curve between vertices ${at(path[i])} and ${at(path[i + 1])}`, path[i]);
  }
  for (const b of ws.basepoints) if (path.includes(b.vertex)) return bad('finger-over-basepoint', `the finger would sweep over basepoint ${b.kind}_${b.index + 1} at vertex ${at(b.vertex)}`, b.vertex);
  if (raysAt(em, path[0]).length !== 2) return bad('finger-start-crossing', `start the finger at a vertex of ${curveName(ws.curves[B - 1])} that is not an intersection point (vertex ${at(path[0])} is)`, path[0]);
  const tip = path[path.length - 1];
  if (raysAt(em, tip).length) return bad('finger-tip-on-curve', `the finger must end off the curves, not at vertex ${at(tip)}`, tip);
  for (let i = 1; i + 1 < path.length; i++) {
    const rays = raysAt(em, path[i]);
    if (!rays.length) continue;
    const c = ws.curves[rays[0].id - 1];
    if (rays.length !== 2 || c.family === fam) return bad('finger-meets-family', `the finger path passes vertex ${at(path[i])} on ${curveName(c)}; it may only cross curves of the other family, one at a time`, path[i]);
    // Transversal crossing: the path's two edges at path[i] lie on opposite sides of the curve.
    const side = sideOf(em, path[i], rays[0].h, rays[1].h);
    if (side(path[i - 1]) === side(path[i + 1])) return bad('finger-tangent', `the finger path touches ${curveName(c)} at vertex ${at(path[i])} without crossing it`, path[i]);
  }
  return null;
}

/** Side (0/1) of each neighbour of v relative to the two curve rays r0, r1 through v. */
function sideOf(em: EditMesh, v: number, r0: number, r1: number): (w: number) => number {
  const ring = fan(em, v), s = new Map<number, number>();
  let side = 0;
  for (const h of ring) {
    if (h === r0 || h === r1) { side ^= 1; continue; }
    s.set(em.heVert[next(h)], side);
  }
  return (w) => s.get(w) ?? -1;
}

/**
 * Finger move on a workspace: curve id B (label) pushed along `path` (path[0] on the curve). Returns a
 * problem, or null on success (the workspace is then edited). O((path + degree) x degree).
 */
export function fingerMoveInPlace(ws: Workspace, B: number, path: number[]): Problem | null {
  const why = checkPath(ws, B, path);
  if (why) return why;
  const em = ws.em;
  const inT = new Uint8Array(em.nV);
  for (const v of path) inT[v] = 1;
  const pathEdge = new Set<string>();
  for (let i = 0; i + 1 < path.length; i++) pathEdge.add(`${Math.min(path[i], path[i + 1])},${Math.max(path[i], path[i + 1])}`);
  const chords: number[] = [];
  for (const a of path) for (const h of fan(em, a)) {
    const b = em.heVert[next(h)];
    if (b > a && inT[b] && !pathEdge.has(`${a},${b}`)) chords.push(a, b);
  }
  splitPairs(em, chords, 0.5);
  const spokes: number[] = [];
  const base: number[] = [];
  for (const a of path) for (const h of fan(em, a)) {
    const b = em.heVert[next(h)];
    if (b >= inT.length || !inT[b]) { spokes.push(a, b); base.push(a); }
  }
  const mids = splitPairs(em, spokes, 0.5);
  let mark = growMark(new Uint8Array(0), em.nV);
  for (const m of mids) mark[m] = 1;
  mark = growMark(mark, em.nV);
  // The curve's two edges at path[0] were split: their midpoints are where b meets the link.
  const p0 = path[0];
  const onB = mids.filter((m, k) => base[k] === p0 && em.heCurve[findHalfEdge(em, p0, m)] !== 0 && Math.abs(em.heCurve[findHalfEdge(em, p0, m)]) === B);
  const tipMid = mids[base.lastIndexOf(path[path.length - 1])];
  const loop = traceMarked(em, mark, onB[0]);
  const j1 = loop.indexOf(onB[1]), jt = loop.indexOf(tipMid);
  // Long arc: from onB[0] to onB[1] through the finger tip.
  const arc = jt < j1 ? loop.slice(0, j1 + 1) : [onB[0], ...loop.slice(j1).reverse()];
  const hIn = findHalfEdge(em, p0, arc[0]);
  const incoming = em.heCurve[hIn] < 0; // b runs arc[0] -> p0
  setEdgeLabel(em, hIn, 0);
  setEdgeLabel(em, findHalfEdge(em, p0, arc[arc.length - 1]), 0);
  for (let s = 0; s + 1 < arc.length; s++) {
    setEdgeLabel(em, findHalfEdge(em, arc[s], arc[s + 1]), incoming ? B : -B);
  }
  if (ws.curves[B - 1].start === p0) ws.curves[B - 1].start = arc[0];
  return null;
}

/**
 * Finger move of curve number `curve` (position in d.curves) along the vertex path `path`, which starts on
 * the curve, crosses curves of the other family transversally at vertices, and ends off all curves.
 * Each crossed curve gains two intersection points and a bigon. Returns a new validated diagram.
 */
export function fingerMove(d: HeegaardDiagram, curve: number, path: number[]): Result<HeegaardDiagram> {
  if (!isIndex(curve, d.curves.length)) return fail({ code: 'unknown-curve', message: `curve positions must be 0 to ${d.curves.length - 1}` });
  const ws = openDiagram(d);
  if (!ws.ok) return ws;
  const why = fingerMoveInPlace(ws.value, curve + 1, path);
  return why ? fail(why) : closeDiagram(ws.value);
}
