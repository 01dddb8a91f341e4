/**
 * Turns the curve edges a file lists into closed vertex cycles along mesh edges, and checks the numbering
 * of curves (alpha_1, alpha_2, … without gaps) and basepoints. Every problem is a sentence naming the curve
 * and the vertex numbers as in the file. O(H) for the edge lookup plus O(curve edges).
 */
import type { Problem, Result } from '../base/result.js';
import { fail, ok } from '../base/result.js';
import type { Basepoint, DiagramCurve } from '../diagram/types.js';
import { curveName } from '../diagram/types.js';
import { next, type TriMesh } from '../mesh/tri-mesh.js';
import type { BasepointMark, CurveEdges } from './mesh-file.js';

/** Outgoing half-edges of each vertex in CSR form: a lookup that works even on a broken mesh. O(H). */
function outgoing(mesh: TriMesh): { start: Int32Array; list: Int32Array } {
  const nH = 3 * mesh.nF;
  const start = new Int32Array(mesh.nV + 1);
  for (let h = 0; h < nH; h++) start[mesh.heVert[h] + 1]++;
  for (let v = 0; v < mesh.nV; v++) start[v + 1] += start[v];
  const fill = start.slice(0, mesh.nV), list = new Int32Array(nH);
  for (let h = 0; h < nH; h++) list[fill[mesh.heVert[h]]++] = h;
  return { start, list };
}

/**
 * Assembles each curve's edges into one closed cycle, oriented by the file's first edge, and sorts the
 * result alpha_1.., beta_1... Problems: curve-edge-not-on-surface, curve-loop-edge, curve-not-closed,
 * curve-branches, curve-several-loops, curve-empty, curve-missing. Repeated edges are harmless.
 */
export function assembleCurves(mesh: TriMesh, curves: CurveEdges[], vertexLabels?: Int32Array): Result<DiagramCurve[]> {
  const label = (v: number): number => (vertexLabels ? vertexLabels[v] : v + 1);
  const csr = outgoing(mesh);
  const isEdge = (a: number, b: number): boolean => {
    for (let i = csr.start[a]; i < csr.start[a + 1]; i++) if (mesh.heVert[next(csr.list[i])] === b) return true;
    for (let i = csr.start[b]; i < csr.start[b + 1]; i++) if (mesh.heVert[next(csr.list[i])] === a) return true;
    return false;
  };
  const problems: Problem[] = [...numberingProblems(curves.map((c) => ({ family: c.family, index: c.index })), ['alpha', 'beta'], 'curves')];
  const result: DiagramCurve[] = [];
  for (const c of [...curves].sort(byName)) {
    const before = problems.length;
    const cycle = assembleOne(c, mesh.nV, isEdge, label, problems);
    if (cycle && problems.length === before) result.push({ family: c.family, index: c.index, vertices: cycle });
  }
  return problems.length ? fail(...problems) : ok(result);
}

const byName = (a: { family: string; index: number }, b: { family: string; index: number }): number =>
  a.family === b.family ? a.index - b.index : a.family < b.family ? -1 : 1;

function assembleOne(c: CurveEdges, nV: number, isEdge: (a: number, b: number) => boolean, label: (v: number) => number, problems: Problem[]): Int32Array | null {
  const name = curveName(c);
  const before = problems.length;
  const at = (v: number[], code: string, message: string): void => {
    const p: Problem = { code, message, vertices: v };
    if (c.line !== undefined) p.line = c.line;
    problems.push(p);
  };
  if (c.edges.length === 0) { at([], 'curve-empty', `${name} has no edges.`); return null; }
  const nbrs = new Map<number, number[]>();
  const seen = new Set<number>();
  const addNbr = (a: number, b: number): void => {
    const l = nbrs.get(a);
    if (l) l.push(b); else nbrs.set(a, [b]);
  };
  for (let i = 0; i < c.edges.length; i += 2) {
    const a = c.edges[i], b = c.edges[i + 1];
    if (a < 0 || b < 0) { at([], 'curve-unused-vertex', `${name} runs through a vertex that no triangle uses.`); return null; }
    if (a === b) { at([label(a)], 'curve-loop-edge', `${name} has an edge from vertex ${label(a)} to itself.`); continue; }
    const key = Math.min(a, b) * nV + Math.max(a, b);
    if (seen.has(key)) continue;
    seen.add(key);
    if (!isEdge(a, b)) at([label(a), label(b)], 'curve-edge-not-on-surface', `${name} uses an edge ${label(a)}–${label(b)} that is not an edge of the surface.`);
    addNbr(a, b); addNbr(b, a);
  }
  for (const [v, l] of nbrs) {
    if (l.length === 1) at([label(v)], 'curve-not-closed', `${name} is not closed: it ends at vertex ${label(v)}.`);
    else if (l.length > 2) at([label(v)], 'curve-branches', `${name} branches at vertex ${label(v)} (${l.length} of its edges meet there).`);
  }
  if (problems.length > before) return null;
  return walkCycle(c, nbrs, name, label, at);
}

function walkCycle(c: CurveEdges, nbrs: Map<number, number[]>, name: string, label: (v: number) => number, at: (v: number[], code: string, m: string) => void): Int32Array | null {
  let first = 0;
  while (c.edges[first] === c.edges[first + 1]) first += 2;
  const start = c.edges[first];
  const cycle: number[] = [start];
  let prev = start, cur = c.edges[first + 1];
  while (cur !== start) {
    cycle.push(cur);
    const [x, y] = nbrs.get(cur)!;
    const nxt = x === prev ? y : x;
    prev = cur; cur = nxt;
  }
  if (cycle.length < nbrs.size) {
    const other = [...nbrs.keys()].find((v) => !cycle.includes(v))!;
    at([label(start), label(other)], 'curve-several-loops', `${name} is made of several separate loops (one through vertex ${label(start)}, another through vertex ${label(other)}); each curve must be one closed loop.`);
    return null;
  }
  return Int32Array.from(cycle);
}

/** Problems when the numbers of a family skip or repeat: alpha_1, alpha_3 without alpha_2. */
function numberingProblems(items: { family: string; index: number }[], families: string[], noun: string): Problem[] {
  const problems: Problem[] = [];
  for (const fam of families) {
    const idx = items.filter((x) => x.family === fam).map((x) => x.index).sort((a, b) => a - b);
    if (idx.length === 0) continue;
    const max = idx[idx.length - 1];
    for (let i = 0; i <= max; i++) {
      if (!idx.includes(i)) {
        const have = idx.map((j) => `${fam}_${j + 1}`).join(', ');
        problems.push({ code: 'curve-missing', message: `${fam}_${i + 1} is missing: ${noun} are numbered ${fam}_1, ${fam}_2, … without gaps, but the file has ${have}.` });
      }
    }
  }
  return problems;
}

/**
 * Checks basepoints: numbered z_1, z_2, … (and w_1, …) without gaps, on used vertices, off every curve.
 * Problems: curve-missing (for a skipped number), basepoint-unused-vertex, basepoint-on-curve.
 */
export function assembleBasepoints(marks: BasepointMark[], curves: DiagramCurve[], vertexLabels?: Int32Array): Result<Basepoint[]> {
  const label = (v: number): number => (vertexLabels ? vertexLabels[v] : v + 1);
  const problems = numberingProblems(marks.map((m) => ({ family: m.kind, index: m.index })), ['z', 'w'], 'basepoints');
  const onCurve = new Map<number, string>();
  for (const c of curves) for (const v of c.vertices) if (!onCurve.has(v)) onCurve.set(v, curveName(c));
  for (const m of marks) {
    const name = `${m.kind}_${m.index + 1}`;
    if (m.vertex < 0) problems.push({ code: 'basepoint-unused-vertex', message: `${name} sits on a vertex that no triangle uses.` });
    else if (onCurve.has(m.vertex)) problems.push({ code: 'basepoint-on-curve', message: `${name} sits at vertex ${label(m.vertex)}, which lies on ${onCurve.get(m.vertex)}; a basepoint must be off every curve.`, vertices: [label(m.vertex)] });
  }
  if (problems.length) return fail(...problems);
  return ok(marks.map((m) => ({ kind: m.kind, index: m.index, vertex: m.vertex })).sort((a, b) => (a.kind === b.kind ? a.index - b.index : a.kind === 'z' ? -1 : 1)));
}
