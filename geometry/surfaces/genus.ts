/**
 * Closed genus-g surfaces with standard curves (GEOMETRY.md, "Generated surfaces"). The cage is the
 * boundary of a slab of (3g+1) x 4 x 2 unit voxels with hole i removed at x in {3i+1, 3i+2}, y in {1, 2}
 * (no two voxels touch along an edge only, so the cage is a manifold quad mesh). Catmull–Clark smooths it
 * `level` times, keeping curves as edge paths; quads are split into triangles. Faces are counter-clockwise
 * seen from outside.
 *
 * Curves on the cage, as vertex cycles along cage edges:
 * - alpha_i: the loop around the front bar beside hole i, in the plane x = 3i+2 (a meridian of the bar);
 * - beta_i: the loop around hole i on its inner walls at height z = 1.
 * alpha_i meets beta_i at exactly one vertex, (3i+2, 1, 1) on the hole's front wall, where the cage is a
 * flat regular degree-4 vertex and the four curve edges alternate alpha, beta, alpha, beta; alpha_i and
 * beta_j (i != j) are disjoint. So alpha_i ∩ beta_j = δ_ij (the standard genus-g diagram of S^3).
 */
import { assert } from '../base/assert.js';
import { catmullClark, triangulateQuads, type QuadMesh } from './catmull-clark.js';

export interface GenusSurfaceOptions {
  /** 0..8; genus 0 is a sphere (a smoothed box) with no curves. */
  genus: number;
  /** Catmull–Clark steps, 0..6. Triangles: 2 (44g + 28) 4^level. */
  level: number;
}

/** A generated closed surface with its standard curves; plain arrays, no mesh structure. */
export interface GeneratedSurface {
  pos: Float64Array;
  tris: Int32Array;
  /** alphas[i] is alpha_{i+1}: a closed vertex cycle along mesh edges (first vertex not repeated). */
  alphas: Int32Array[];
  /** betas[i] is beta_{i+1}. */
  betas: Int32Array[];
  /** A vertex on no curve (the cage corner (0, 0, 0)). */
  basepoint: number;
}

const NY = 4, NZ = 2;

/** The voxel-slab cage of genus g with its curves, before smoothing. O(g). */
export function voxelSlabCage(genus: number): { mesh: QuadMesh; alphas: Int32Array[]; betas: Int32Array[]; basepoint: number } {
  assert(Number.isInteger(genus) && genus >= 0 && genus <= 8, 'voxelSlabCage: genus must be an integer 0..8');
  const nx = 3 * genus + 1;
  const solid = (x: number, y: number, z: number): boolean =>
    x >= 0 && x < nx && y >= 0 && y < NY && z >= 0 && z < NZ && !((y === 1 || y === 2) && x % 3 !== 0);
  const lattice = (x: number, y: number, z: number): number => (x * (NY + 1) + y) * (NZ + 1) + z;
  const faces: number[] = [];
  const unit = [[1, 0, 0], [0, 1, 0], [0, 0, 1]];
  for (let x = 0; x < nx; x++) for (let y = 0; y < NY; y++) for (let z = 0; z < NZ; z++) {
    if (!solid(x, y, z)) continue;
    for (let d = 0; d < 3; d++) for (const sign of [1, -1]) {
      const e = unit[d], u = unit[(d + 1) % 3], w = unit[(d + 2) % 3];
      if (solid(x + sign * e[0], y + sign * e[1], z + sign * e[2])) continue;
      const p = sign > 0 ? [x + e[0], y + e[1], z + e[2]] : [x, y, z];
      const c = (a: number, b: number) => lattice(p[0] + a * u[0] + b * w[0], p[1] + a * u[1] + b * w[1], p[2] + a * u[2] + b * w[2]);
      // p, p+u, p+u+w, p+w has normal u x w = e_d: outward for the + side; reversed for the − side.
      if (sign > 0) faces.push(c(0, 0), c(1, 0), c(1, 1), c(0, 1));
      else faces.push(c(0, 0), c(0, 1), c(1, 1), c(1, 0));
    }
  }
  const nL = (nx + 1) * (NY + 1) * (NZ + 1);
  const id = new Int32Array(nL).fill(-1);
  for (const v of faces) id[v] = 0;
  let nV = 0;
  for (let v = 0; v < nL; v++) if (id[v] === 0) id[v] = nV++;
  const pos = new Float64Array(3 * nV);
  for (let x = 0; x <= nx; x++) for (let y = 0; y <= NY; y++) for (let z = 0; z <= NZ; z++) {
    const v = id[lattice(x, y, z)];
    if (v >= 0) pos.set([x - nx / 2, y - NY / 2, z - NZ / 2], 3 * v);
  }
  const cycle = (pts: number[][]): Int32Array => Int32Array.from(pts, ([x, y, z]) => id[lattice(x, y, z)]);
  const alphas: Int32Array[] = [], betas: Int32Array[] = [];
  for (let i = 0; i < genus; i++) {
    const X = 3 * i + 2, a = 3 * i + 1, b = 3 * i + 3;
    alphas.push(cycle([[X, 0, 0], [X, 1, 0], [X, 1, 1], [X, 1, 2], [X, 0, 2], [X, 0, 1]]));
    betas.push(cycle([[a, 1, 1], [X, 1, 1], [b, 1, 1], [b, 2, 1], [b, 3, 1], [X, 3, 1], [a, 3, 1], [a, 2, 1]]));
  }
  return { mesh: { pos, quads: Int32Array.from(faces, (v) => id[v]) }, alphas, betas, basepoint: id[lattice(0, 0, 0)] };
}

/**
 * A smooth-looking closed orientable surface of the given genus with curves alpha_1..alpha_g and
 * beta_1..beta_g as above. g = 2, level = 3: V = 7422, E = 22272, F = 14848 (GEOMETRY.md, measured).
 * O(F) with F = 2 (44g + 28) 4^level triangles.
 */
export function genusSurface(o: GenusSurfaceOptions): GeneratedSurface {
  assert(Number.isInteger(o.level) && o.level >= 0 && o.level <= 6, 'genusSurface: level must be an integer 0..6');
  const cage = voxelSlabCage(o.genus);
  let mesh = cage.mesh, curves = [...cage.alphas, ...cage.betas];
  for (let l = 0; l < o.level; l++) ({ mesh, curves } = catmullClark(mesh, curves));
  return {
    pos: mesh.pos, tris: triangulateQuads(mesh),
    alphas: curves.slice(0, o.genus), betas: curves.slice(o.genus), basepoint: cage.basepoint,
  };
}
