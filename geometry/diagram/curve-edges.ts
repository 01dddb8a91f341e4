/**
 * Curve labels on half-edges: the bridge from a diagram's vertex cycles to the mesh.
 *
 * heCurve[h] = +(c + 1) when curve c (its position in diagram.curves) runs along half-edge h in the
 * curve's own direction, -(c + 1) when it runs along h's twin, 0 when edge h carries no curve
 * (the convention of GEOMETRY.md, "Mesh"). Every vertex records up to two curves passing through it.
 */
import type { Problem } from '../base/result.js';
import { next, prev, type TriMesh } from '../mesh/tri-mesh.js';
import { curveName, vertexLabel, type HeegaardDiagram } from './types.js';

/** Curve labels of a diagram, plus the problems met while laying the curves on the mesh. */
export interface CurveLabels {
  /** Per half-edge: +(c+1) along, -(c+1) against curve c, 0 for no curve. Length 3 nF. */
  heCurve: Int32Array;
  /** First curve through each vertex, or -1. */
  vertCurveA: Int32Array;
  /** Second curve through each vertex, or -1. */
  vertCurveB: Int32Array;
  /** 1 for alpha, 2 for beta, per curve position. */
  familyBit: Uint8Array;
  /** Every half-edge a curve runs along in its own direction (heCurve[h] > 0), in curve order. */
  curveHe: Int32Array;
  /** Vertices (0-based) through which more than two curves pass. */
  crowded: Map<number, number[]>;
  problems: Problem[];
}

/**
 * The half-edge a->b, or -1 when a and b are not joined by an edge. Walks a's fan both ways, so it
 * also works next to an open boundary. O(degree of a).
 */
export function findHalfEdge(m: TriMesh, a: number, b: number): number {
  const first = m.vertHe[a];
  if (first < 0) return -1;
  let h = first;
  let steps = 0;
  do { // counter-clockwise: v->b then v->c = twin(prev(h))
    if (m.heVert[next(h)] === b) return h;
    h = m.heTwin[prev(h)];
  } while (h >= 0 && h !== first && ++steps < 100000);
  if (h === first) return -1;
  h = first; steps = 0;
  for (;;) { // clockwise from the handle: next(twin(h))
    const t = m.heTwin[h];
    if (t < 0 || ++steps > 100000) return -1;
    h = next(t);
    if (h === first) return -1;
    if (m.heVert[next(h)] === b) return h;
  }
}

/** Names of curves by position, e.g. 'alpha_1'. */
export const curveNameAt = (d: HeegaardDiagram, c: number): string => curveName(d.curves[c]);

function addVertexCurve(L: CurveLabels, v: number, c: number): 'ok' | 'repeat' {
  if (L.vertCurveA[v] === c || L.vertCurveB[v] === c) return 'repeat';
  if (L.vertCurveA[v] < 0) L.vertCurveA[v] = c;
  else if (L.vertCurveB[v] < 0) L.vertCurveB[v] = c;
  else {
    const list = L.crowded.get(v) ?? [L.vertCurveA[v], L.vertCurveB[v]];
    if (!list.includes(c)) list.push(c);
    L.crowded.set(v, list);
  }
  return 'ok';
}

/** Lays one curve on the mesh, recording problems in words (vertex numbers as in the user's file). */
function layCurve(d: HeegaardDiagram, L: CurveLabels, c: number, along: number[]): void {
  const m = d.mesh;
  const curve = d.curves[c];
  const name = curveName(curve);
  const vs = curve.vertices;
  const n = vs.length;
  if (n < 3) {
    L.problems.push({ code: 'curve-too-short', message: `${name} has ${n} vertex${n === 1 ? '' : 'es'}; a simple closed curve along mesh edges needs at least 3` });
    return;
  }
  for (let i = 0; i < n; i++) {
    const v = vs[i];
    if (!(v >= 0 && v < m.nV) || m.vertHe[v] < 0) {
      L.problems.push({ code: 'curve-vertex-missing', message: `${name} uses vertex ${v + 1}, which is not a vertex of the surface` });
      return;
    }
  }
  for (let i = 0; i < n; i++) {
    const v = vs[i];
    if (addVertexCurve(L, v, c) === 'repeat') {
      const lab = vertexLabel(d, v);
      L.problems.push({ code: 'curve-not-simple', message: `${name} passes through vertex ${lab} more than once; each curve must be simple`, vertices: [lab] });
    }
  }
  for (let i = 0; i < n; i++) {
    const a = vs[i], b = vs[(i + 1) % n];
    const h = findHalfEdge(m, a, b);
    const la = vertexLabel(d, a), lb = vertexLabel(d, b);
    if (h < 0) {
      L.problems.push({ code: 'curve-off-edges', message: `${name} steps from vertex ${la} to vertex ${lb}, which are not joined by a mesh edge; curves must run along edges`, vertices: [la, lb] });
      continue;
    }
    const old = L.heCurve[h];
    if (old !== 0) {
      const other = Math.abs(old) - 1;
      if (other === c) continue; // already reported as a repeated vertex
      const same = L.familyBit[other] === L.familyBit[c];
      L.problems.push({
        code: same ? 'curves-share-edge' : 'alpha-beta-share-edge',
        message: same
          ? `${curveNameAt(d, other)} and ${name} share the edge between vertices ${la} and ${lb}; curves of one family must be disjoint`
          : `${curveNameAt(d, other)} and ${name} share the edge between vertices ${la} and ${lb}; an alpha and a beta curve may meet only at isolated crossing vertices`,
        vertices: [la, lb],
      });
      continue;
    }
    L.heCurve[h] = c + 1;
    along.push(h);
    const t = m.heTwin[h];
    if (t >= 0) L.heCurve[t] = -(c + 1);
  }
}

/** Labels every curve's edges. O(total curve length x vertex degree + F). */
export function labelCurveEdges(d: HeegaardDiagram): CurveLabels {
  const m = d.mesh;
  const L: CurveLabels = {
    heCurve: new Int32Array(3 * m.nF),
    vertCurveA: new Int32Array(m.nV).fill(-1),
    vertCurveB: new Int32Array(m.nV).fill(-1),
    familyBit: Uint8Array.from(d.curves, (c) => (c.family === 'alpha' ? 1 : 2)),
    curveHe: new Int32Array(0),
    crowded: new Map(),
    problems: [],
  };
  const along: number[] = [];
  for (let c = 0; c < d.curves.length; c++) layCurve(d, L, c, along);
  L.curveHe = Int32Array.from(along);
  return L;
}
