/**
 * The combinatorial shadow of a Heegaard diagram: everything the Floer computations need and nothing
 * geometric. The geometry core's analysis produces it from a mesh; tests may also build it directly.
 *
 * Quadrant convention at an intersection point p of alpha_i and beta_j (REFERENCE.md, "Local form"):
 * take an orientation-preserving chart in which alpha_i runs horizontally in its own direction (east)
 * and beta_j vertically. Going counter-clockwise from the east ray, the four wedges are
 * NE (0), NW (1), SW (2), SE (3). The boundary rule reads (a_NE + a_SW) - (a_NW + a_SE) = [p in x] - [p in y].
 * sign is the local intersection sign alpha_i . beta_j: +1 when beta_j's direction is the north ray.
 */
export interface CombinatorialPoint {
  /** Mesh vertex (0-based) of the crossing, for mapping back to the surface. */
  vertex: number;
  /** 0-based alpha index. */
  alpha: number;
  /** 0-based beta index. */
  beta: number;
  sign: 1 | -1;
  /** Region ids in the quadrants NE, NW, SW, SE. A region may occupy several quadrants of one point. */
  quadrants: [number, number, number, number];
  /** Optional: the vertex number a user sees (file numbering); absent means vertex + 1. */
  label?: number;
}

export interface CombinatorialRegion {
  id: number;
  /** Euler characteristic of the region cut open along the curves. */
  chi: number;
  /** Number of corners (all convex: a region fills one quadrant at each of its corners). */
  corners: number;
  /** 4 e(R) = 4 chi - corners, an integer (Lipshitz 2006). */
  eulerQuarters: number;
  /** Indices into CombinatorialDiagram.basepoints of the basepoints inside the region. */
  basepoints: number[];
  /** Optional: the Euler measure measured on the surface (discrete Gauss–Bonnet), when a mesh backs the diagram. */
  geometricEuler?: number;
}

export interface CombinatorialDiagram {
  genus: number;
  /** Number of alpha curves = number of beta curves = k. */
  curveCount: number;
  points: CombinatorialPoint[];
  regions: CombinatorialRegion[];
  basepoints: { kind: 'z' | 'w'; index: number }[];
}
