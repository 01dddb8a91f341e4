/**
 * Wavefront OBJ (open format, "Object Files (.obj)", Wavefront Technologies). Read: `v` (extra w or colour
 * ignored), `f` with v, v/vt, v/vt/vn, v//vn and negative (relative) indices, polygons fan-triangulated.
 * Quadrant's conventions on top of the standard: a curve is a group or object (`g` or `o`) named
 * alpha_<i> or beta_<i> holding `l` elements (whole polylines or 2-vertex segments); a basepoint is a `p`
 * element in a group named z_<i> or w_<i>. Duplicate positions are merged; labels keep file numbers.
 */
import type { Problem, Result } from '../base/result.js';
import type { HeegaardDiagram } from '../diagram/types.js';
import { curveName } from '../diagram/types.js';
import { finishMeshFile, lineTag, parseMarkName, type BasepointMark, type CurveEdges, type MarkName, type MeshFile } from './mesh-file.js';
import { FileProblem, GrowArray, LineScanner, asText, forEachLine, guard } from './text.js';

/** Reads an OBJ file. Errors carry the 1-based line number. O(file size). */
export function readObj(input: Uint8Array | string): Result<MeshFile> {
  return guard(() => parseObj(asText(input)));
}

interface ObjState {
  pos: GrowArray<Float64Array>;
  tris: GrowArray<Int32Array>;
  curves: Map<string, CurveEdges>;
  points: Map<string, BasepointMark & { count: number; lines: number[] }>;
  group: MarkName;
  groupName: string;
  warned: Set<string>;
  warnings: Problem[];
  poly: number[];
}

function parseObj(text: string): MeshFile {
  const s: ObjState = {
    pos: new GrowArray(new Float64Array(1024)), tris: new GrowArray(new Int32Array(1024)),
    curves: new Map(), points: new Map(), group: null, groupName: '', warned: new Set(), warnings: [], poly: [],
  };
  const sc = new LineScanner();
  forEachLine(text, (start, end, line) => {
    sc.reset(text, start, end, line);
    const key = sc.token();
    if (key === 'v') {
      s.pos.push(sc.number('x coordinate')); s.pos.push(sc.number('y coordinate')); s.pos.push(sc.number('z coordinate'));
    } else if (key === 'f') readFace(s, sc);
    else if (key === 'g' || key === 'o') {
      s.groupName = sc.token();
      s.group = parseMarkName(s.groupName, line);
    } else if (key === 'l') readLine(s, sc);
    else if (key === 'p') readPoint(s, sc);
  });
  const points: BasepointMark[] = [];
  for (const [name, p] of s.points) {
    if (p.count !== 1) throw new FileProblem('basepoint-count', `${name} is given ${p.count} points (lines ${p.lines.join(', ')}); a basepoint is one vertex.`, p.lines[1] ?? p.line);
    points.push({ kind: p.kind, index: p.index, vertex: p.vertex, line: p.line });
  }
  return finishMeshFile(s.pos.done(), s.tris.done(), [...s.curves.values()], points, s.warnings);
}

/** Resolves one index token (v, v/vt, v/vt/vn, v//vn; negative counts back from the last vertex). */
function vertexIndex(s: ObjState, sc: LineScanner, tok: string): number {
  const slash = tok.indexOf('/');
  const head = slash < 0 ? tok : tok.slice(0, slash);
  const i = Number(head);
  const n = s.pos.length / 3;
  if (!Number.isInteger(i) || i === 0 || head === '') throw new FileProblem('bad-index', `Line ${sc.line}: '${tok}' is not a vertex number (vertex numbers start at 1; negative numbers count back).`, sc.line);
  const r = i > 0 ? i - 1 : n + i;
  if (r < 0 || r >= n) throw new FileProblem('bad-index', `Line ${sc.line}: vertex ${i} does not exist; only ${n} vertices are defined before this line.`, sc.line);
  return r;
}

function readIndices(s: ObjState, sc: LineScanner): number[] {
  const poly = s.poly;
  poly.length = 0;
  for (let tok = sc.token(); tok !== ''; tok = sc.token()) poly.push(vertexIndex(s, sc, tok));
  return poly;
}

function readFace(s: ObjState, sc: LineScanner): void {
  const poly = readIndices(s, sc);
  if (poly.length < 3) throw new FileProblem('short-face', `Line ${sc.line}: a face needs at least 3 vertices, this one has ${poly.length}.`, sc.line);
  for (let k = 1; k + 1 < poly.length; k++) {
    s.tris.push(poly[0]); s.tris.push(poly[k]); s.tris.push(poly[k + 1]);
  }
}

function warnOnce(s: ObjState, code: string, message: string, line: number): void {
  const key = `${code}:${s.groupName}`;
  if (s.warned.has(key)) return;
  s.warned.add(key);
  s.warnings.push({ code, message, line });
}

function readLine(s: ObjState, sc: LineScanner): void {
  const poly = readIndices(s, sc);
  const g = s.group;
  if (!g || g.what !== 'curve') {
    warnOnce(s, 'ignored-polyline', `${lineTag(sc.line)}polylines outside a group named alpha_<i> or beta_<i> are ignored (group '${s.groupName || 'none'}').`, sc.line);
    return;
  }
  const name = curveName(g);
  let c = s.curves.get(name);
  if (!c) s.curves.set(name, (c = { family: g.family, index: g.index, edges: [], line: sc.line }));
  if (poly.length < 2) throw new FileProblem('short-polyline', `Line ${sc.line}: a polyline of ${name} needs at least 2 vertices.`, sc.line);
  for (let k = 0; k + 1 < poly.length; k++) c.edges.push(poly[k], poly[k + 1]);
}

function readPoint(s: ObjState, sc: LineScanner): void {
  const poly = readIndices(s, sc);
  const g = s.group;
  if (!g || g.what !== 'basepoint') {
    warnOnce(s, 'ignored-point', `${lineTag(sc.line)}points outside a group named z_<i> or w_<i> are ignored (group '${s.groupName || 'none'}').`, sc.line);
    return;
  }
  const name = `${g.kind}_${g.index + 1}`;
  let p = s.points.get(name);
  if (!p) s.points.set(name, (p = { kind: g.kind, index: g.index, vertex: poly[0] ?? -1, line: sc.line, count: 0, lines: [] }));
  p.count += poly.length;
  p.lines.push(sc.line);
}

/**
 * Writes a diagram as OBJ: `v` lines with shortest round-trip decimals, `f` lines (1-based), each curve as
 * a group alpha_<i> / beta_<i> of 2-vertex `l` segments in the curve's direction, each basepoint as a `p`
 * in group z_<i> / w_<i>. Reading it back gives the same vertices, triangles, curves and basepoints. O(size).
 */
export function writeObj(diagram: Pick<HeegaardDiagram, 'mesh' | 'curves' | 'basepoints'>, comment = 'Quadrant Heegaard diagram'): string {
  const { mesh } = diagram;
  const out: string[] = [`# ${comment.replace(/\n/g, ' ')}`, `# ${mesh.nV} vertices, ${mesh.nF} triangles, ${diagram.curves.length} curves`];
  for (let v = 0; v < mesh.nV; v++) out.push(`v ${mesh.pos[3 * v]} ${mesh.pos[3 * v + 1]} ${mesh.pos[3 * v + 2]}`);
  out.push('g surface');
  for (let f = 0; f < mesh.nF; f++) out.push(`f ${mesh.heVert[3 * f] + 1} ${mesh.heVert[3 * f + 1] + 1} ${mesh.heVert[3 * f + 2] + 1}`);
  for (const c of diagram.curves) {
    out.push(`g ${curveName(c)}`);
    const n = c.vertices.length;
    for (let i = 0; i < n; i++) out.push(`l ${c.vertices[i] + 1} ${c.vertices[(i + 1) % n] + 1}`);
  }
  for (const b of diagram.basepoints) out.push(`g ${b.kind}_${b.index + 1}`, `p ${b.vertex + 1}`);
  return out.join('\n') + '\n';
}
