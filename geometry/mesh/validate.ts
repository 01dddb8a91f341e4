/**
 * Surface validation for user meshes: a Heegaard surface must be closed, connected, manifold and
 * consistently oriented (DESIGN.md). Every violation is reported with the offending vertices, numbered as
 * in the user's file, in sentences a topologist understands. Typed arrays throughout; objects are made
 * only for offending elements. A clean mesh costs O(V + F) beyond buildTriMesh.
 */
import type { Problem } from '../base/result.js';
import { cornerAngle, doubleArea, dist2 } from '../base/vec.js';
import { buildEdgeTable, type EdgeTable } from './edge-table.js';
import { next, prev, type ConnectivityReport, type TriMesh } from './tri-mesh.js';
import { ProblemList, listWords } from './validate-problems.js';

export { isWarning, SURFACE_WARNING_CODES } from './validate-problems.js';

type Label = (v: number) => number;

/**
 * Checks that the mesh is a closed, connected, oriented 2-manifold without degenerate, duplicate or
 * unused elements. Returns every problem found (empty when the surface is fine); 'unused-vertex' is a
 * warning (see isWarning), every other code is an error. Codes: degenerate-face, zero-area-face,
 * open-boundary, non-manifold-edge, inconsistent-orientation, non-orientable, duplicate-face,
 * non-manifold-vertex, unused-vertex, several-components.
 * O(V + F) on a clean mesh; O(V + F + sum deg^2) when edges need a closer look.
 */
export function validateSurface(mesh: TriMesh, report: ConnectivityReport, vertexLabels?: Int32Array): Problem[] {
  const label: Label = vertexLabels ? (v) => vertexLabels[v] : (v) => v + 1;
  const out = new ProblemList();
  // Vertices already blamed by a face or edge problem are not also called pinch points.
  const blamed = new Uint8Array(mesh.nV);
  const degenerate = checkFaces(mesh, label, out, blamed);
  const clean = report.boundary.length === 0 && report.duplicated.length === 0 && report.nonManifold.length === 0;
  if (clean && degenerate === 0) checkClosedDuplicates(mesh, label, out);
  else checkEdges(mesh, buildEdgeTable(mesh.heVert, 3 * mesh.nF, mesh.nV), label, out, blamed);
  checkVertices(mesh, label, out, blamed);
  checkComponents(mesh, label, out);
  return out.finish();
}

const tri = (m: TriMesh, f: number, label: Label): string =>
  `triangle ${f + 1} (vertices ${label(m.heVert[3 * f])}, ${label(m.heVert[3 * f + 1])}, ${label(m.heVert[3 * f + 2])})`;

/** Repeated vertices and zero area (relative to the longest side). Returns the number found. O(F). */
function checkFaces(m: TriMesh, label: Label, out: ProblemList, blamed: Uint8Array): number {
  let found = 0;
  for (let f = 0; f < m.nF; f++) {
    const a = m.heVert[3 * f], b = m.heVert[3 * f + 1], c = m.heVert[3 * f + 2];
    if (a === b || b === c || c === a) {
      found++;
      blamed[a] = blamed[b] = blamed[c] = 1;
      const verts = [label(a), label(b), label(c)];
      out.add('degenerate-face', 'degenerate triangles', `Triangle ${f + 1} (vertices ${verts.join(', ')}) uses the same vertex twice, so it is not a triangle.`, verts, [f]);
      continue;
    }
    // Zero area relative to the longest side: |2A| <= 1e-12 · L^2.
    const area = doubleArea(m.pos, a, b, c);
    if (area <= 1e-12 * Math.max(dist2(m.pos, a, b), dist2(m.pos, b, c), dist2(m.pos, c, a))) {
      found++;
      out.add('zero-area-face', 'zero-area triangles', `${cap(tri(m, f, label))} has zero area: its corners lie on one line.`, [label(a), label(b), label(c)], [f]);
    }
  }
  return found;
}

const cap = (s: string): string => s.charAt(0).toUpperCase() + s.slice(1);

/**
 * On a mesh where every half-edge has a mutual twin, a duplicate face can only be a pair (a,b,c), (a,c,b)
 * glued along all three edges. O(F).
 */
function checkClosedDuplicates(m: TriMesh, label: Label, out: ProblemList): void {
  for (let f = 0; f < m.nF; f++) {
    const g = (m.heTwin[3 * f] / 3) | 0;
    if (g > f && ((m.heTwin[3 * f + 1] / 3) | 0) === g && ((m.heTwin[3 * f + 2] / 3) | 0) === g) reportDuplicate(m, f, g, label, out);
  }
}

function reportDuplicate(m: TriMesh, f: number, g: number, label: Label, out: ProblemList): void {
  const verts = [label(m.heVert[3 * f]), label(m.heVert[3 * f + 1]), label(m.heVert[3 * f + 2])];
  out.add('duplicate-face', 'duplicate triangles', `Triangles ${f + 1} and ${g + 1} both join vertices ${listWords(verts)}; remove one of them.`, verts, [f, g]);
}

/**
 * Per undirected edge: open boundary (one triangle), non-manifold (three or more), same direction twice
 * (inconsistent orientation), duplicate faces; then orientability by a face search. O(H + sum deg^2).
 */
function checkEdges(m: TriMesh, t: EdgeTable, label: Label, out: ProblemList, blamed: Uint8Array): void {
  const hv = m.heVert;
  for (let e = 0; e < t.nE; e++) {
    const s = t.start[e], c = t.start[e + 1] - s, h0 = t.list[s];
    const a = hv[h0], b = hv[next(h0)], la = label(a), lb = label(b);
    if (c === 1) {
      out.add('open-boundary', 'open edges', `The surface has an open boundary along edge ${la}–${lb}: only triangle ${faceNo(h0)} uses it, but a closed surface needs two.`, [la, lb], [faceNo(h0) - 1]);
      continue;
    }
    if (c > 2 || hv[t.list[s + 1]] === a) blamed[a] = blamed[b] = 1;
    if (c > 2) {
      const faces = facesOf(t, e);
      out.add('non-manifold-edge', 'non-manifold edges', `Edge ${la}–${lb} is shared by ${c} triangles (${listWords(faces.map((f) => f + 1))}); on a surface every edge borders exactly two.`, [la, lb], faces);
    } else if (hv[t.list[s + 1]] === a) {
      const f = faceNo(h0), g = faceNo(t.list[s + 1]);
      out.add('inconsistent-orientation', 'edges with clashing orientation', `Triangles ${f} and ${g} both run along edge ${la}→${lb} in the same direction; neighbouring triangles must run their shared edge in opposite directions (reverse one of them).`, [la, lb], [f - 1, g - 1]);
    }
    for (let i = s; i < s + c; i++) {
      for (let j = i + 1; j < s + c; j++) {
        const f = (t.list[i] / 3) | 0, g = (t.list[j] / 3) | 0;
        if (hv[prev(t.list[i])] === hv[prev(t.list[j])] && isFirstEdgeOf(t, f, e)) reportDuplicate(m, f, g, label, out);
      }
    }
  }
  checkOrientability(m, t, label, out);
}

const faceNo = (h: number): number => ((h / 3) | 0) + 1;
const facesOf = (t: EdgeTable, e: number): number[] => {
  const r: number[] = [];
  for (let i = t.start[e]; i < t.start[e + 1]; i++) r.push((t.list[i] / 3) | 0);
  return r;
};
/** So that a duplicate pair sharing three edges is reported once. */
const isFirstEdgeOf = (t: EdgeTable, f: number, e: number): boolean => {
  let min = Infinity;
  for (let k = 0; k < 3; k++) if (t.edgeOf[3 * f + k] >= 0) min = Math.min(min, t.edgeOf[3 * f + k]);
  return min === e;
};

/**
 * Two-colours faces across two-triangle edges: same direction means the neighbour is flipped. A clash
 * means no choice of orientations works: the surface contains a Möbius band (non-orientable). O(F + E).
 */
function checkOrientability(m: TriMesh, t: EdgeTable, label: Label, out: ProblemList): void {
  const flip = new Int8Array(m.nF).fill(-1);
  const stack = new Int32Array(m.nF);
  for (let root = 0; root < m.nF; root++) {
    if (flip[root] >= 0) continue;
    flip[root] = 0;
    let top = 0, clash = -1;
    stack[top++] = root;
    while (top > 0) {
      const f = stack[--top];
      for (let k = 0; k < 3; k++) {
        const h = 3 * f + k, e = t.edgeOf[h];
        if (e < 0 || t.start[e + 1] - t.start[e] !== 2) continue;
        const o = t.list[t.start[e]] === h ? t.list[t.start[e] + 1] : t.list[t.start[e]];
        const g = (o / 3) | 0, same = m.heVert[o] === m.heVert[h] ? 1 : 0;
        const want = flip[f] ^ same;
        if (flip[g] < 0) { flip[g] = want; stack[top++] = g; } else if (flip[g] !== want && clash < 0) clash = h;
      }
    }
    if (clash >= 0) {
      const la = label(m.heVert[clash]), lb = label(m.heVert[next(clash)]);
      out.add('non-orientable', 'non-orientable pieces', `The surface is not orientable (it contains a Möbius band): carrying an orientation across the triangles comes back reversed at edge ${la}–${lb}. A Heegaard surface must be orientable.`, [la, lb], [(clash / 3) | 0]);
    }
  }
}

/** Unused vertices and pinch points (the fan walk from the vertex's handle misses some triangles). O(V + F). */
function checkVertices(m: TriMesh, label: Label, out: ProblemList, blamed: Uint8Array): void {
  const deg = new Int32Array(m.nV);
  for (let h = 0; h < 3 * m.nF; h++) if (m.heVert[h] !== m.heVert[next(h)]) deg[m.heVert[h]]++;
  const stamp = new Int32Array(3 * m.nF);
  for (let v = 0; v < m.nV; v++) {
    const first = m.vertHe[v];
    if (first < 0) {
      out.add('unused-vertex', 'unused vertices', `Vertex ${label(v)} is not used by any triangle; it will be ignored.`, [label(v)]);
      continue;
    }
    if (deg[v] === 0 || blamed[v]) continue;
    const reached = walkFan(m, first, v + 1, stamp);
    if (reached < deg[v]) {
      out.add('non-manifold-vertex', 'pinch vertices', `Vertex ${label(v)} is a pinch point: walking around it reaches only ${reached} of its ${deg[v]} triangles, so its triangles do not form one disk.`, [label(v)]);
    }
  }
}

/** Counts outgoing half-edges reached from h by rotating both ways; stamps guard against broken twins. */
function walkFan(m: TriMesh, first: number, mark: number, stamp: Int32Array): number {
  let n = 0, h = first;
  while (h >= 0 && stamp[h] !== mark) {
    stamp[h] = mark; n++;
    h = m.heTwin[prev(h)];
  }
  if (h >= 0) return n;
  h = m.heTwin[first] >= 0 ? next(m.heTwin[first]) : -1;
  while (h >= 0 && stamp[h] !== mark && m.heVert[h] === m.heVert[first]) {
    stamp[h] = mark; n++;
    h = m.heTwin[h] >= 0 ? next(m.heTwin[h]) : -1;
  }
  return n;
}

/** Connected pieces by union–find over the triangles' vertices (Tarjan 1975). O((V + F) α). */
function checkComponents(m: TriMesh, label: Label, out: ProblemList): void {
  const parent = new Int32Array(m.nV);
  for (let v = 0; v < m.nV; v++) parent[v] = v;
  const find = (v: number): number => {
    while (parent[v] !== v) { parent[v] = parent[parent[v]]; v = parent[v]; }
    return v;
  };
  for (let h = 0; h < 3 * m.nF; h++) {
    const a = find(m.heVert[h]), b = find(m.heVert[next(h)]);
    if (a !== b) parent[Math.max(a, b)] = Math.min(a, b);
  }
  const faces = new Int32Array(m.nV);
  for (let f = 0; f < m.nF; f++) faces[find(m.heVert[3 * f])]++;
  const roots: number[] = [];
  for (let v = 0; v < m.nV; v++) if (faces[v] > 0) roots.push(v);
  if (roots.length <= 1) return;
  roots.sort((a, b) => faces[b] - faces[a]);
  const sizes = listWords(roots.map((r) => faces[r]));
  out.add('several-components', 'component reports', `The surface falls into ${roots.length} separate pieces (with ${sizes} triangles); a Heegaard surface must be connected. The pieces contain vertices ${listWords(roots.map(label))} respectively.`, roots.map(label));
}

/** Counts and curvature of a closed surface mesh. */
export interface SurfaceStats {
  /** Vertices used by some triangle. */
  vertices: number;
  faces: number;
  /** 3F/2 for a closed surface. */
  edges: number;
  eulerCharacteristic: number;
  /** (2 − χ)/2 for a closed orientable connected surface. */
  genus: number;
  /** Σ over used vertices of (2π − angle sum); equals 2πχ on a closed mesh (Descartes; Polthier & Schmies 1998). */
  totalAngleDefect: number;
  /** totalAngleDefect / 2π; equals χ. */
  totalCurvature: number;
}

/** Counts, Euler characteristic, genus and total angle defect. O(V + F). */
export function surfaceStats(mesh: TriMesh): SurfaceStats {
  const angleSum = new Float64Array(mesh.nV);
  const hv = mesh.heVert;
  for (let f = 0; f < mesh.nF; f++) {
    const a = hv[3 * f], b = hv[3 * f + 1], c = hv[3 * f + 2];
    angleSum[a] += cornerAngle(mesh.pos, c, a, b);
    angleSum[b] += cornerAngle(mesh.pos, a, b, c);
    angleSum[c] += cornerAngle(mesh.pos, b, c, a);
  }
  let vertices = 0, defect = 0;
  for (let v = 0; v < mesh.nV; v++) {
    if (mesh.vertHe[v] < 0) continue;
    vertices++;
    defect += 2 * Math.PI - angleSum[v];
  }
  const edges = (3 * mesh.nF) / 2;
  const chi = vertices - edges + mesh.nF;
  return {
    vertices, faces: mesh.nF, edges, eulerCharacteristic: chi, genus: (2 - chi) / 2,
    totalAngleDefect: defect, totalCurvature: defect / (2 * Math.PI),
  };
}
