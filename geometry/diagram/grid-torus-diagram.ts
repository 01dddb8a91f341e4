/**
 * Diagrams on the grid torus (surfaces/torus.ts) with curves given as paths of grid points (i, j):
 * meridians (i fixed), parallels (j fixed) and the (p, q) diagonal of GEOMETRY.md ("Generated
 * surfaces": N_u = qM, N_v = pM, the diagonal (t, t) is a (p, q) curve meeting the meridian p times).
 * Used by tests, benchmarks and demos. O(nu nv).
 */
import { buildTriMesh } from '../mesh/tri-mesh.js';
import { torusGrid, torusGridVertex, type TorusGridOptions } from '../surfaces/torus.js';
import type { HeegaardDiagram } from './types.js';

/** A path of grid points; consecutive points (and last to first) must be grid neighbours. */
export type GridPath = [number, number][];

/** The meridian through column i (around the tube, v increasing). */
export const gridMeridian = (o: Pick<TorusGridOptions, 'nv'>, i: number): GridPath =>
  Array.from({ length: o.nv }, (_, j) => [i, j]);

/** The parallel through row j (around the axis, u increasing). */
export const gridParallel = (o: Pick<TorusGridOptions, 'nu'>, j: number): GridPath =>
  Array.from({ length: o.nu }, (_, i) => [i, j]);

/** The diagonal (t, t), t = 0 .. lcm(nu, nv) − 1: with nu = qM, nv = pM a (p, q) curve. */
export function gridDiagonal(o: Pick<TorusGridOptions, 'nu' | 'nv'>): GridPath {
  const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
  const n = (o.nu * o.nv) / gcd(o.nu, o.nv);
  return Array.from({ length: n }, (_, t) => [t, t]);
}

export interface GridTorusDiagramSpec {
  grid: TorusGridOptions;
  alpha: GridPath[];
  beta: GridPath[];
  /** z basepoints at grid points. */
  z: [number, number][];
  /** Optional w basepoints. */
  w?: [number, number][];
}

/** Builds the mesh and the diagram. Curve order in diagram.curves: alphas then betas. */
export function gridTorusDiagram(s: GridTorusDiagramSpec): HeegaardDiagram {
  const { pos, tris } = torusGrid(s.grid);
  const { mesh } = buildTriMesh(pos, tris);
  const vert = ([i, j]: [number, number]): number => torusGridVertex(s.grid, i, j);
  return {
    mesh,
    curves: [
      ...s.alpha.map((p, index) => ({ family: 'alpha' as const, index, vertices: Int32Array.from(p, vert) })),
      ...s.beta.map((p, index) => ({ family: 'beta' as const, index, vertices: Int32Array.from(p, vert) })),
    ],
    basepoints: [
      ...s.z.map((p, index) => ({ kind: 'z' as const, index, vertex: vert(p) })),
      ...(s.w ?? []).map((p, index) => ({ kind: 'w' as const, index, vertex: vert(p) })),
    ],
  };
}

/**
 * Genus-1 diagram of the lens space L(p, q): alpha the meridian through column 0, beta the (p, q)
 * diagonal, on an (qM) x (pM) grid; z at (1, 0) when free (else the first grid point off both curves).
 */
export function lensSpaceDiagram(p: number, q: number, M: number, R = 2, r = 0.8): HeegaardDiagram {
  const grid = { R, r, nu: q * M, nv: p * M };
  const diag = gridDiagonal(grid);
  const onBeta = new Set(diag.map(([i, j]) => torusGridVertex(grid, i, j)));
  let z: [number, number] = [1, 0];
  for (let i = 1; i < grid.nu && onBeta.has(torusGridVertex(grid, z[0], z[1])); i++) {
    for (let j = 0; j < grid.nv; j++) if (!onBeta.has(torusGridVertex(grid, i, j))) { z = [i, j]; break; }
  }
  return gridTorusDiagram({ grid, alpha: [gridMeridian(grid, 0)], beta: [diag], z: [z] });
}
