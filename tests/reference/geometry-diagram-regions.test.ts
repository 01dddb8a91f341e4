import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  analyzeDiagram, genusS1xS2Diagram, genusS3Diagram, lensSpaceDiagram, toCombinatorial, type DiagramAnalysis, type HeegaardDiagram, type Result,
} from '../../geometry/index.js';

const analyse = (d: HeegaardDiagram | Result<HeegaardDiagram>): DiagramAnalysis => {
  const dd = 'mesh' in d ? d : d.ok ? d.value : (() => { throw new Error(d.errors.map((e) => e.message).join('\n')); })();
  const r = analyzeDiagram(dd);
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
  return r.value;
};

/** REFERENCE.md "Global sanity" [derived from Lipshitz 2006 additivity and χ of the cut-open surface]. */
function expectGlobalSanity(a: DiagramAnalysis): void {
  const chi = 2 - 2 * a.genus;
  expect(a.eulerCharacteristic).toBe(chi);
  expect(a.eulerMeasureTotal).toBe(chi); // Σ_R e(R) = 2 − 2g
  expect(a.regions.reduce((s, r) => s + r.corners.length, 0)).toBe(4 * a.points.length); // Σ corners = 4 #(α∩β)
  expect(a.regions.reduce((s, r) => s + r.chi, 0)).toBe(chi + a.points.length); // Σ χ(R) = 2 − 2g + #(α∩β)
  for (const r of a.regions) {
    expect(Math.abs(r.gaussBonnetChi - r.chi)).toBeLessThan(1e-9); // discrete Gauss–Bonnet (do Carmo 1976 §4-5)
    expect(Math.abs(r.geometricEulerMeasure - r.eulerMeasure)).toBeLessThan(1e-9); // Lipshitz 2006 §4
  }
  expect(a.defects).toEqual([]);
}

describe('Euler measures on genus-g surfaces', () => {
  for (const g of [2, 3]) {
    it(`sums to χ = 2 − 2g = ${2 - 2 * g} on the standard genus-${g} diagram of S^3: one region, χ = 2 − g, 4g corners (Lipshitz 2006; derived)`, () => {
      const a = analyse(genusS3Diagram(g, 2));
      expect(a.genus).toBe(g);
      expect(a.points.length).toBe(g); // alpha_i meets beta_i once (Ozsváth–Szabó 2004)
      expect(a.regions.length).toBe(1);
      expect(a.regions[0].chi).toBe(2 - g);
      expect(a.regions[0].corners.length).toBe(4 * g);
      expect(a.regions[0].eulerMeasure).toBe(2 - 2 * g);
      expect(a.totalCurvature).toBeCloseTo(2 - 2 * g, 9); // Σ angle defects = 2πχ
      expectGlobalSanity(a);
    });
  }

  it('keeps the global sanity checks on the genus-2 admissible diagram of #² S^1 x S^2 (finger moves, Ozsváth–Szabó 2004)', () => {
    const a = analyse(genusS1xS2Diagram(2, 2));
    expectGlobalSanity(a);
    expect(a.regions.filter((r) => r.corners.length === 2).every((r) => r.eulerMeasure === 0.5)).toBe(true); // bigons: e = 1/2
  });
});

describe('lens-space diagrams (property)', () => {
  const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
  it('gives p rectangles with e = 0, corners in all four quadrants of every point, for any coprime (p, q) (Ozsváth–Szabó 2004; Lipshitz 2006)', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 7 }), fc.integer({ min: 1, max: 7 }), fc.integer({ min: 3, max: 4 }), (p, q, M) => {
      fc.pre(gcd(p, q) === 1);
      const a = analyse(lensSpaceDiagram(p, q, M));
      expectGlobalSanity(a);
      expect(a.points.length).toBe(p);
      expect(a.regions.length).toBe(p);
      expect(a.regions.every((r) => r.chi === 1 && r.corners.length === 4 && r.eulerQuarters === 0)).toBe(true);
      const c = toCombinatorial(a);
      for (const r of c.regions) expect(r.eulerQuarters).toBe(4 * r.chi - r.corners);
    }), { numRuns: 25 });
  });
});
