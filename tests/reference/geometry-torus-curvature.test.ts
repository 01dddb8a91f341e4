import { describe, expect, it } from 'vitest';
import { analyzeDiagram, gridMeridian, gridParallel, gridTorusDiagram, torusGridVertex, type DiagramAnalysis } from '../../geometry/index.js';

/**
 * A coordinate rectangle [u1,u2] x [v1,v2] of the torus of revolution cut out by two meridians (alpha) and
 * two parallels (beta) on a 4N x 4N grid; a valid multi-pointed genus-1 diagram with k = 2 (each family
 * cuts the torus into 2 annuli, one z in each: Manolescu–Ozsváth–Sarkar 2009 count rules).
 */
function rectangle(N: number, [i1, i2]: [number, number], [j1, j2]: [number, number]) {
  const grid = { R: 2, r: 0.8, nu: 4 * N, nv: 4 * N };
  const d = gridTorusDiagram({
    grid,
    alpha: [gridMeridian(grid, i1 * N), gridMeridian(grid, i2 * N)],
    beta: [gridParallel(grid, j1 * N), gridParallel(grid, j2 * N)],
    z: [[((i1 + i2) * N) / 2, ((j2 + 4 + j1) * N) / 2], [((i2 + 4 + i1) * N) / 2, ((j1 + j2) * N) / 2]],
  });
  const r = analyzeDiagram(d);
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
  const a: DiagramAnalysis = r.value;
  const centre = torusGridVertex(grid, ((i1 + i2) * N) / 2, ((j1 + j2) * N) / 2);
  const region = a.regions[a.faceRegion[(d.mesh.vertHe[centre] / 3) | 0]];
  return { a, region };
}

const quarter = Math.PI / 2;
// do Carmo 1976 §4-2 / REFERENCE.md: ∫∫ K dA over [u1,u2]x[v1,v2] = (u2 − u1)(sin v2 − sin v1)
const exact = (i: [number, number], j: [number, number]) => (i[1] - i[0]) * quarter * (Math.sin(j[1] * quarter) - Math.sin(j[0] * quarter));

describe('curvature of the torus of revolution over a coordinate rectangle', () => {
  for (const [i, j] of [[[0, 1], [0, 1]], [[1, 2], [1, 2]], [[0, 2], [3, 4]]] as [[number, number], [number, number]][]) {
    it(`approaches (u2 − u1)(sin v2 − sin v1) = ${exact(i, j).toFixed(4)} like O(h²) for u ∈ ${i}·π/2, v ∈ ${j}·π/2 (do Carmo 1976; Polthier–Schmies 1998)`, () => {
      const errors = [4, 8, 16, 32].map((N) => {
        const { region } = rectangle(N, i, j);
        return Math.abs(2 * Math.PI * region.smoothCurvature - exact(i, j));
      });
      for (let k = 0; k + 1 < errors.length; k++) expect(errors[k] / errors[k + 1]).toBeGreaterThan(3); // halving h quarters the error
      expect(errors[3]).toBeLessThan(2e-3);
    });
  }

  it('keeps the discrete Gauss–Bonnet identity exact on every rectangle: χ = 1, four right-angle corners, e = 0', () => {
    const { a } = rectangle(8, [0, 1], [0, 1]);
    expect(a.regions.length).toBe(4);
    for (const r of a.regions) {
      expect(r.chi).toBe(1);
      expect(r.eulerMeasure).toBe(0); // rectangle: e = 0 (Lipshitz 2006)
      expect(Math.abs(r.gaussBonnetChi - 1)).toBeLessThan(1e-12);
      expect(Math.abs(r.geometricEulerMeasure)).toBeLessThan(1e-12);
    }
  });
});
