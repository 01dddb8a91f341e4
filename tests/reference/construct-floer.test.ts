import { describe, expect, it } from 'vitest';
import { analyzeDiagram, floerSummary, toCombinatorial } from '../../geometry/index.js';
import { buildTemplate, type TemplateSpec } from '../../geometry/construct/templates.js';

const summary = (spec: TemplateSpec) => {
  const d = buildTemplate(spec);
  if (!d.ok) throw new Error(JSON.stringify(d.errors));
  const a = analyzeDiagram(d.value);
  if (!a.ok) throw new Error(JSON.stringify(a.errors));
  expect(a.value.defects).toEqual([]);
  // Lipshitz 2006 (additivity): Σ e(R) = χ(Σ) = 2 − 2g.
  expect(a.value.eulerMeasureTotal).toBe(2 - 2 * a.value.genus);
  return { a: a.value, f: floerSummary(toCombinatorial(a.value)) };
};

describe('templates analysed give the published invariants', () => {
  for (const genus of [1, 2, 3]) {
    it(`gives the genus-${genus} diagram of S^3 HF-hat of rank 1 and H_1 = 0 (Ozsváth–Szabó 2004)`, () => {
      const { a, f } = summary({ kind: 's3', genus });
      expect(a.genus).toBe(genus);
      expect(a.points.length).toBe(genus);
      expect(f.hfHat?.rank).toBe(1);
      expect(f.h1.rank).toBe(0);
      expect(f.h1.torsion).toEqual([]);
    });
  }

  for (const genus of [1, 2, 3]) {
    it(`gives #^${genus} S^1 x S^2 a weakly admissible diagram with HF-hat of rank 2^${genus} and H_1 = Z^${genus} (Ozsváth–Szabó 2004)`, () => {
      const { a, f } = summary({ kind: 's1xs2', genus });
      expect(a.points.length).toBe(2 * genus);
      expect(f.weaklyAdmissible).toBe(true);
      expect(f.hfHat?.rank).toBe(2 ** genus);
      expect(f.h1.rank).toBe(genus);
      // each finger move leaves two bigons of Euler measure 1/2 (Lipshitz 2006 worked values)
      expect(a.regions.filter((r) => r.chi === 1 && r.corners.length === 2 && r.eulerMeasure === 0.5).length).toBe(2 * genus);
    });
  }

  for (const [p, q] of [[2, 1], [5, 2], [7, 3], [11, 4]]) {
    it(`gives L(${p},${q}) HF-hat of rank ${p} and H_1 = Z/${p} (Ozsváth–Szabó 2004: lens spaces are L-spaces)`, () => {
      const { f } = summary({ kind: 'lens', p, q });
      expect(f.hfHat?.rank).toBe(p);
      expect(f.h1.rank).toBe(0);
      expect(f.h1.torsion).toEqual([p]);
    });
  }

  it('gives the 2x2 unknot grid 4 intersection points and H_1(S^3) = 0 (REFERENCE.md: the all-ones matrix has cokernel Z^{n-1} = H_1(S^3) + Z^{k-g})', () => {
    const { a, f } = summary({ kind: 'grid', x: [1, 0], o: [0, 1] });
    expect(a.points.length).toBe(4);
    expect(f.h1.rank).toBe(0);
    expect(f.h1.torsion).toEqual([]);
  });
});
