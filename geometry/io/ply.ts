/**
 * PLY (Turk 1994, "The PLY Polygon File Format"), ASCII and binary little/big-endian. Read: `element
 * vertex` with x y z (other properties ignored), `element face` with a list property vertex_indices (or
 * vertex_index), polygons fan-triangulated. Quadrant's additions, both optional:
 * - `element edge` with `vertex1`, `vertex2` and an int `curve`: curve = +i puts the edge on alpha_i,
 *   curve = −i on beta_i (i >= 1), 0 on no curve; vertex1 -> vertex2 orients the curve.
 * - `element basepoint` with int `vertex` and int `kind`: kind = +i is z_i, kind = −i is w_i (i >= 1).
 * Indices are 0-based as PLY requires; vertex labels shown to users are 1-based positions in the file.
 * Other elements are read and skipped.
 */
import type { Result } from '../base/result.js';
import { finishMeshFile, type BasepointMark, type CurveEdges, type MeshFile } from './mesh-file.js';
import { AsciiPlySource, BinaryPlySource, PLY_TYPES, type PlySource, type PlyType } from './ply-body.js';
import { FileProblem, GrowArray, asBytes, asText, guard } from './text.js';

export { writePly } from './ply-write.js';

interface PlyProperty { name: string; type: PlyType; countType?: PlyType }
interface PlyElement { name: string; count: number; props: PlyProperty[]; line: number }
interface PlyHeader { format: 'ascii' | 'binary_little_endian' | 'binary_big_endian'; elements: PlyElement[]; bodyStart: number; bodyLine: number }

/** Reads ASCII or binary PLY. Errors carry the line (ASCII, header) or byte offset (binary body). O(size). */
export function readPly(input: Uint8Array | string): Result<MeshFile> {
  return guard(() => {
    let bytes = asBytes(input);
    if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) bytes = bytes.subarray(3);
    const header = parseHeader(bytes);
    const src: PlySource = header.format === 'ascii'
      ? new AsciiPlySource(asText(bytes.subarray(header.bodyStart)), 0, header.bodyLine)
      : new BinaryPlySource(bytes, header.bodyStart, header.format === 'binary_little_endian');
    return readBody(header, src);
  });
}

function parseHeader(bytes: Uint8Array): PlyHeader {
  const limit = Math.min(bytes.length, 1 << 16);
  const head = asText(bytes.subarray(0, limit));
  const m = /(^|\n)end_header[ \t]*\r?\n/.exec(head);
  if (!head.startsWith('ply')) throw new FileProblem('bad-header', "Line 1: a PLY file starts with 'ply'.", 1);
  if (!m) throw new FileProblem('bad-header', "The PLY header has no 'end_header' line.", 1);
  const lines = head.slice(0, m.index + m[0].length).split('\n');
  let format: PlyHeader['format'] | null = null;
  const elements: PlyElement[] = [];
  lines.forEach((raw, i) => {
    const line = i + 1, t = raw.trim().split(/\s+/);
    const bad = (msg: string) => { throw new FileProblem('bad-header', `Line ${line}: ${msg}`, line); };
    if (t[0] === 'format') {
      if (t[1] !== 'ascii' && t[1] !== 'binary_little_endian' && t[1] !== 'binary_big_endian') bad(`unknown PLY format '${t[1]}'.`);
      format = t[1] as PlyHeader['format'];
    } else if (t[0] === 'element') {
      const count = Number(t[2]);
      if (!t[1] || !Number.isInteger(count) || count < 0) bad(`'element' needs a name and a count.`);
      elements.push({ name: t[1], count, props: [], line });
    } else if (t[0] === 'property') {
      const el = elements[elements.length - 1];
      if (!el) bad("'property' before any 'element'.");
      if (t[1] === 'list') {
        const ct = PLY_TYPES[t[2]], it = PLY_TYPES[t[3]];
        if (!ct || !it || !t[4]) bad(`unreadable list property '${raw.trim()}'.`);
        el.props.push({ name: t[4], type: it, countType: ct });
      } else {
        const ty = PLY_TYPES[t[1]];
        if (!ty || !t[2]) bad(`unknown property type '${t[1]}'.`);
        el.props.push({ name: t[2], type: ty });
      }
    }
  });
  if (!format) throw new FileProblem('bad-header', "The PLY header has no 'format' line.", 1);
  return { format, elements, bodyStart: m.index + m[0].length, bodyLine: lines.length };
}

interface PlyState {
  pos: Float64Array | null;
  nV: number;
  tris: GrowArray<Int32Array>;
  curves: Map<number, CurveEdges>;
  basepoints: BasepointMark[];
}

function readBody(h: PlyHeader, src: PlySource): MeshFile {
  const s: PlyState = { pos: null, nV: 0, tris: new GrowArray(new Int32Array(1024)), curves: new Map(), basepoints: [] };
  for (const el of h.elements) {
    const need = (name: string) => {
      const i = el.props.findIndex((p) => p.name === name && !p.countType);
      if (i < 0) throw new FileProblem('bad-header', `Line ${el.line}: element '${el.name}' needs a property '${name}'.`, el.line);
      return i;
    };
    if (el.name !== 'vertex' && ['face', 'edge', 'basepoint'].includes(el.name) && !s.pos) {
      throw new FileProblem('bad-header', `Line ${el.line}: element '${el.name}' comes before element 'vertex'.`, el.line);
    }
    if (el.name === 'vertex') {
      const ix = [need('x'), need('y'), need('z')];
      s.pos = new Float64Array(3 * el.count); s.nV = el.count;
      eachInstance(el, src, (vals, i) => { for (let d = 0; d < 3; d++) s.pos![3 * i + d] = vals[ix[d]] as number; });
    } else if (el.name === 'face') {
      let li = el.props.findIndex((p) => p.countType && (p.name === 'vertex_indices' || p.name === 'vertex_index'));
      if (li < 0) li = el.props.findIndex((p) => p.countType);
      if (li < 0) throw new FileProblem('bad-header', `Line ${el.line}: element 'face' needs a list property 'vertex_indices'.`, el.line);
      eachInstance(el, src, (vals, i) => addFace(s, vals[li] as number[], i, src));
    } else if (el.name === 'edge' && el.props.some((p) => p.name === 'curve')) {
      const ia = need('vertex1'), ib = need('vertex2'), ic = need('curve');
      eachInstance(el, src, (vals, i) => addCurveEdge(s, vals[ia] as number, vals[ib] as number, vals[ic] as number, i, src));
    } else if (el.name === 'basepoint') {
      const iv = need('vertex'), ik = need('kind');
      eachInstance(el, src, (vals, i) => addBasepoint(s, vals[iv] as number, vals[ik] as number, i, src));
    } else eachInstance(el, src, () => {});
  }
  if (!s.pos) throw new FileProblem('bad-header', "The PLY file has no 'vertex' element.", 1);
  return finishMeshFile(s.pos, s.tris.done(), [...s.curves.values()], s.basepoints, []);
}

/** Reads every instance of an element; vals[k] is a number or, for list properties, an array. */
function eachInstance(el: PlyElement, src: PlySource, use: (vals: (number | number[])[], i: number) => void): void {
  const vals: (number | number[])[] = el.props.map((p) => (p.countType ? [] : 0));
  for (let i = 0; i < el.count; i++) {
    src.begin(el.name, i);
    for (let k = 0; k < el.props.length; k++) {
      const p = el.props[k];
      if (!p.countType) { vals[k] = src.read(p.type); continue; }
      const n = src.read(p.countType), list = vals[k] as number[];
      if (n < 0 || n > 1 << 20) src.fail('bad-number', `${at(src)}${src.what()} has an impossible list length ${n}.`);
      list.length = 0;
      for (let j = 0; j < n; j++) list.push(src.read(p.type));
    }
    use(vals, i);
    src.endInstance();
  }
}

const at = (src: PlySource): string => (src.line !== undefined ? `Line ${src.line}: ` : `Byte ${src.offset}: `);

function checkVertex(s: PlyState, v: number, what: string, src: PlySource): number {
  if (!Number.isInteger(v) || v < 0 || v >= s.nV) src.fail('bad-index', `${at(src)}${what} refers to vertex ${v}, but the file has ${s.nV} vertices (numbered from 0).`);
  return v;
}

function addFace(s: PlyState, list: number[], i: number, src: PlySource): void {
  if (list.length < 3) src.fail('short-face', `${at(src)}face ${i} has ${list.length} vertices; a face needs at least 3.`);
  for (const v of list) checkVertex(s, v, `face ${i}`, src);
  for (let k = 1; k + 1 < list.length; k++) { s.tris.push(list[0]); s.tris.push(list[k]); s.tris.push(list[k + 1]); }
}

function addCurveEdge(s: PlyState, a: number, b: number, code: number, i: number, src: PlySource): void {
  if (code === 0) return;
  checkVertex(s, a, `edge ${i}`, src); checkVertex(s, b, `edge ${i}`, src);
  let c = s.curves.get(code);
  if (!c) s.curves.set(code, (c = { family: code > 0 ? 'alpha' : 'beta', index: Math.abs(code) - 1, edges: [], ...(src.line !== undefined ? { line: src.line } : {}) }));
  c.edges.push(a, b);
}

function addBasepoint(s: PlyState, v: number, kind: number, i: number, src: PlySource): void {
  checkVertex(s, v, `basepoint ${i}`, src);
  if (kind === 0) src.fail('bad-number', `${at(src)}basepoint ${i} has kind 0; use +i for z_i and −i for w_i.`);
  const k = kind > 0 ? 'z' : 'w', index = Math.abs(kind) - 1;
  if (s.basepoints.some((b) => b.kind === k && b.index === index)) src.fail('basepoint-count', `${at(src)}${k}_${index + 1} is given twice; a basepoint is one vertex.`);
  s.basepoints.push({ kind: k, index, vertex: v, ...(src.line !== undefined ? { line: src.line } : {}) });
}
