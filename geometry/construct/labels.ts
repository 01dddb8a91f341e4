/**
 * Bridge between a HeegaardDiagram (curves as vertex cycles) and an editable mesh whose half-edges carry
 * curve labels (GEOMETRY.md, "Mesh"). Every construction works on labels and ends with `closeDiagram`,
 * which reads the cycles back and checks the curve invariants (GEOMETRY.md, "Curve invariants"), so no
 * operation can hand back a broken diagram.
 */
import { fail, ok, type Problem, type Result } from '../base/result.js';
import { findHalfEdge, setEdgeLabel, toEditMesh, compactMesh, type EditMesh } from '../mesh/edit.js';
import { next, prev, validateConnectivity, type TriMesh } from '../mesh/tri-mesh.js';
import { curveName, vertexLabel, type Basepoint, type CurveFamily, type HeegaardDiagram } from '../diagram/types.js';
import { validateCurves } from '../diagram/validate.js';

/** A diagram being edited: labels on a growable mesh. curves[c] is the curve with label c + 1. */
export interface Workspace {
  em: EditMesh;
  curves: { family: CurveFamily; index: number; start: number }[];
  basepoints: Basepoint[];
  /** User-facing numbers of the original vertices (absent: v + 1). New vertices continue after the largest. */
  vertexLabels?: Int32Array;
  /** Largest user-facing number among the original vertices. */
  labelMax: number;
}

const problem = (code: string, message: string, vertices?: number[]): Problem =>
  vertices ? { code, message, vertices } : { code, message };

/** Opens a diagram for editing; the input is untouched. O(V + F + curve length x degree). */
export function openDiagram(d: HeegaardDiagram): Result<Workspace> {
  const em = toEditMesh(d.mesh);
  const curves: Workspace['curves'] = [];
  for (let c = 0; c < d.curves.length; c++) {
    const cv = d.curves[c], vs = cv.vertices;
    curves.push({ family: cv.family, index: cv.index, start: vs[0] });
    for (let i = 0; i < vs.length; i++) {
      const a = vs[i], b = vs[(i + 1) % vs.length];
      const h = findHalfEdge(em, a, b);
      if (h < 0) {
        return fail(problem('curve-not-edge-path', `${curveName(cv)} jumps from vertex ${vertexLabel(d, a)} to ${vertexLabel(d, b)}, which are not joined by a mesh edge`, [vertexLabel(d, a), vertexLabel(d, b)]));
      }
      if (em.heCurve[h] !== 0) {
        return fail(problem('curve-shares-edge', `${curveName(cv)} runs along the edge ${vertexLabel(d, a)}-${vertexLabel(d, b)}, which another curve (or itself) already uses`, [vertexLabel(d, a), vertexLabel(d, b)]));
      }
      setEdgeLabel(em, h, c + 1);
    }
  }
  let labelMax = d.mesh.nV;
  if (d.vertexLabels) for (let i = 0; i < d.vertexLabels.length; i++) labelMax = Math.max(labelMax, d.vertexLabels[i]);
  return ok({ em, curves, basepoints: d.basepoints.map((b) => ({ ...b })), vertexLabels: d.vertexLabels, labelMax });
}

/** User-facing number of vertex v in a workspace. */
export function wsLabel(ws: Workspace, v: number): number {
  const L = ws.vertexLabels;
  if (!L) return v + 1;
  if (v < L.length) return L[v];
  return ws.labelMax + (v - L.length) + 1;
}

/** Outgoing half-edges of v, counter-clockwise. O(degree). */
export function fan(m: TriMesh, v: number): number[] {
  const out: number[] = [];
  const first = m.vertHe[v];
  let h = first;
  do { out.push(h); h = m.heTwin[prev(h)]; } while (h !== first && h >= 0 && out.length < 100000);
  return out;
}

/** Checks the curve invariants at every vertex. O(V x degree). */
function checkVertices(ws: Workspace): Problem[] {
  const { em, curves } = ws;
  const errors: Problem[] = [];
  for (let v = 0; v < em.nV && errors.length < 20; v++) {
    const seq: number[] = [];
    for (const h of fan(em, v)) if (em.heCurve[h] !== 0) seq.push(em.heCurve[h]);
    if (seq.length === 0) continue;
    const ids = [...new Set(seq.map(Math.abs))];
    for (const id of ids) {
      const outs = seq.filter((l) => l === id).length, ins = seq.filter((l) => l === -id).length;
      if (outs !== 1 || ins !== 1) {
        errors.push(problem('curve-branches', `${curveName(curves[id - 1])} passes vertex ${wsLabel(ws, v)} ${outs === ins ? 'more than once' : 'without continuing'}`, [wsLabel(ws, v)]));
      }
    }
    if (ids.length > 2) {
      errors.push(problem('curves-crowd', `${ids.length} curves meet at vertex ${wsLabel(ws, v)}; at most one alpha and one beta may cross at a vertex`, [wsLabel(ws, v)]));
    } else if (ids.length === 2) {
      const [c1, c2] = ids.map((id) => curves[id - 1]);
      if (c1.family === c2.family) {
        errors.push(problem('same-family-meet', `${curveName(c1)} and ${curveName(c2)} meet at vertex ${wsLabel(ws, v)}; curves of one family must be disjoint`, [wsLabel(ws, v)]));
      } else if (seq.length === 4 && (Math.abs(seq[0]) !== Math.abs(seq[2]) || Math.abs(seq[1]) !== Math.abs(seq[3]))) {
        errors.push(problem('tangency', `${curveName(c1)} and ${curveName(c2)} touch without crossing at vertex ${wsLabel(ws, v)}`, [wsLabel(ws, v)]));
      }
    }
  }
  return errors;
}

/** Walks curve id from a half-edge carrying +id; returns the vertex cycle or null if it does not close. */
function walkCurve(em: EditMesh, id: number, startVertex: number): Int32Array | null {
  let h = -1;
  for (const g of fan(em, startVertex)) if (em.heCurve[g] === id) h = g;
  if (h < 0) {
    for (let g = 0; g < 3 * em.nF; g++) if (em.heCurve[g] === id) { h = g; break; }
  }
  if (h < 0) return null;
  const out: number[] = [];
  const first = em.heVert[h];
  let v = first;
  while (out.length <= em.nV) {
    out.push(v);
    const w = em.heVert[next(h)];
    if (w === first) return Int32Array.from(out);
    h = -1;
    for (const g of fan(em, w)) if (em.heCurve[g] === id) h = g;
    if (h < 0) return null;
    v = w;
  }
  return null;
}

/** `partial`: accept a diagram still being drawn (unequal curve counts, basepoint placement not final). */
export interface CloseOptions { partial?: boolean }
const PARTIAL_OK = new Set(['curve-count', 'too-few-curves', 'family-does-not-cut', 'curve-numbering', 'piece-without-basepoint', 'piece-with-several-basepoints']);

/**
 * Reads a workspace back into a new HeegaardDiagram after checking connectivity and every curve
 * invariant; refusals name the curve and vertex (user numbering). O(V x degree + F).
 */
export function closeDiagram(ws: Workspace, options: CloseOptions = {}): Result<HeegaardDiagram> {
  const { em } = ws;
  const conn = validateConnectivity(em);
  if (conn) return fail(problem('internal-mesh', `the edited mesh is broken (${conn}); this is a bug in Quadrant`));
  const errors = checkVertices(ws);
  if (errors.length) return fail(...errors);
  const counts = new Int32Array(ws.curves.length + 1);
  for (let h = 0; h < 3 * em.nF; h++) if (em.heCurve[h] > 0) counts[em.heCurve[h]]++;
  const curves: HeegaardDiagram['curves'] = [];
  for (let c = 0; c < ws.curves.length; c++) {
    const meta = ws.curves[c];
    const vs = walkCurve(em, c + 1, meta.start);
    if (!vs) return fail(problem('curve-not-closed', `${curveName(meta)} does not close up`));
    if (vs.length !== counts[c + 1]) {
      return fail(problem('curve-split', `${curveName(meta)} falls into several pieces (${vs.length} of ${counts[c + 1]} edges in one cycle)`, [wsLabel(ws, vs[0])]));
    }
    if (vs.length < 3) return fail(problem('curve-too-short', `${curveName(meta)} has fewer than 3 edges`));
    curves.push({ family: meta.family, index: meta.index, vertices: vs });
  }
  for (const b of ws.basepoints) {
    if (b.vertex < 0 || b.vertex >= em.nV) return fail(problem('basepoint-missing', `basepoint ${b.kind}_${b.index + 1} is not on a mesh vertex`));
    for (const h of fan(em, b.vertex)) {
      if (em.heCurve[h] !== 0) return fail(problem('basepoint-on-curve', `basepoint ${b.kind}_${b.index + 1} at vertex ${wsLabel(ws, b.vertex)} lies on a curve`, [wsLabel(ws, b.vertex)]));
    }
  }
  const d: HeegaardDiagram = { mesh: compactMesh(em), curves, basepoints: ws.basepoints.map((b) => ({ ...b })) };
  if (ws.vertexLabels) {
    const L = new Int32Array(em.nV);
    for (let v = 0; v < em.nV; v++) L[v] = wsLabel(ws, v);
    d.vertexLabels = L;
  }
  const problems = validateCurves(d).filter((p) => !(options.partial && PARTIAL_OK.has(p.code)));
  return problems.length ? fail(...problems) : ok(d);
}

/** Builds a workspace from raw geometry and vertex-cycle curves (templates). */
export function workspaceFrom(mesh: TriMesh, curves: { family: CurveFamily; index: number; vertices: ArrayLike<number> }[], basepoints: Basepoint[]): Result<Workspace> {
  return openDiagram({ mesh, curves: curves.map((c) => ({ ...c, vertices: Int32Array.from(c.vertices) })), basepoints });
}

/** Full check of a diagram built outside a workspace (connectivity, curve invariants, validateCurves). */
export function checkDiagram(d: HeegaardDiagram, options: CloseOptions = {}): Result<HeegaardDiagram> {
  const ws = openDiagram(d);
  return ws.ok ? closeDiagram(ws.value, options) : ws;
}

/** True when x is a whole number from 0 to n - 1 (guards indices coming from users and servers). */
export const isIndex = (x: unknown, n: number): x is number => Number.isInteger(x) && (x as number) >= 0 && (x as number) < n;
