/**
 * QDM1: Quadrant's compact binary for one diagram revision's mesh, curves and basepoints, as served by the
 * mesh endpoints. Pure functions on ArrayBuffer / DataView (no Node Buffer): the client imports this file.
 *
 * Layout, all little-endian, every section 4-byte aligned:
 *   offset 0   4 bytes  magic 'QDM1'
 *          4   u32      flags (bit 0: vertex labels present)
 *          8   u32      nV
 *         12   u32      nF
 *         16   u32      nCurves
 *         20   u32      nBasepoints
 *         24   f32[3nV] positions x,y,z
 *              u32[3nF] triangles (0-based vertex indices, counter-clockwise seen from outside)
 *              per curve: u32 family (0 alpha, 1 beta), u32 index (0-based), u32 length, u32[length] vertices
 *              per basepoint: u32 kind (0 z, 1 w), u32 index, u32 vertex
 *              i32[nV] vertex labels (only with flag bit 0): the vertex numbers of the user's file
 * Also base64 helpers for the compact per-face / per-vertex arrays in the analysis JSON.
 */

export const MESH_MAGIC = 'QDM1';
const FLAG_LABELS = 1;
const HEADER_BYTES = 24;

export interface MeshBinaryCurve {
  family: 'alpha' | 'beta';
  index: number;
  vertices: Uint32Array;
}
export interface MeshBinaryBasepoint {
  kind: 'z' | 'w';
  index: number;
  vertex: number;
}
export interface MeshBinary {
  /** xyz per vertex, length 3 nV. */
  positions: Float32Array;
  /** 3 vertex indices per face, length 3 nF. */
  triangles: Uint32Array;
  curves: MeshBinaryCurve[];
  basepoints: MeshBinaryBasepoint[];
  /** File vertex numbers, one per vertex; absent means v + 1. */
  vertexLabels?: Int32Array;
}

/** A decoding failure (truncated or foreign data); never thrown for well-formed input. */
export class MeshBinaryError extends Error {}

/** Byte size of the encoding. O(curves). */
export function meshBinaryByteLength(m: MeshBinary): number {
  const nV = m.positions.length / 3;
  let n = HEADER_BYTES + 4 * m.positions.length + 4 * m.triangles.length;
  for (const c of m.curves) n += 12 + 4 * c.vertices.length;
  n += 12 * m.basepoints.length;
  if (m.vertexLabels) n += 4 * nV;
  return n;
}

/** Encodes a mesh into a fresh ArrayBuffer. O(V + F + curve lengths). */
export function encodeMeshBinary(m: MeshBinary): ArrayBuffer {
  if (m.positions.length % 3 !== 0 || m.triangles.length % 3 !== 0) {
    throw new MeshBinaryError('positions and triangles must have a multiple of 3 entries');
  }
  const nV = m.positions.length / 3;
  const nF = m.triangles.length / 3;
  if (m.vertexLabels && m.vertexLabels.length !== nV) throw new MeshBinaryError('one vertex label per vertex');
  const buf = new ArrayBuffer(meshBinaryByteLength(m));
  const dv = new DataView(buf);
  for (let i = 0; i < 4; i++) dv.setUint8(i, MESH_MAGIC.charCodeAt(i));
  dv.setUint32(4, m.vertexLabels ? FLAG_LABELS : 0, true);
  dv.setUint32(8, nV, true);
  dv.setUint32(12, nF, true);
  dv.setUint32(16, m.curves.length, true);
  dv.setUint32(20, m.basepoints.length, true);
  let o = HEADER_BYTES;
  const pos = m.positions;
  for (let i = 0; i < pos.length; i++, o += 4) dv.setFloat32(o, pos[i], true);
  const tri = m.triangles;
  for (let i = 0; i < tri.length; i++, o += 4) dv.setUint32(o, tri[i], true);
  for (const c of m.curves) {
    dv.setUint32(o, c.family === 'alpha' ? 0 : 1, true);
    dv.setUint32(o + 4, c.index, true);
    dv.setUint32(o + 8, c.vertices.length, true);
    o += 12;
    for (let i = 0; i < c.vertices.length; i++, o += 4) dv.setUint32(o, c.vertices[i], true);
  }
  for (const b of m.basepoints) {
    dv.setUint32(o, b.kind === 'z' ? 0 : 1, true);
    dv.setUint32(o + 4, b.index, true);
    dv.setUint32(o + 8, b.vertex, true);
    o += 12;
  }
  if (m.vertexLabels) for (let i = 0; i < nV; i++, o += 4) dv.setInt32(o, m.vertexLabels[i], true);
  return buf;
}

/** Decodes QDM1 bytes (an ArrayBuffer, or a view on one, e.g. a Node Buffer). O(size). */
export function decodeMeshBinary(input: ArrayBuffer | ArrayBufferView): MeshBinary {
  const dv = input instanceof ArrayBuffer
    ? new DataView(input)
    : new DataView(input.buffer, input.byteOffset, input.byteLength);
  const need = (o: number, n: number) => {
    if (o + n > dv.byteLength) throw new MeshBinaryError(`mesh data truncated at byte ${o}`);
  };
  need(0, HEADER_BYTES);
  let magic = '';
  for (let i = 0; i < 4; i++) magic += String.fromCharCode(dv.getUint8(i));
  if (magic !== MESH_MAGIC) throw new MeshBinaryError('not a QDM1 mesh');
  const flags = dv.getUint32(4, true);
  const nV = dv.getUint32(8, true);
  const nF = dv.getUint32(12, true);
  const nC = dv.getUint32(16, true);
  const nB = dv.getUint32(20, true);
  let o = HEADER_BYTES;
  need(o, 12 * nV + 12 * nF);
  const positions = new Float32Array(3 * nV);
  for (let i = 0; i < positions.length; i++, o += 4) positions[i] = dv.getFloat32(o, true);
  const triangles = new Uint32Array(3 * nF);
  for (let i = 0; i < triangles.length; i++, o += 4) {
    const v = dv.getUint32(o, true);
    if (v >= nV) throw new MeshBinaryError(`triangle vertex ${v} out of range`);
    triangles[i] = v;
  }
  const curves: MeshBinaryCurve[] = [];
  for (let c = 0; c < nC; c++) {
    need(o, 12);
    const family = dv.getUint32(o, true) === 0 ? 'alpha' : 'beta';
    const index = dv.getUint32(o + 4, true);
    const len = dv.getUint32(o + 8, true);
    o += 12;
    need(o, 4 * len);
    const vertices = new Uint32Array(len);
    for (let i = 0; i < len; i++, o += 4) vertices[i] = dv.getUint32(o, true);
    curves.push({ family, index, vertices });
  }
  const basepoints: MeshBinaryBasepoint[] = [];
  need(o, 12 * nB);
  for (let b = 0; b < nB; b++, o += 12) {
    basepoints.push({
      kind: dv.getUint32(o, true) === 0 ? 'z' : 'w',
      index: dv.getUint32(o + 4, true),
      vertex: dv.getUint32(o + 8, true),
    });
  }
  const out: MeshBinary = { positions, triangles, curves, basepoints };
  if (flags & FLAG_LABELS) {
    need(o, 4 * nV);
    const labels = new Int32Array(nV);
    for (let i = 0; i < nV; i++, o += 4) labels[i] = dv.getInt32(o, true);
    out.vertexLabels = labels;
  }
  return out;
}

// --- base64 of little-endian typed arrays (btoa/atob exist in browsers and Node >= 16) ---

function bytesToBase64(bytes: Uint8Array): string {
  let s = '';
  const CHUNK = 0x8000;
  for (let i = 0; i < bytes.length; i += CHUNK) {
    s += String.fromCharCode.apply(null, Array.from(bytes.subarray(i, i + CHUNK)));
  }
  return btoa(s);
}
function base64ToBytes(b64: string): Uint8Array {
  const s = atob(b64);
  const out = new Uint8Array(s.length);
  for (let i = 0; i < s.length; i++) out[i] = s.charCodeAt(i);
  return out;
}

/** Int32 values → base64 of their little-endian bytes. O(n). */
export function encodeInt32Base64(values: ArrayLike<number>): string {
  const dv = new DataView(new ArrayBuffer(4 * values.length));
  for (let i = 0; i < values.length; i++) dv.setInt32(4 * i, values[i], true);
  return bytesToBase64(new Uint8Array(dv.buffer));
}
/** Inverse of encodeInt32Base64. O(n). */
export function decodeInt32Base64(b64: string): Int32Array {
  const bytes = base64ToBytes(b64);
  if (bytes.length % 4 !== 0) throw new MeshBinaryError('base64 Int32 data has a partial element');
  const dv = new DataView(bytes.buffer);
  const out = new Int32Array(bytes.length / 4);
  for (let i = 0; i < out.length; i++) out[i] = dv.getInt32(4 * i, true);
  return out;
}
/** Float32 values → base64 of their little-endian bytes. O(n). */
export function encodeFloat32Base64(values: ArrayLike<number>): string {
  const dv = new DataView(new ArrayBuffer(4 * values.length));
  for (let i = 0; i < values.length; i++) dv.setFloat32(4 * i, values[i], true);
  return bytesToBase64(new Uint8Array(dv.buffer));
}
/** Inverse of encodeFloat32Base64. O(n). */
export function decodeFloat32Base64(b64: string): Float32Array {
  const bytes = base64ToBytes(b64);
  if (bytes.length % 4 !== 0) throw new MeshBinaryError('base64 Float32 data has a partial element');
  const dv = new DataView(bytes.buffer);
  const out = new Float32Array(bytes.length / 4);
  for (let i = 0; i < out.length; i++) out[i] = dv.getFloat32(4 * i, true);
  return out;
}
