import { describe, expect, it } from 'vitest';
import {
  cokernel, combinatorialGridS3, combinatorialLensSpace, combinatorialS1xS2, countGenerators, curveIncidence,
  firstHomology, forEachGenerator, generators, generatorSign, generatorsPage, permanent, generatorGradings, findDomain, checkDomain,
} from '../../geometry/index.js';

describe('generator counts: the permanent of N (REFERENCE.md; Ryser 1963)', () => {
  it('gives the all-ones n x n matrix n! (common practice)', () => {
    for (let n = 1; n <= 8; n++) {
      expect(permanent(new Int32Array(n * n).fill(1), n)).toBe(BigInt([1, 1, 2, 6, 24, 120, 720, 5040, 40320][n]));
    }
  });

  it('gives [[1,1,0],[1,1,1],[0,1,1]] permanent 3 (expansion by the first row)', () => {
    expect(permanent(Int32Array.of(1, 1, 0, 1, 1, 1, 0, 1, 1), 3)).toBe(3n);
  });

  it('agrees with the enumeration on grids and lens spaces', () => {
    for (const c of [combinatorialGridS3(5), combinatorialLensSpace(7, 3), combinatorialS1xS2()]) {
      let n = 0;
      forEachGenerator(c, () => { n++; });
      expect(BigInt(n)).toBe(countGenerators(c));
      expect([...generators(c)]).toHaveLength(n);
    }
  });

  it('counts a 20 x 20 grid (20! generators) exactly without listing them', () => {
    expect(countGenerators(combinatorialGridS3(20))).toBe(2432902008176640000n);
  });
});

describe('generator pages', () => {
  it('returns generators 6..8 of the 24 on a 4x4 grid, each a permutation with its sign', () => {
    const c = combinatorialGridS3(4);
    const page = generatorsPage(c, 5, 3);
    expect(page).toMatchObject({ offset: 5, total: '24', more: true });
    expect(page.generators).toHaveLength(3);
    const all = [...generators(c)];
    page.generators.forEach((g, i) => expect(g.points).toEqual(Array.from(all[5 + i])));
    for (const g of page.generators) expect(new Set(g.points.map((p) => c.points[p].beta)).size).toBe(4);
    expect(generatorsPage(c, 20, 10)).toMatchObject({ more: false });
  });
});

describe('signs and H_1 (REFERENCE.md: signed count = ±det M, |χ(HF-hat)| = |H_1| for rational homology spheres)', () => {
  it('gives the signed generator count det M on grids (0) and lens spaces (±p)', () => {
    for (const c of [combinatorialGridS3(4), combinatorialLensSpace(5, 2), combinatorialS1xS2()]) {
      let s = 0;
      forEachGenerator(c, (x) => { s += generatorSign(c, x); });
      expect(String(s)).toBe(firstHomology(c).determinant);
    }
    expect(Math.abs(Number(firstHomology(combinatorialLensSpace(5, 2)).determinant))).toBe(5);
  });

  it('reads [1] → 0, [p] → Z/p, [0] → Z (REFERENCE.md)', () => {
    expect(cokernel([[1]])).toEqual({ rank: 0, torsion: [] });
    expect(cokernel([[6]])).toEqual({ rank: 0, torsion: [6n] });
    expect(cokernel([[0]])).toEqual({ rank: 1, torsion: [] });
  });

  it('reads [[2,1],[1,3]] → Z/5 and diag(2,2) → (Z/2)^2 (REFERENCE.md)', () => {
    expect(cokernel([[2, 1], [1, 3]])).toEqual({ rank: 0, torsion: [5n] });
    expect(cokernel([[2, 0], [0, 2]])).toEqual({ rank: 0, torsion: [2n, 2n] });
  });

  for (const n of [2, 3, 5]) {
    it(`reads the ${n}x${n} all-ones matrix as Z^${n - 1}, so a grid has H_1(S^3) = 0 (REFERENCE.md)`, () => {
      expect(cokernel(Array.from({ length: n }, () => new Array(n).fill(1)))).toEqual({ rank: n - 1, torsion: [] });
      const c = combinatorialGridS3(n);
      expect(Array.from(curveIncidence(c).M)).toEqual(new Array(n * n).fill(1));
      expect(firstHomology(c)).toMatchObject({ rank: 0, torsion: [], order: '1' });
    });
  }
});

describe('generator gradings and pages with spin^c labels', () => {
  it('labels the p generators of L(p,q) by p different classes, the first "0" (Ozsváth–Szabó 2004)', () => {
    const g = generatorGradings(combinatorialLensSpace(5, 2));
    if ('reason' in g) throw new Error(g.reason);
    expect(new Set(g.labels).size).toBe(5);
    expect(g.labels[0]).toBe('0');
    const page = generatorsPage(combinatorialLensSpace(5, 2), 0, 5, g);
    expect(new Set(page.generators.map((x) => x.spinc)).size).toBe(5);
    expect(page.generators.every((x) => x.grading === 0)).toBe(true);
  });

  it('puts the two generators of S^1 x S^2 in one class with gradings 0 and 1 (the bigons have μ = 1; Lipshitz 2006)', () => {
    const g = generatorGradings(combinatorialS1xS2());
    if ('reason' in g) throw new Error(g.reason);
    expect(Array.from(g.classOf)).toEqual([0, 0]);
    expect(Array.from(g.grading)).toEqual([1, 0]); // a -> b by a bigon: gr(a) - gr(b) = 1
  });

  it('refuses more generators than the limit with a reason', () => {
    expect(generatorGradings(combinatorialGridS3(8), { generatorLimit: 1000 })).toEqual({ reason: '40320 generators exceed the limit of 1000' });
  });
});

describe('findDomain (Ozsváth–Szabó 2004, §2.4)', () => {
  it('finds a bigon-like domain between the S^1 x S^2 generators and none between lens space generators', () => {
    const d = findDomain(combinatorialS1xS2(), [0], [1]);
    expect('domain' in d && checkDomain(combinatorialS1xS2(), d.domain, { from: [0], to: [1] }).isDomain).toBe(true);
    expect(findDomain(combinatorialLensSpace(5, 2), [0], [1])).toEqual({ reason: expect.stringContaining('different spin^c classes') });
    expect(findDomain(combinatorialLensSpace(5, 2), [0, 1], [1])).toEqual({ reason: expect.stringContaining('x has 2 points') });
  });
});
