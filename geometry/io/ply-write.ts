/**
 * PLY writer (Turk 1994) for diagrams, with Quadrant's `edge` (curve = +i alpha_i, −i beta_i) and
 * `basepoint` (kind = +i z_i, −i w_i) elements described in ply.ts. Positions are doubles, so reading the
 * file back gives the same diagram. O(V + F + curve length).
 */
import type { HeegaardDiagram } from '../diagram/types.js';
import { asBytes } from './text.js';

/** Writes ASCII or binary little-endian PLY as bytes. */
export function writePly(diagram: Pick<HeegaardDiagram, 'mesh' | 'curves' | 'basepoints'>, options: { binary: boolean } = { binary: true }): Uint8Array {
  const { mesh, curves, basepoints } = diagram;
  const edges: number[] = [];
  for (const c of curves) {
    const code = c.family === 'alpha' ? c.index + 1 : -(c.index + 1), n = c.vertices.length;
    for (let i = 0; i < n; i++) edges.push(c.vertices[i], c.vertices[(i + 1) % n], code);
  }
  const nE = edges.length / 3;
  const head = [
    'ply', `format ${options.binary ? 'binary_little_endian' : 'ascii'} 1.0`, 'comment Quadrant Heegaard diagram',
    'comment edge curve: +i = alpha_i, -i = beta_i; basepoint kind: +i = z_i, -i = w_i',
    `element vertex ${mesh.nV}`, 'property double x', 'property double y', 'property double z',
    `element face ${mesh.nF}`, 'property list uchar int vertex_indices',
  ];
  if (nE) head.push(`element edge ${nE}`, 'property int vertex1', 'property int vertex2', 'property int curve');
  if (basepoints.length) head.push(`element basepoint ${basepoints.length}`, 'property int vertex', 'property int kind');
  head.push('end_header', '');
  const kind = (b: (typeof basepoints)[number]) => (b.kind === 'z' ? b.index + 1 : -(b.index + 1));
  if (!options.binary) {
    const out = head;
    out.pop();
    for (let v = 0; v < mesh.nV; v++) out.push(`${mesh.pos[3 * v]} ${mesh.pos[3 * v + 1]} ${mesh.pos[3 * v + 2]}`);
    for (let f = 0; f < mesh.nF; f++) out.push(`3 ${mesh.heVert[3 * f]} ${mesh.heVert[3 * f + 1]} ${mesh.heVert[3 * f + 2]}`);
    for (let e = 0; e < nE; e++) out.push(`${edges[3 * e]} ${edges[3 * e + 1]} ${edges[3 * e + 2]}`);
    for (const b of basepoints) out.push(`${b.vertex} ${kind(b)}`);
    return asBytes(out.join('\n') + '\n');
  }
  const h = asBytes(head.join('\n'));
  const bytes = new Uint8Array(h.length + 24 * mesh.nV + 13 * mesh.nF + 12 * nE + 8 * basepoints.length);
  bytes.set(h);
  const dv = new DataView(bytes.buffer);
  let o = h.length;
  for (let i = 0; i < 3 * mesh.nV; i++, o += 8) dv.setFloat64(o, mesh.pos[i], true);
  for (let f = 0; f < mesh.nF; f++) {
    dv.setUint8(o++, 3);
    for (let k = 0; k < 3; k++, o += 4) dv.setInt32(o, mesh.heVert[3 * f + k], true);
  }
  for (let i = 0; i < edges.length; i++, o += 4) dv.setInt32(o, edges[i], true);
  for (const b of basepoints) { dv.setInt32(o, b.vertex, true); dv.setInt32(o + 4, kind(b), true); o += 8; }
  return bytes;
}
