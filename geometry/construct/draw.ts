/**
 * Drawing curves: a closed vertex path (clicks joined by `shortestPath`, Dijkstra 1959 on edge lengths)
 * or a polyline of surface points cut into the mesh (GEOMETRY.md, "Path insertion": each point becomes a
 * vertex by snapping or splitting, then a straight walk face to face splits each crossed edge; a crossing
 * of a triangle splits its entry and exit edges, which joins them). New curves get the next free index of
 * their family. Refusals name the reason and the vertex (user numbering).
 */
import { fail, type Problem, type Result } from '../base/result.js';
import { findHalfEdge, setEdgeLabel, splitEdge, splitFace, type EditMesh } from '../mesh/edit.js';
import { next, type TriMesh } from '../mesh/tri-mesh.js';
import type { CurveFamily, HeegaardDiagram } from '../diagram/types.js';
import { closeDiagram, fan, isIndex, openDiagram, wsLabel, type Workspace } from './labels.js';
import { onCurve } from './paths.js';
import { MinHeap } from './heap.js';

/** A point on the surface: a face of the diagram's mesh and barycentric weights of its three corners. */
export interface SurfacePoint {
  face: number;
  bary: [number, number, number];
}

const len = (p: Float64Array, a: number, b: number) => Math.hypot(p[3 * a] - p[3 * b], p[3 * a + 1] - p[3 * b + 1], p[3 * a + 2] - p[3 * b + 2]);

/** The corner of a surface point's face with the largest weight. */
export function nearestCorner(mesh: TriMesh, p: SurfacePoint): number {
  const b = p.bary, k = b[0] >= b[1] && b[0] >= b[2] ? 0 : b[1] >= b[2] ? 1 : 2;
  return mesh.heVert[3 * p.face + k];
}

/**
 * Shortest path along mesh edges (Dijkstra 1959, edge lengths) between two vertices or surface points
 * (snapped to their nearest corner). `blocked(v)` vertices are never entered (the ends excepted), nor
 * `blockedEdge(h)` half-edges followed.
 * Returns the vertex list from start to end, or null if unreachable. O((V + E) log V).
 */
export function shortestPath(
  mesh: TriMesh, from: number | SurfacePoint, to: number | SurfacePoint,
  blocked?: (v: number) => boolean, blockedEdge?: (h: number) => boolean,
): number[] | null {
  const s = typeof from === 'number' ? from : nearestCorner(mesh, from);
  const t = typeof to === 'number' ? to : nearestCorner(mesh, to);
  if (!(s >= 0 && s < mesh.nV && t >= 0 && t < mesh.nV)) return null;
  const dist = new Float64Array(mesh.nV).fill(Infinity), prevV = new Int32Array(mesh.nV).fill(-1);
  const heap = new MinHeap();
  dist[s] = 0;
  heap.push(s, 0);
  while (heap.size) {
    const v = heap.pop();
    if (v === t) break;
    const dv = dist[v];
    const first = mesh.vertHe[v];
    let h = first;
    do {
      const w = mesh.heVert[next(h)];
      if ((w === t || !blocked || !blocked(w)) && !(blockedEdge && blockedEdge(h))) {
        const nd = dv + len(mesh.pos, v, w);
        if (nd < dist[w]) { dist[w] = nd; prevV[w] = v; heap.push(w, nd); }
      }
      h = mesh.heTwin[h % 3 === 0 ? h + 2 : h - 1];
    } while (h !== first && h >= 0);
  }
  if (s !== t && prevV[t] < 0) return null;
  const path = [t];
  while (path[path.length - 1] !== s) path.push(prevV[path[path.length - 1]]);
  return path.reverse();
}

/** Next free index in a family. */
const nextIndex = (ws: Workspace, family: CurveFamily) => ws.curves.filter((c) => c.family === family).length;

/** Labels the closed vertex cycle as a new curve of `family` in the workspace, or gives the problem. */
function addCycle(ws: Workspace, family: CurveFamily, vs: number[]): Problem | null {
  const em = ws.em, id = ws.curves.length + 1;
  const at = (v: number) => wsLabel(ws, v);
  if (!Array.isArray(vs) || vs.some((v) => !isIndex(v, em.nV))) return { code: 'bad-vertex', message: 'the curve must be a list of vertex indices of the surface' };
  if (vs.length < 3) return { code: 'curve-too-short', message: 'a curve needs at least three vertices' };
  const seen = new Set<number>();
  for (const v of vs) {
    if (seen.has(v)) return { code: 'curve-self-crossing', message: `the curve passes vertex ${at(v)} twice`, vertices: [at(v)] };
    seen.add(v);
  }
  for (const b of ws.basepoints) if (seen.has(b.vertex)) return { code: 'curve-over-basepoint', message: `the curve runs through basepoint ${b.kind}_${b.index + 1} at vertex ${at(b.vertex)}`, vertices: [at(b.vertex)] };
  for (let i = 0; i < vs.length; i++) {
    const a = vs[i], b = vs[(i + 1) % vs.length];
    const h = findHalfEdge(em, a, b);
    if (h < 0) return { code: i === vs.length - 1 ? 'curve-not-closed' : 'curve-not-edge-path', message: i === vs.length - 1 ? `the curve does not close: its last vertex ${at(a)} is not joined to its first vertex ${at(b)}` : `vertices ${at(a)} and ${at(b)} are not joined by an edge`, vertices: [at(a), at(b)] };
    if (em.heCurve[h] !== 0) {
      const other = ws.curves[Math.abs(em.heCurve[h]) - 1];
      return { code: other.family === family ? 'touches-own-family' : 'runs-along-curve', message: `the curve runs along ${other.family}_${other.index + 1} between vertices ${at(a)} and ${at(b)}`, vertices: [at(a), at(b)] };
    }
    setEdgeLabel(em, h, id);
  }
  ws.curves.push({ family, index: nextIndex(ws, family), start: vs[0] });
  return null;
}

/**
 * Adds a curve of `family` along the closed vertex cycle `vertices` (consecutive vertices joined by mesh
 * edges; the last joins the first). The diagram may still be incomplete (partial validation), but the new
 * curve must not touch its own family, run along or touch without crossing the other family, or fail to close.
 */
export function addCurve(d: HeegaardDiagram, family: CurveFamily, vertices: number[]): Result<HeegaardDiagram> {
  if (family !== 'alpha' && family !== 'beta') return fail({ code: 'bad-family', message: `family must be alpha or beta (got ${String(family)})` });
  const ws = openDiagram(d);
  if (!ws.ok) return ws;
  const why = addCycle(ws.value, family, vertices);
  return why ? fail(why) : closeDiagram(ws.value, { partial: true });
}

/** Locates a 3D point on the current mesh: the face (and weights) whose plane and triangle fit it best. O(F). */
function locate(em: EditMesh, P: number[]): { face: number; bary: number[] } {
  let best = -1, bestScore = Infinity, bestBary = [1, 0, 0];
  const p = em.pos;
  for (let f = 0; f < em.nF; f++) {
    const a = em.heVert[3 * f], b = em.heVert[3 * f + 1], c = em.heVert[3 * f + 2];
    const u = [0, 1, 2].map((k) => p[3 * b + k] - p[3 * a + k]), v = [0, 1, 2].map((k) => p[3 * c + k] - p[3 * a + k]);
    const w = [0, 1, 2].map((k) => P[k] - p[3 * a + k]);
    const uu = dot(u, u), uv = dot(u, v), vv = dot(v, v), wu = dot(w, u), wv = dot(w, v);
    const den = uu * vv - uv * uv;
    if (!(den > 0)) continue;
    const s = (vv * wu - uv * wv) / den, t = (uu * wv - uv * wu) / den;
    const bary = [1 - s - t, s, t];
    const out = Math.max(0, -Math.min(...bary));
    const off = [0, 1, 2].map((k) => w[k] - s * u[k] - t * v[k]);
    const score = out * Math.sqrt(uu + vv) + Math.sqrt(dot(off, off));
    if (score < bestScore) { bestScore = score; best = f; bestBary = bary; }
  }
  return { face: best, bary: bestBary };
}
const dot = (a: number[], b: number[]) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];

/** Makes a vertex at 3D point P: snaps to a free nearby corner, splits an edge it lies on, or splits its face. */
function insertPoint(em: EditMesh, P: number[], used: Set<number>): number {
  const { face, bary } = locate(em, P);
  const corners = [0, 1, 2].map((k) => em.heVert[3 * face + k]);
  const k = bary.indexOf(Math.max(...bary));
  if (bary[k] > 0.85 && !onCurve(em, corners[k]) && !used.has(corners[k])) return corners[k];
  const b = bary.map((x) => Math.max(x, 0));
  const small = b.indexOf(Math.min(...b));
  if (b[small] < 0.05) {
    // Near the edge opposite corner `small`: split that edge.
    const h = 3 * face + ((small + 1) % 3);
    const wa = b[(small + 1) % 3], wb = b[(small + 2) % 3];
    return splitEdge(em, h, Math.min(0.95, Math.max(0.05, wb / (wa + wb))));
  }
  return splitFace(em, face, b[0], b[1], b[2]);
}

/**
 * Walks straight from vertex A toward vertex B, splitting each crossed edge (GEOMETRY.md "Path insertion"),
 * labelling the path with `id`. Returns the vertices after A up to B, or null when the straight walk fails.
 */
function straightWalk(em: EditMesh, A: number, B: number, id: number, used: Set<number>, out: number[]): boolean {
  const p = em.pos;
  let cur = A;
  for (let step = 0; step < 4000; step++) {
    const hB = findHalfEdge(em, cur, B);
    if (hB >= 0) {
      if (em.heCurve[hB] === 0) setEdgeLabel(em, hB, id);
      out.push(B);
      return true;
    }
    const d = [0, 1, 2].map((k) => p[3 * B + k] - p[3 * cur + k]);
    let pick = -1, pickS = 0, pickQ = -Infinity;
    for (const h of fan(em, cur)) {
      const x = em.heVert[next(h)], y = em.heVert[next(next(h))];
      const u = [0, 1, 2].map((k) => p[3 * x + k] - p[3 * cur + k]), v = [0, 1, 2].map((k) => p[3 * y + k] - p[3 * cur + k]);
      const uu = dot(u, u), uv = dot(u, v), vv = dot(v, v), du = dot(d, u), dv = dot(d, v);
      const den = uu * vv - uv * uv;
      if (!(den > 0)) continue;
      const al = (vv * du - uv * dv) / den, be = (uu * dv - uv * du) / den;
      const q = Math.min(al, be) / (Math.abs(al) + Math.abs(be) + 1e-300);
      if (q > pickQ) { pickQ = q; pick = h; pickS = be / (al + be); }
    }
    if (pick < 0 || pickQ < -1e-9) return false;
    const e = next(pick), x = em.heVert[e], y = em.heVert[next(e)];
    if (Math.abs(em.heCurve[e]) === id) return false;
    let nxt: number;
    if (pickS < 0.1 && !onCurve(em, x) && !used.has(x)) nxt = x;
    else if (pickS > 0.9 && !onCurve(em, y) && !used.has(y)) nxt = y;
    else nxt = splitEdge(em, e, Math.min(0.95, Math.max(0.05, pickS)));
    setEdgeLabel(em, findHalfEdge(em, cur, nxt), id);
    used.add(nxt);
    out.push(nxt);
    cur = nxt;
    if (cur === B) return true;
  }
  return false;
}

/**
 * One segment of a drawn curve: the straight walk, or — when it fails — the partial walk is unlabelled and
 * replaced by the shortest edge path avoiding the curve so far and every curve edge. Returns the vertices
 * after A up to B, or null.
 */
function segment(em: EditMesh, A: number, B: number, id: number, used: Set<number>): number[] | null {
  const out: number[] = [];
  if (straightWalk(em, A, B, id, used, out)) return out;
  let prevV = A;
  for (const v of out) {
    const h = findHalfEdge(em, prevV, v);
    if (h >= 0 && Math.abs(em.heCurve[h]) === id) setEdgeLabel(em, h, 0);
    if (v !== B) used.delete(v);
    prevV = v;
  }
  const path = shortestPath(em, A, B, (v) => used.has(v) && v !== B, (h) => em.heCurve[h] !== 0);
  if (!path) return null;
  for (let i = 0; i + 1 < path.length; i++) setEdgeLabel(em, findHalfEdge(em, path[i], path[i + 1]), id);
  for (const v of path) used.add(v);
  return path.slice(1);
}

/**
 * Cuts the mesh along a closed polyline of surface points (at least 3, on the diagram's mesh) and makes it
 * a new curve of `family`. Each segment is a straight walk across faces (points snap to free vertices
 * within 15% and to edges within 5% of a face); where the walk fails, the segment follows the shortest edge
 * path that avoids the curve so far and all curve edges, and is refused (with its two end vertices) when
 * there is none. Refusals: the curve touches its own family, runs along or is tangent to the
 * other family, crosses itself, or passes a basepoint — each with the vertex.
 */
export function drawCurve(d: HeegaardDiagram, family: CurveFamily, points: SurfacePoint[]): Result<HeegaardDiagram> {
  if (family !== 'alpha' && family !== 'beta') return fail({ code: 'bad-family', message: `family must be alpha or beta (got ${String(family)})` });
  if (!Array.isArray(points) || points.length < 3) return fail({ code: 'curve-too-short', message: 'draw at least three points to make a closed curve' });
  for (const [i, q] of points.entries()) {
    if (!(q && Number.isInteger(q.face) && q.face >= 0 && q.face < d.mesh.nF && Array.isArray(q.bary) && q.bary.length === 3 && q.bary.every(Number.isFinite))) {
      return fail({ code: 'bad-point', message: `point ${i + 1} is not on the surface (needs a face from 0 to ${d.mesh.nF - 1} and three barycentric weights)` });
    }
  }
  const P = points.map((q) => {
    const s = q.bary[0] + q.bary[1] + q.bary[2] || 1;
    return [0, 1, 2].map((k) => q.bary.reduce((acc, w, c) => acc + (w / s) * d.mesh.pos[3 * d.mesh.heVert[3 * q.face + c] + k], 0));
  });
  const ws0 = openDiagram(d);
  if (!ws0.ok) return ws0;
  const ws = ws0.value, em = ws.em, id = ws.curves.length + 1;
  const used = new Set<number>();
  const verts: number[] = [];
  for (const q of P) {
    const v = insertPoint(em, q, used);
    if (verts[verts.length - 1] !== v) { verts.push(v); used.add(v); }
  }
  if (verts.length > 1 && verts[0] === verts[verts.length - 1]) verts.pop();
  if (verts.length < 2) return fail({ code: 'curve-too-short', message: 'the points are too close together to make a curve' });
  const cycle: number[] = [verts[0]];
  for (let i = 0; i < verts.length; i++) {
    const A = cycle[cycle.length - 1], B = verts[(i + 1) % verts.length];
    const seg = segment(em, A, B, id, used);
    if (!seg) {
      return fail({ code: 'curve-cannot-cut', message: `could not join vertex ${wsLabel(ws, A)} to vertex ${wsLabel(ws, B)} without running into the curve drawn so far or along another curve; add points closer together`, vertices: [wsLabel(ws, A), wsLabel(ws, B)] });
    }
    cycle.push(...seg);
  }
  cycle.pop();
  // Labels were placed during the walk; check the cycle like a clicked one.
  for (let i = 0; i < cycle.length; i++) {
    const h = findHalfEdge(em, cycle[i], cycle[(i + 1) % cycle.length]);
    if (h >= 0 && Math.abs(em.heCurve[h]) === id) setEdgeLabel(em, h, 0);
  }
  const why = addCycle(ws, family, cycle);
  return why ? fail(why) : closeDiagram(ws, { partial: true });
}
