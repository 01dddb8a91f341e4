/**
 * Purely combinatorial model diagrams (no mesh), built by code for tests, benchmarks and quick experiments.
 * All follow the quadrant convention of combinatorics.ts: at a point, alpha runs east, and NE, NW, SW, SE are
 * listed counter-clockwise from the east ray.
 */
import type { CombinatorialDiagram, CombinatorialPoint, CombinatorialRegion } from './combinatorics.js';

const mod = (a: number, n: number): number => ((a % n) + n) % n;

function squareRegion(id: number, basepoints: number[] = []): CombinatorialRegion {
  return { id, chi: 1, corners: 4, eulerQuarters: 0, basepoints };
}

/** A marking in a grid square: column c, row r (square [c, c+1] x [r, r+1]). */
export interface GridMarking { col: number; row: number; kind: 'z' | 'w' }

/**
 * The n x n toroidal grid (Manolescu–Ozsváth–Sarkar 2009): alpha_i the horizontal circle y = i (east), beta_j
 * the vertical circle x = j (north), point (j, i) = alpha_i ∩ beta_j with sign +1, region r*n + c the square
 * [c, c+1] x [r, r+1]. Markings become basepoints in their squares, in the given order.
 */
export function combinatorialGrid(n: number, markings: GridMarking[]): CombinatorialDiagram {
  const sq = (c: number, r: number) => mod(r, n) * n + mod(c, n);
  const regions = Array.from({ length: n * n }, (_, id) => squareRegion(id));
  const basepoints = markings.map((m, i) => {
    regions[sq(m.col, m.row)].basepoints.push(i);
    return { kind: m.kind, index: markings.slice(0, i).filter((o) => o.kind === m.kind).length };
  });
  const points: CombinatorialPoint[] = [];
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      points.push({ vertex: i * n + j, alpha: i, beta: j, sign: 1, quadrants: [sq(j, i), sq(j - 1, i), sq(j - 1, i - 1), sq(j, i - 1)] });
    }
  }
  return { genus: 1, curveCount: n, points, regions, basepoints };
}

/** Grid of S^3 with one z basepoint in each row and column (on the diagonal): multi-pointed, k = n, g = 1. */
export const combinatorialGridS3 = (n: number): CombinatorialDiagram =>
  combinatorialGrid(n, Array.from({ length: n }, (_, c) => ({ col: c, row: c, kind: 'z' as const })));

/** A knot grid: X in column c at row xs[c] (kind z), O in column c at row os[c] (kind w) (MOS 2009). */
export const combinatorialKnotGrid = (xs: number[], os: number[]): CombinatorialDiagram =>
  combinatorialGrid(xs.length, [
    ...xs.map((row, col) => ({ col, row, kind: 'z' as const })),
    ...os.map((row, col) => ({ col, row, kind: 'w' as const })),
  ]);

/**
 * Genus-1 diagram of the lens space L(p, q), 0 < q < p coprime, or S^3 for p = 1 (Ozsváth–Szabó 2004, §3):
 * alpha a meridian cut open into an annulus, beta p parallel arcs each climbing q steps; point t at position
 * t/p on alpha; region t is the parallelogram between the arcs leaving points t and t+1; z in region 0.
 */
export function combinatorialLensSpace(p: number, q: number): CombinatorialDiagram {
  const regions = Array.from({ length: p }, (_, id) => squareRegion(id, id === 0 ? [0] : []));
  const points = Array.from({ length: p }, (_, t): CombinatorialPoint => ({
    vertex: t, alpha: 0, beta: 0, sign: 1,
    quadrants: [mod(t, p), mod(t - 1, p), mod(t - q - 1, p), mod(t - q, p)],
  }));
  return { genus: 1, curveCount: 1, points, regions, basepoints: [{ kind: 'z', index: 0 }] };
}

/**
 * S^1 x S^2 on the torus: beta a push-off of alpha meeting it twice (points a = 0, b = 1), bounding bigons
 * B1 = region 0 and B2 = region 1, both from a to b; the rest is an annulus A = region 2. The basepoint sits in
 * A by default (Ozsváth–Szabó 2004, §3), or in a bigon when `basepointInBigon`.
 */
export function combinatorialS1xS2(basepointInBigon = false): CombinatorialDiagram {
  const zRegion = basepointInBigon ? 0 : 2;
  const regions: CombinatorialRegion[] = [
    { id: 0, chi: 1, corners: 2, eulerQuarters: 2, basepoints: [] },
    { id: 1, chi: 1, corners: 2, eulerQuarters: 2, basepoints: [] },
    { id: 2, chi: 0, corners: 4, eulerQuarters: -4, basepoints: [] },
  ];
  regions[zRegion].basepoints.push(0);
  const points: CombinatorialPoint[] = [
    { vertex: 0, alpha: 0, beta: 0, sign: 1, quadrants: [0, 2, 1, 2] },
    { vertex: 1, alpha: 0, beta: 0, sign: -1, quadrants: [2, 0, 2, 1] },
  ];
  return { genus: 1, curveCount: 1, points, regions, basepoints: [{ kind: 'z', index: 0 }] };
}

/** Genus 1 with alpha and beta disjoint parallel circles: two annuli, z in region 0 (not admissible, OS 2004). */
export function combinatorialDisjointCircles(): CombinatorialDiagram {
  return {
    genus: 1, curveCount: 1, points: [],
    regions: [
      { id: 0, chi: 0, corners: 0, eulerQuarters: 0, basepoints: [0] },
      { id: 1, chi: 0, corners: 0, eulerQuarters: 0, basepoints: [] },
    ],
    basepoints: [{ kind: 'z', index: 0 }],
  };
}
