/**
 * OFF (Object File Format, Geomview): a header `OFF` (also COFF, NOFF, STOFF…: extra per-vertex values are
 * ignored), counts `nV nF nE`, then nV vertex lines and nF face lines `n i_1 … i_n` with 0-based indices
 * (face colours ignored). Surface only: OFF has no curves or basepoints. Polygons are fan-triangulated.
 * Vertex labels are 1-based positions in the file (the first vertex line is vertex 1).
 */
import type { Result } from '../base/result.js';
import type { TriMesh } from '../mesh/tri-mesh.js';
import { finishMeshFile, type MeshFile } from './mesh-file.js';
import { FileProblem, GrowArray, LineScanner, asText, forEachLine, guard } from './text.js';

/** Reads an OFF file. Errors carry the 1-based line number. O(file size). */
export function readOff(input: Uint8Array | string): Result<MeshFile> {
  return guard(() => parseOff(asText(input)));
}

function parseOff(text: string): MeshFile {
  const sc = new LineScanner();
  let stage = 0, nV = 0, nF = 0, vRead = 0, fRead = 0, lastLine = 0;
  let pos = new Float64Array(0);
  const tris = new GrowArray(new Int32Array(1024));
  forEachLine(text, (start, end, line) => {
    lastLine = line;
    sc.reset(text, start, end, line);
    const readCounts = (): void => {
      nV = sc.integer('vertex count'); nF = sc.integer('face count');
      if (nV < 0 || nF < 0) throw new FileProblem('bad-header', `Line ${line}: counts must not be negative.`, line);
      pos = new Float64Array(3 * nV);
      stage = 2;
    };
    const tok = sc.token();
    if (tok === '') return;
    if (stage === 0) {
      if (!/^(ST)?C?N?OFF$/i.test(tok)) throw new FileProblem('bad-header', `Line ${line}: an OFF file starts with 'OFF', found '${tok}'.`, line);
      stage = 1;
      const rest = sc.pos;
      if (sc.token() === '') return;
      sc.pos = rest;
      readCounts();
      return;
    }
    if (stage === 1) {
      sc.reset(text, start, end, line);
      readCounts();
      return;
    }
    sc.reset(text, start, end, line);
    if (vRead < nV) {
      pos[3 * vRead] = sc.number('x coordinate'); pos[3 * vRead + 1] = sc.number('y coordinate'); pos[3 * vRead + 2] = sc.number('z coordinate');
      vRead++;
    } else if (fRead < nF) {
      readOffFace(sc, nV, tris);
      fRead++;
    } else return false;
  });
  if (stage < 2) throw new FileProblem('bad-header', `Line ${lastLine}: the file ends before the OFF header and counts.`, lastLine);
  if (vRead < nV || fRead < nF) {
    throw new FileProblem('truncated', `Line ${lastLine}: the file ends early: the header promises ${nV} vertices and ${nF} faces, but only ${vRead} vertices and ${fRead} faces follow.`, lastLine);
  }
  return finishMeshFile(pos, tris.done(), [], [], []);
}

function readOffFace(sc: LineScanner, nV: number, tris: GrowArray<Int32Array>): void {
  const n = sc.integer('face size');
  if (n < 3) throw new FileProblem('short-face', `Line ${sc.line}: a face needs at least 3 vertices, this one has ${n}.`, sc.line);
  let first = -1, last = -1;
  for (let k = 0; k < n; k++) {
    const i = sc.integer('vertex index');
    if (i < 0 || i >= nV) throw new FileProblem('bad-index', `Line ${sc.line}: vertex index ${i} is out of range (the file has ${nV} vertices, numbered from 0).`, sc.line);
    if (k === 0) first = i;
    else if (k >= 2) { tris.push(first); tris.push(last); tris.push(i); }
    last = i;
  }
}

/** Writes the surface as OFF with shortest round-trip decimals. O(V + F). */
export function writeOff(mesh: TriMesh): string {
  const out: string[] = ['OFF', `${mesh.nV} ${mesh.nF} ${(3 * mesh.nF) / 2}`];
  for (let v = 0; v < mesh.nV; v++) out.push(`${mesh.pos[3 * v]} ${mesh.pos[3 * v + 1]} ${mesh.pos[3 * v + 2]}`);
  for (let f = 0; f < mesh.nF; f++) out.push(`3 ${mesh.heVert[3 * f]} ${mesh.heVert[3 * f + 1]} ${mesh.heVert[3 * f + 2]}`);
  return out.join('\n') + '\n';
}
