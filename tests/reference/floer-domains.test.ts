import { describe, expect, it } from 'vitest';
import {
  checkDomain, combinatorialGridS3, combinatorialLensSpace, combinatorialS1xS2, domainBetween, domainLattice,
  forEachGenerator, maslovQuarters, type CombinatorialDiagram,
} from '../../geometry/index.js';

const ones = (c: CombinatorialDiagram) => new Array<number>(c.regions.length).fill(1);
const only = (c: CombinatorialDiagram, ...rs: number[]) => c.regions.map((_, i) => (rs.includes(i) ? 1 : 0));
/** Point index of alpha_i ∩ beta_j in the combinatorial n x n grid. */
const gp = (n: number, i: number, j: number) => ((i % n) * n + (j % n));

describe('Maslov index of bigons and rectangles (Lipshitz 2006; common practice)', () => {
  it('gives a bigon e = 1/2, n_x = n_y = 1/4 and μ = 1', () => {
    const r = checkDomain(combinatorialS1xS2(), [1, 0, 0]);
    expect(r).toMatchObject({ isDomain: true, from: [0], to: [1], eulerMeasure: '1/2', nx: '1/4', ny: '1/4', maslovIndex: '1', positive: true, nz: [0] });
  });

  it('gives both bigons of S^1 x S^2 the same ends, so they cancel mod 2 (Ozsváth–Szabó 2004)', () => {
    expect(checkDomain(combinatorialS1xS2(), [0, 1, 0])).toMatchObject({ from: [0], to: [1], maslovIndex: '1' });
  });

  it('gives a square of a 2x2 grid e = 0, n_x = n_y = 1/2 and μ = 1', () => {
    const c = combinatorialGridS3(2);
    const r = checkDomain(c, only(c, 1)); // square column 1, row 0
    expect(r).toMatchObject({ isDomain: true, eulerMeasure: '0', nx: '1/2', ny: '1/2', maslovIndex: '1' });
  });

  it('gives a 2x1 rectangle of a 4x4 grid μ = 1 when its ends are given', () => {
    const n = 4, c = combinatorialGridS3(n);
    // squares (1,0) and (2,0): corners (1,0),(3,1) in x and (3,0),(1,1) in y; alphas 2, 3 carry fixed points
    const from = [gp(n, 0, 1), gp(n, 1, 3), gp(n, 2, 0), gp(n, 3, 2)];
    const r = checkDomain(c, only(c, 1, 2), { from });
    expect(r).toMatchObject({ isDomain: true, maslovIndex: '1', eulerMeasure: '0' });
    expect(r.to).toEqual([gp(n, 0, 3), gp(n, 1, 1), gp(n, 2, 0), gp(n, 3, 2)]);
  });

  it('adds 1 to n_x and n_y for each generator point inside a rectangle, so a full rectangle has μ = 3 (REFERENCE.md, Nice diagrams)', () => {
    const n = 4, c = combinatorialGridS3(n);
    // 2x2 rectangle of squares (0,0),(1,0),(0,1),(1,1) with the x point alpha_2 ∩ beta_2 inside
    const from = [gp(n, 0, 0), gp(n, 1, 1), gp(n, 2, 2), gp(n, 3, 3)];
    const r = checkDomain(c, only(c, 0, 1, 4, 5), { from });
    expect(r).toMatchObject({ isDomain: true, nx: '3/2', ny: '3/2', maslovIndex: '3' });
    expect(r.to).toEqual([gp(n, 0, 2), gp(n, 1, 1), gp(n, 2, 0), gp(n, 3, 3)]);
  });
});

describe('the whole surface (REFERENCE.md; Ozsváth–Szabó 2004)', () => {
  it('has μ([Σ]) = 2 when k = g (lens space L(5,2), from x to x)', () => {
    const r = checkDomain(combinatorialLensSpace(5, 2), ones(combinatorialLensSpace(5, 2)), { from: [3] });
    expect(r).toMatchObject({ isDomain: true, from: [3], to: [3], maslovIndex: '2', nz: [1], eulerMeasure: '0' });
  });

  for (const n of [2, 3, 4]) {
    it(`has μ([Σ]) = 2 - 2g + 2k = ${2 * n} on an ${n}x${n} grid (k = ${n}, g = 1)`, () => {
      const c = combinatorialGridS3(n);
      const from = [...Array(n).keys()].map((i) => gp(n, i, i));
      expect(checkDomain(c, ones(c), { from }).maslovIndex).toBe(String(2 * n));
    });
  }
});

describe('checkDomain reasons', () => {
  it('says x would use two points on alpha_1 for one parallelogram of a lens space', () => {
    const c = combinatorialLensSpace(5, 2);
    const r = checkDomain(c, only(c, 1));
    expect(r.isDomain).toBe(false);
    expect(r.reason).toBe('x would use two points on alpha_1');
  });

  it('reports the undetermined curves when the boundary has no corners', () => {
    const c = combinatorialLensSpace(5, 2);
    const r = checkDomain(c, ones(c));
    expect(r.isDomain).toBe(true);
    expect(r.undetermined).toEqual({ alphas: [0], betas: [0] });
    expect(r.reason).toContain('alpha_1');
  });

  it('rejects a given x that misses a corner', () => {
    const r = checkDomain(combinatorialS1xS2(), [1, 0, 0], { from: [1] });
    expect(r.isDomain).toBe(false);
    expect(r.reason).toContain('not in x');
  });

  it('rejects a corner count of 2', () => {
    const c = combinatorialGridS3(2);
    const r = checkDomain(c, [1, 0, 0, 1]); // two diagonal squares of the 2x2 grid meet at two corners
    expect(r.isDomain).toBe(false);
    expect(r.reason).toContain('turns');
  });
});

describe('domains between generators with n_z = 0 (Ozsváth–Szabó 2004, §2.4)', () => {
  it('finds no domain between different generators of a lens space (different spin^c classes)', () => {
    const L = domainLattice(combinatorialLensSpace(7, 3));
    expect(domainBetween(L, [0], [1])).toBeNull();
    expect(Array.from(domainBetween(L, [2], [2])!)).toEqual(new Array(7).fill(0));
  });

  it('finds a domain between any two generators of a grid of S^3, with μ = gr difference consistent around triangles', () => {
    const c = combinatorialGridS3(4);
    const L = domainLattice(c);
    const gens: Int32Array[] = [];
    forEachGenerator(c, (x) => { gens.push(x.slice()); });
    const mu = (x: Int32Array, y: Int32Array) => { const d = domainBetween(L, x, y)!; return maslovQuarters(c, d, x, y) / 4; };
    for (let t = 0; t < 20; t++) {
      const [x, y, z] = [gens[(7 * t) % 24], gens[(5 * t + 3) % 24], gens[(11 * t + 1) % 24]];
      expect(domainBetween(L, x, y)).not.toBeNull();
      expect(mu(x, y) + mu(y, z)).toBe(mu(x, z)); // additivity of μ (Lipshitz 2006)
    }
  });
});

describe('the boundary split along alpha and beta (Ozsváth–Szabó 2004, §2.4)', () => {
  it('gives a bigon boundary one alpha arc and one beta arc of multiplicity 1, with ∂(∂D ∩ α) = y - x', () => {
    const c = combinatorialS1xS2();
    const r = checkDomain(c, [1, 0, 0]); // B1 from a (point 0) to b (point 1)
    // leaving a along alpha (east) runs the bottom of B1: +1; leaving b along alpha runs below A/B2: 0
    expect(r.alphaArcs).toEqual([1, 0]);
    // in-flow minus out-flow along alpha at each point: the arc into a is the arc out of b (one alpha, two arcs)
    const inA = r.alphaArcs[1], inB = r.alphaArcs[0];
    expect([inA - r.alphaArcs[0], inB - r.alphaArcs[1]]).toEqual([-1, 1]); // = -J: -1 at x = a, +1 at y = b
    expect(r.betaArcs.map(Math.abs).sort()).toEqual([0, 1]);
  });
});
