/**
 * What every reader returns: a triangle soup with merged positions, each kept vertex's 1-based number in
 * the file (its first occurrence), and the curve edges and basepoints the file names, already renumbered
 * to kept vertices. Curves are assembled into cycles later (assembleCurves), once the mesh exists.
 */
import type { Problem } from '../base/result.js';
import type { BasepointKind, CurveFamily } from '../diagram/types.js';
import { FileProblem } from './text.js';

/** The edges a file gives for one curve, in file order; vertices are kept (merged) 0-based indices. */
export interface CurveEdges {
  family: CurveFamily;
  /** 0-based; the file's alpha_3 has index 2. */
  index: number;
  /** Pairs a0, b0, a1, b1, ...; a->b follows the file's order and orients the curve. */
  edges: number[];
  /** Line of the curve's first appearance (text formats). */
  line?: number;
}

/** A basepoint as a file gives it; vertex is a kept 0-based index. */
export interface BasepointMark {
  kind: BasepointKind;
  /** 0-based; z_1 has index 0. */
  index: number;
  vertex: number;
  line?: number;
}

export interface MeshFile {
  pos: Float64Array;
  /** 0-based kept vertex indices, three per triangle, in file order (polygons fan-triangulated). */
  tris: Int32Array;
  /** For each kept vertex, the 1-based number of its first occurrence in the file. */
  vertexLabels: Int32Array;
  curves: CurveEdges[];
  basepoints: BasepointMark[];
  warnings: Problem[];
}

/**
 * Merges vertices with exactly equal coordinates (−0 equals 0) by open-addressing hashing of the float
 * bits (common practice; seams in OBJ/STL files otherwise look like open boundaries). O(n) expected.
 * Returns the kept positions, remap[fileVertex] = kept vertex, and each kept vertex's 1-based file number.
 */
export function mergePositions(raw: Float64Array): { pos: Float64Array; remap: Int32Array; labels: Int32Array } {
  const n = (raw.length / 3) | 0;
  const clean = new Float64Array(3 * n);
  for (let i = 0; i < 3 * n; i++) clean[i] = raw[i] + 0;
  const bits = new Uint32Array(clean.buffer);
  let size = 16;
  while (size < 2 * n) size *= 2;
  const table = new Int32Array(size).fill(-1);
  const remap = new Int32Array(n);
  const keptOf = new Int32Array(n);
  let kept = 0;
  for (let v = 0; v < n; v++) {
    let h = 0x811c9dc5;
    for (let k = 0; k < 6; k++) h = Math.imul(h ^ bits[6 * v + k], 0x01000193);
    h = (h ^ (h >>> 15)) & (size - 1);
    for (;;) {
      const w = table[h];
      if (w < 0) { table[h] = v; remap[v] = kept; keptOf[kept++] = v; break; }
      if (clean[3 * w] === clean[3 * v] && clean[3 * w + 1] === clean[3 * v + 1] && clean[3 * w + 2] === clean[3 * v + 2]) { remap[v] = remap[w]; break; }
      h = (h + 1) & (size - 1);
    }
  }
  const pos = new Float64Array(3 * kept), labels = new Int32Array(kept);
  for (let i = 0; i < kept; i++) {
    const v = keptOf[i];
    pos[3 * i] = clean[3 * v]; pos[3 * i + 1] = clean[3 * v + 1]; pos[3 * i + 2] = clean[3 * v + 2];
    labels[i] = v + 1;
  }
  return { pos, remap, labels };
}

/** Renumbers a soup read with file indices into merged vertices. O(V + F + curve edges). */
export function finishMeshFile(raw: Float64Array, fileTris: Int32Array, curves: CurveEdges[], basepoints: BasepointMark[], warnings: Problem[]): MeshFile {
  const { pos, remap, labels } = mergePositions(raw);
  const tris = new Int32Array(fileTris.length);
  for (let i = 0; i < tris.length; i++) tris[i] = remap[fileTris[i]];
  for (const c of curves) for (let i = 0; i < c.edges.length; i++) c.edges[i] = remap[c.edges[i]];
  for (const b of basepoints) b.vertex = remap[b.vertex];
  return { pos, tris, vertexLabels: labels, curves, basepoints, warnings };
}

/** Curve and basepoint names a file may use: alpha_<i>, beta_<i>, z_<i>, w_<i> with i >= 1. */
export type MarkName = { what: 'curve'; family: CurveFamily; index: number } | { what: 'basepoint'; kind: BasepointKind; index: number } | null;

/** Reads a group name; throws on alpha_0 and the like. Case-insensitive. */
export function parseMarkName(name: string, line?: number): MarkName {
  const m = /^(alpha|beta|z|w)_(\d+)$/i.exec(name);
  if (!m) return null;
  const i = Number(m[2]);
  if (i < 1) throw new FileProblem('bad-name', `${lineTag(line)}'${name}': numbers start at 1 (alpha_1, beta_1, z_1).`, line);
  const key = m[1].toLowerCase();
  if (key === 'alpha' || key === 'beta') return { what: 'curve', family: key, index: i - 1 };
  return { what: 'basepoint', kind: key as BasepointKind, index: i - 1 };
}

export const lineTag = (line?: number): string => (line === undefined ? '' : `Line ${line}: `);
