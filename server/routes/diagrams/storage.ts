/**
 * How a diagram revision is stored: the mesh as a compact internal binary (Float64 positions so uploads
 * keep their exact coordinates, Int32 triangles), curves and basepoints as JSON, vertex labels as Int32
 * bytes. Conversions to and from the geometry core's HeegaardDiagram and to the QDM1 wire format.
 *
 * Internal mesh layout (little-endian): 'QDS1', u32 nV, u32 nF, u32 0 (padding), f64[3nV], i32[3nF].
 */
import {
  buildTriMesh, type HeegaardDiagram, type DiagramCurve, type Basepoint,
} from '../../../geometry/index.js';
import { encodeMeshBinary } from '../../contract/mesh-binary.js';
import { endianness } from 'node:os';

const STORED_MAGIC = 'QDS1';
const HEADER = 16;
const LE = endianness() === 'LE';

/** Columns of diagram_revisions that hold the diagram itself. */
export interface StoredDiagram {
  mesh: Buffer;
  curves: StoredCurve[];
  basepoints: StoredBasepoint[];
  vertexLabels: Buffer | null;
  stats: StoredStats;
}
export interface StoredCurve {
  family: 'alpha' | 'beta';
  index: number;
  vertices: number[];
}
export interface StoredBasepoint {
  kind: 'z' | 'w';
  index: number;
  vertex: number;
}
/** The stored columns as read back from the database (JSON columns untyped). */
export interface StoredRow {
  mesh: Buffer;
  curves: unknown;
  basepoints: unknown;
  vertexLabels: Buffer | null;
}

/** Cheap facts known at store time (the library shows them before the analysis is done). */
export interface StoredStats {
  vertices: number;
  faces: number;
  edges: number;
  eulerCharacteristic: number;
  genus: number;
  curveCount: number;
}

/** Packs a diagram for the database. O(V + F + curve lengths). */
export function storeDiagram(d: HeegaardDiagram): StoredDiagram {
  const m = d.mesh;
  const buf = Buffer.alloc(HEADER + 24 * m.nV + 12 * m.nF);
  buf.write(STORED_MAGIC, 0, 'latin1');
  buf.writeUInt32LE(m.nV, 4);
  buf.writeUInt32LE(m.nF, 8);
  const posBytes = 24 * m.nV;
  if (LE) {
    Buffer.from(m.pos.buffer, m.pos.byteOffset, posBytes).copy(buf, HEADER);
    Buffer.from(m.heVert.buffer, m.heVert.byteOffset, 12 * m.nF).copy(buf, HEADER + posBytes);
  } else {
    let o = HEADER;
    for (let i = 0; i < 3 * m.nV; i++, o += 8) buf.writeDoubleLE(m.pos[i], o);
    for (let i = 0; i < 3 * m.nF; i++, o += 4) buf.writeInt32LE(m.heVert[i], o);
  }
  let labels: Buffer | null = null;
  if (d.vertexLabels) {
    labels = Buffer.alloc(4 * m.nV);
    for (let v = 0; v < m.nV; v++) labels.writeInt32LE(d.vertexLabels[v], 4 * v);
  }
  let used = 0;
  for (let v = 0; v < m.nV; v++) if (m.vertHe[v] >= 0) used++;
  const edges = (3 * m.nF) / 2, chi = used - edges + m.nF;
  return {
    mesh: buf,
    curves: d.curves.map((c) => ({ family: c.family, index: c.index, vertices: Array.from(c.vertices) })),
    basepoints: d.basepoints.map((b) => ({ kind: b.kind, index: b.index, vertex: b.vertex })),
    vertexLabels: labels,
    stats: {
      vertices: used, faces: m.nF, edges, eulerCharacteristic: chi, genus: (2 - chi) / 2, curveCount: d.curves.filter((c) => c.family === 'alpha').length,
    },
  };
}

/** Raw arrays of a stored mesh. O(V + F). */
export function readStoredMesh(mesh: Buffer): { pos: Float64Array; tris: Int32Array } {
  if (mesh.toString('latin1', 0, 4) !== STORED_MAGIC) throw new Error('stored mesh has an unknown format');
  const nV = mesh.readUInt32LE(4), nF = mesh.readUInt32LE(8);
  if (mesh.length < HEADER + 24 * nV + 12 * nF) throw new Error('stored mesh is truncated');
  if (LE) {
    const copy = new Uint8Array(24 * nV + 12 * nF);
    copy.set(mesh.subarray(HEADER, HEADER + copy.length));
    return { pos: new Float64Array(copy.buffer, 0, 3 * nV), tris: new Int32Array(copy.buffer, 24 * nV, 3 * nF) };
  }
  const pos = new Float64Array(3 * nV), tris = new Int32Array(3 * nF);
  let o = HEADER;
  for (let i = 0; i < pos.length; i++, o += 8) pos[i] = mesh.readDoubleLE(o);
  for (let i = 0; i < tris.length; i++, o += 4) tris[i] = mesh.readInt32LE(o);
  return { pos, tris };
}

function readLabels(labels: Buffer | null | undefined, nV: number): Int32Array | undefined {
  if (!labels || labels.length !== 4 * nV) return undefined;
  const out = new Int32Array(nV);
  for (let v = 0; v < nV; v++) out[v] = labels.readInt32LE(4 * v);
  return out;
}

/** Rebuilds the HeegaardDiagram of a stored revision. O(V + F) plus the twin build. */
export function loadDiagram(row: StoredRow): HeegaardDiagram {
  const { pos, tris } = readStoredMesh(row.mesh);
  const { mesh } = buildTriMesh(pos, tris);
  const curves: DiagramCurve[] = (row.curves as StoredCurve[]).map((c) => ({
    family: c.family, index: c.index, vertices: Int32Array.from(c.vertices),
  }));
  const basepoints: Basepoint[] = (row.basepoints as StoredBasepoint[]).map((b) => ({ kind: b.kind, index: b.index, vertex: b.vertex }));
  const vertexLabels = readLabels(row.vertexLabels, mesh.nV);
  return { mesh, curves, basepoints, ...(vertexLabels ? { vertexLabels } : {}) };
}

/** The QDM1 bytes the mesh endpoints serve. O(V + F + curve lengths). */
export function wireMesh(row: StoredRow): Buffer {
  const { pos, tris } = readStoredMesh(row.mesh);
  const nV = pos.length / 3;
  const labels = readLabels(row.vertexLabels, nV);
  const buf = encodeMeshBinary({
    positions: Float32Array.from(pos),
    triangles: Uint32Array.from(tris),
    curves: (row.curves as StoredCurve[]).map((c) => ({ family: c.family, index: c.index, vertices: Uint32Array.from(c.vertices) })),
    basepoints: (row.basepoints as StoredBasepoint[]).map((b) => ({ ...b })),
    ...(labels ? { vertexLabels: labels } : {}),
  });
  return Buffer.from(buf);
}
