/**
 * One entry point for uploaded files: pick the reader by extension, drop unused vertices (with a warning),
 * build the mesh, validate the surface, assemble curves and basepoints. Any error stops the pipeline and is
 * returned as the list of problems; nothing throws on bad input.
 */
import type { Problem, Result } from '../base/result.js';
import { fail, ok } from '../base/result.js';
import type { HeegaardDiagram } from '../diagram/types.js';
import { buildTriMesh } from '../mesh/tri-mesh.js';
import { isWarning, surfaceStats, validateSurface, type SurfaceStats } from '../mesh/validate.js';
import { assembleBasepoints, assembleCurves } from './assemble-curves.js';
import type { MeshFile } from './mesh-file.js';
import { readObj } from './obj.js';
import { readOff } from './off.js';
import { readPly } from './ply.js';
import { readStl } from './stl.js';

export interface ParsedDiagramFile {
  diagram: HeegaardDiagram;
  stats: SurfaceStats;
  /** Things that were fixed or ignored (unused vertices, polylines outside curve groups, …). */
  warnings: Problem[];
}

const READERS: Record<string, (input: Uint8Array | string) => Result<MeshFile>> = {
  obj: readObj, ply: readPly, off: readOff, stl: readStl,
};

/** The file formats parseDiagramFile reads, as lower-case extensions. */
export const DIAGRAM_FILE_EXTENSIONS: readonly string[] = Object.keys(READERS);

/** Chooses the reader from the file name's extension (case-insensitive). O(file size + mesh). */
export function parseDiagramFile(fileName: string, bytes: Uint8Array | string): Result<ParsedDiagramFile> {
  const ext = /\.([^./\\]+)$/.exec(fileName)?.[1]?.toLowerCase() ?? '';
  const reader = READERS[ext];
  if (!reader) {
    return fail({ code: 'unknown-format', message: `Quadrant reads .obj, .ply, .off and .stl files; '${fileName}' has none of these extensions.` });
  }
  const read = reader(bytes);
  if (!read.ok) return read;
  return diagramFromMeshFile(read.value);
}

/** Builds and checks a diagram from a reader's output. */
export function diagramFromMeshFile(file: MeshFile): Result<ParsedDiagramFile> {
  const warnings = [...file.warnings];
  const f = dropUnusedVertices(file, warnings);
  if (f.tris.length === 0) return fail({ code: 'no-faces', message: 'The file contains no triangles, so there is no surface to work on.' });
  const { mesh, report } = buildTriMesh(f.pos, f.tris);
  const problems = validateSurface(mesh, report, f.vertexLabels);
  const errors = problems.filter((p) => !isWarning(p));
  warnings.push(...problems.filter(isWarning));
  if (errors.length) return fail(...errors);
  const curves = assembleCurves(mesh, f.curves, f.vertexLabels);
  if (!curves.ok) return curves;
  const basepoints = assembleBasepoints(f.basepoints, curves.value, f.vertexLabels);
  if (!basepoints.ok) return basepoints;
  const diagram: HeegaardDiagram = { mesh, curves: curves.value, basepoints: basepoints.value, vertexLabels: f.vertexLabels };
  return ok({ diagram, stats: surfaceStats(mesh), warnings });
}

/** Removes vertices no triangle uses, warning about each; curve and basepoint marks on them become -1. O(V + F). */
function dropUnusedVertices(f: MeshFile, warnings: Problem[]): MeshFile {
  const nV = f.vertexLabels.length;
  const used = new Uint8Array(nV);
  for (let i = 0; i < f.tris.length; i++) used[f.tris[i]] = 1;
  const remap = new Int32Array(nV);
  let kept = 0, dropped = 0;
  for (let v = 0; v < nV; v++) {
    if (used[v]) remap[v] = kept++;
    else {
      remap[v] = -1;
      if (dropped++ < 20) warnings.push({ code: 'unused-vertex', message: `Vertex ${f.vertexLabels[v]} is not used by any triangle; it is ignored.`, vertices: [f.vertexLabels[v]] });
    }
  }
  if (dropped > 20) warnings.push({ code: 'unused-vertex', message: `…and ${dropped - 20} more unused vertices are ignored.` });
  if (dropped === 0) return f;
  const pos = new Float64Array(3 * kept), labels = new Int32Array(kept);
  for (let v = 0; v < nV; v++) {
    const r = remap[v];
    if (r < 0) continue;
    pos[3 * r] = f.pos[3 * v]; pos[3 * r + 1] = f.pos[3 * v + 1]; pos[3 * r + 2] = f.pos[3 * v + 2];
    labels[r] = f.vertexLabels[v];
  }
  const tris = f.tris.map((v) => remap[v]);
  const curves = f.curves.map((c) => ({ ...c, edges: c.edges.map((v) => remap[v]) }));
  const basepoints = f.basepoints.map((b) => ({ ...b, vertex: remap[b.vertex] }));
  return { ...f, pos, tris, vertexLabels: labels, curves, basepoints };
}
