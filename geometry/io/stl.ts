/**
 * STL (3D Systems, "StereoLithography Interface Specification", 1989), ASCII and binary (80-byte header,
 * uint32 triangle count, 50 bytes per triangle: float32 normal, three float32 corners, uint16 attribute;
 * little-endian). Surface only. STL repeats each corner per triangle, so vertices are always merged; a kept
 * vertex's label is the 1-based number of the first corner (in file order) at its position.
 */
import type { Result } from '../base/result.js';
import type { TriMesh } from '../mesh/tri-mesh.js';
import { finishMeshFile, type MeshFile } from './mesh-file.js';
import { FileProblem, GrowArray, LineScanner, asBytes, asText, forEachLine, guard } from './text.js';

/** Reads ASCII or binary STL (binary when the size matches the header's triangle count). O(file size). */
export function readStl(input: Uint8Array | string): Result<MeshFile> {
  const bytes = asBytes(input);
  return guard(() => (isBinaryStl(bytes) ? parseBinaryStl(bytes) : parseAsciiStl(asText(input))));
}

function isBinaryStl(b: Uint8Array): boolean {
  if (b.length >= 84) {
    const count = new DataView(b.buffer, b.byteOffset, b.byteLength).getUint32(80, true);
    if (84 + 50 * count === b.length) return true;
  }
  let i = 0;
  while (i < b.length && (b[i] === 32 || b[i] === 9 || b[i] === 10 || b[i] === 13)) i++;
  return String.fromCharCode(...b.subarray(i, i + 5)).toLowerCase() !== 'solid';
}

function parseBinaryStl(b: Uint8Array): MeshFile {
  if (b.length < 84) throw new FileProblem('truncated', `Byte ${b.length}: the file ends inside the 84-byte binary STL header.`, undefined, b.length);
  const dv = new DataView(b.buffer, b.byteOffset, b.byteLength);
  const n = dv.getUint32(80, true);
  if (84 + 50 * n > b.length) {
    const t = Math.floor((b.length - 84) / 50);
    throw new FileProblem('truncated', `Byte ${b.length}: the header promises ${n} triangles (${84 + 50 * n} bytes) but the file ends inside triangle ${t + 1}, which starts at byte ${84 + 50 * t}.`, undefined, b.length);
  }
  const pos = new Float64Array(9 * n);
  for (let t = 0; t < n; t++) {
    const o = 84 + 50 * t + 12;
    for (let k = 0; k < 9; k++) {
      const x = dv.getFloat32(o + 4 * k, true);
      if (!Number.isFinite(x)) throw new FileProblem('bad-number', `Byte ${o + 4 * k}: a corner coordinate of triangle ${t + 1} is not a finite number.`, undefined, o + 4 * k);
      pos[9 * t + k] = x;
    }
  }
  const tris = new Int32Array(3 * n);
  for (let i = 0; i < 3 * n; i++) tris[i] = i;
  return finishMeshFile(pos, tris, [], [], []);
}

function parseAsciiStl(text: string): MeshFile {
  const sc = new LineScanner();
  const pos = new GrowArray(new Float64Array(1024));
  let inLoop = 0, loopLine = 0, lastLine = 0, facets = 0;
  forEachLine(text, (start, end, line) => {
    lastLine = line;
    const key = sc.reset(text, start, end, line).token().toLowerCase();
    if (key === 'vertex') {
      if (inLoop === 0) throw new FileProblem('bad-stl', `Line ${line}: 'vertex' outside an 'outer loop'.`, line);
      if (++inLoop > 4) throw new FileProblem('bad-stl', `Line ${line}: an STL facet has exactly 3 vertices; this one has more.`, line);
      pos.push(sc.number('x coordinate')); pos.push(sc.number('y coordinate')); pos.push(sc.number('z coordinate'));
    } else if (key === 'outer') { inLoop = 1; loopLine = line; }
    else if (key === 'endloop') {
      if (inLoop !== 4) throw new FileProblem('bad-stl', `Line ${loopLine}: an STL facet has exactly 3 vertices; this one has ${Math.max(0, inLoop - 1)}.`, loopLine);
      inLoop = 0; facets++;
    }
  });
  if (inLoop !== 0) throw new FileProblem('truncated', `Line ${lastLine}: the file ends inside a facet.`, lastLine);
  if (facets === 0) throw new FileProblem('no-faces', 'This STL file has no facets.', lastLine);
  const tris = new Int32Array(3 * facets);
  for (let i = 0; i < tris.length; i++) tris[i] = i;
  return finishMeshFile(pos.done(), tris, [], [], []);
}

/** Unit normal of face f (zero for a degenerate face). O(1). */
function faceNormal(m: TriMesh, f: number): [number, number, number] {
  const p = m.pos, a = 3 * m.heVert[3 * f], b = 3 * m.heVert[3 * f + 1], c = 3 * m.heVert[3 * f + 2];
  const ux = p[b] - p[a], uy = p[b + 1] - p[a + 1], uz = p[b + 2] - p[a + 2];
  const vx = p[c] - p[a], vy = p[c + 1] - p[a + 1], vz = p[c + 2] - p[a + 2];
  const nx = uy * vz - uz * vy, ny = uz * vx - ux * vz, nz = ux * vy - uy * vx;
  const r = Math.hypot(nx, ny, nz) || 1;
  return [nx / r, ny / r, nz / r];
}

/** Writes STL; binary stores float32 (shared corners stay shared), ASCII shortest round-trip decimals. O(F). */
export function writeStl(mesh: TriMesh, options: { binary: boolean } = { binary: true }): Uint8Array {
  if (!options.binary) {
    const out: string[] = ['solid quadrant'];
    for (let f = 0; f < mesh.nF; f++) {
      out.push(`  facet normal ${faceNormal(mesh, f).join(' ')}`, '    outer loop');
      for (let k = 0; k < 3; k++) {
        const v = mesh.heVert[3 * f + k];
        out.push(`      vertex ${mesh.pos[3 * v]} ${mesh.pos[3 * v + 1]} ${mesh.pos[3 * v + 2]}`);
      }
      out.push('    endloop', '  endfacet');
    }
    out.push('endsolid quadrant', '');
    return asBytes(out.join('\n'));
  }
  const bytes = new Uint8Array(84 + 50 * mesh.nF);
  const header = 'Quadrant binary STL';
  for (let i = 0; i < header.length; i++) bytes[i] = header.charCodeAt(i);
  const dv = new DataView(bytes.buffer);
  dv.setUint32(80, mesh.nF, true);
  for (let f = 0; f < mesh.nF; f++) {
    const o = 84 + 50 * f;
    const n = faceNormal(mesh, f);
    for (let k = 0; k < 3; k++) dv.setFloat32(o + 4 * k, n[k], true);
    for (let k = 0; k < 3; k++) {
      const v = mesh.heVert[3 * f + k];
      for (let d = 0; d < 3; d++) dv.setFloat32(o + 12 + 12 * k + 4 * d, mesh.pos[3 * v + d], true);
    }
  }
  return bytes;
}
