import { describe, expect, it } from 'vitest';
import { analyzeDiagram, type HeegaardDiagram } from '../../geometry/index.js';
import { buildTemplate } from '../../geometry/construct/templates.js';

const build = (spec: Parameters<typeof buildTemplate>[0]): HeegaardDiagram => {
  const r = buildTemplate(spec);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.value;
};
const analyse = (d: HeegaardDiagram) => {
  const a = analyzeDiagram(d);
  if (!a.ok) throw new Error(JSON.stringify(a.errors));
  expect(a.value.defects).toEqual([]);
  return a.value;
};

describe('lens space template', () => {
  for (const [p, q] of [[2, 1], [5, 2], [7, 3], [13, 5], [50, 49]]) {
    it(`gives L(${p},${q}) a genus-1 diagram whose alpha and beta meet ${p} times, all with one sign (Ozsváth–Szabó 2004: p generators, H_1 = Z/p)`, () => {
      const a = analyse(build({ kind: 'lens', p, q }));
      expect(a.genus).toBe(1);
      expect(a.points.length).toBe(p);
      expect(new Set(a.points.map((x) => x.sign)).size).toBe(1);
      // Lipshitz 2006 additivity: the Euler measures add up to chi(T^2) = 0; REFERENCE.md: sum of chi(R) = 2 - 2g + #points.
      expect(a.eulerMeasureTotal).toBe(0);
      expect(a.regions.reduce((s, r) => s + r.chi, 0)).toBe(p);
      expect(a.regions.reduce((s, r) => s + r.corners.length, 0)).toBe(4 * p);
      expect(a.basepoints.length).toBe(1);
    });
  }

  it('refuses q sharing a factor with p, naming gcd', () => {
    const r = buildTemplate({ kind: 'lens', p: 6, q: 4 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0].message).toMatch(/gcd/);
  });

  it('refuses p above 50 and q out of range', () => {
    expect(buildTemplate({ kind: 'lens', p: 51, q: 2 }).ok).toBe(false);
    expect(buildTemplate({ kind: 'lens', p: 5, q: 5 }).ok).toBe(false);
    expect(buildTemplate({ kind: 'lens', p: 5, q: 0 }).ok).toBe(false);
  });

  it('treats L(1,0) as S^3: one intersection point (Ozsváth–Szabó 2004)', () => {
    expect(analyse(build({ kind: 'lens', p: 1, q: 0 })).points.length).toBe(1);
  });
});

describe('torus curve template', () => {
  it('makes a (3,-2) curve meet the meridian 3 times (common practice: the algebraic intersection of (p,q) with (0,1) is p)', () => {
    const a = analyse(build({ kind: 'torus-curve', p: 3, q: -2 }));
    expect(a.points.length).toBe(3);
    expect(Math.abs(a.points.reduce((s, x) => s + x.sign, 0))).toBe(3);
  });
  it('makes a (0,1) curve a disjoint parallel meridian', () => {
    const r = buildTemplate({ kind: 'torus-curve', p: 0, q: 1 });
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.value.curves[1].vertices.every((v) => !r.value.curves[0].vertices.includes(v))).toBe(true);
  });
});

describe('S^3 and S^1 x S^2 on the torus', () => {
  it('gives S^3 one intersection point and a single region of Euler measure 0 with four corners', () => {
    const a = analyse(build({ kind: 's3', genus: 1 }));
    expect(a.points.length).toBe(1);
    expect(a.regions.length).toBe(1);
    expect(a.regions[0].eulerMeasure).toBe(0);
  });

  it('gives S^1 x S^2 two intersection points of opposite sign and two bigons of Euler measure 1/2 (Ozsváth–Szabó 2004: the admissible genus-1 diagram)', () => {
    const a = analyse(build({ kind: 's1xs2', genus: 1 }));
    expect(a.points.length).toBe(2);
    expect(a.points[0].sign + a.points[1].sign).toBe(0);
    const bigons = a.regions.filter((r) => r.chi === 1 && r.corners.length === 2);
    expect(bigons.length).toBe(2);
    for (const b of bigons) expect(b.eulerMeasure).toBe(0.5);
    expect(a.eulerMeasureTotal).toBe(0);
  });
});

describe('grid diagram template', () => {
  it('builds the 5x5 trefoil grid with 25 crossings and 25 square regions of Euler measure 0 (Manolescu–Ozsváth–Sarkar 2009)', () => {
    // REFERENCE.md check value: trefoil Xcol = [1,2,3,4,0], Ocol = [4,0,1,2,3].
    const a = analyse(build({ kind: 'grid', x: [1, 2, 3, 4, 0], o: [4, 0, 1, 2, 3] }));
    expect(a.points.length).toBe(25);
    expect(a.regions.length).toBe(25);
    for (const r of a.regions) { expect(r.corners.length).toBe(4); expect(r.eulerMeasure).toBe(0); }
    expect(a.basepoints.filter((b) => b.kind === 'z').length).toBe(5);
    expect(a.basepoints.filter((b) => b.kind === 'w').length).toBe(5);
    // each row and each column of cells holds one X and one O: no region holds two markings of one kind
    const zRegions = new Set(a.basepoints.filter((b) => b.kind === 'z').map((b) => b.region));
    expect(zRegions.size).toBe(5);
  });

  it('refuses X and O in the same cell, and non-permutations', () => {
    const same = buildTemplate({ kind: 'grid', x: [0, 1], o: [0, 1] });
    expect(same.ok).toBe(false);
    if (!same.ok) expect(same.errors[0].message).toMatch(/same cell/);
    expect(buildTemplate({ kind: 'grid', x: [0, 0], o: [1, 1] }).ok).toBe(false);
    expect(buildTemplate({ kind: 'grid', x: [0, 1, 2], o: [1, 2] }).ok).toBe(false);
  });
});
