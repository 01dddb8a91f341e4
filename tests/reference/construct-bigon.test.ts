import { describe, expect, it } from 'vitest';
import { analyzeDiagram, buildTemplate, fingerMove, floerSummary, toCombinatorial, torusGridVertex, type HeegaardDiagram, unwrap } from '../../geometry/index.js';
import { removeBigon } from '../../geometry/construct/bigon.js';

const analyse = (d: HeegaardDiagram) => {
  const a = unwrap(analyzeDiagram(d));
  expect(a.defects).toEqual([]);
  return a;
};

describe('removing an empty bigon', () => {
  it('undoes a finger move: back to one intersection point and one square region of Euler measure 0 (Lipshitz 2006)', () => {
    const d = unwrap(buildTemplate({ kind: 's3', genus: 1 }));
    const g = (i: number, j: number) => torusGridVertex({ nu: 64, nv: 32 }, i, j);
    const f = unwrap(fingerMove(d, 1, [g(3, 16), g(3, 17), g(2, 17), g(1, 17), g(0, 17), g(-1, 17), g(-2, 17)]));
    const bigons = analyse(f).regions.filter((r) => r.chi === 1 && r.corners.length === 2);
    expect(bigons.length).toBe(2);
    for (const b of bigons) {
      const a = analyse(unwrap(removeBigon(f, b.id)));
      expect(a.points.length).toBe(1);
      expect(a.regions.map((r) => r.eulerMeasure)).toEqual([0]);
    }
  });

  it('turns the admissible S^1 x S^2 diagram into the disjoint one, which is not weakly admissible (Ozsváth–Szabó 2004)', () => {
    const d = unwrap(buildTemplate({ kind: 's1xs2', genus: 1 }));
    const bigon = analyse(d).regions.find((r) => r.corners.length === 2 && r.basepoints.length === 0)!;
    const a = analyse(unwrap(removeBigon(d, bigon.id)));
    expect(a.points.length).toBe(0);
    expect(floerSummary(toCombinatorial(a)).weaklyAdmissible).toBe(false);
  });

  it('refuses a region that is not a bigon, and names it', () => {
    const d = unwrap(buildTemplate({ kind: 'lens', p: 3, q: 1, resolution: 12 }));
    const r = removeBigon(d, 0);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0].message).toMatch(/region 1 is not a bigon/);
  });
});
