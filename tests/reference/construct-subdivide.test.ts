import { describe, expect, it } from 'vitest';
import { analyzeDiagram, validateConnectivity, type HeegaardDiagram, unwrap } from '../../geometry/index.js';
import { buildTemplate } from '../../geometry/construct/templates.js';
import { subdivideDiagram } from '../../geometry/construct/subdivide.js';
import { dehnTwist } from '../../geometry/construct/twist.js';

/** Region signature: sorted (chi, corners, Euler measure) triples. */
const signature = (d: HeegaardDiagram) => {
  const a = unwrap(analyzeDiagram(d));
  expect(a.defects).toEqual([]);
  return a.regions.map((r) => `${r.chi}/${r.corners.length}/${r.eulerMeasure}`).sort();
};

describe('subdivision', () => {
  const cases: [string, () => HeegaardDiagram][] = [
    ['L(5,2)', () => unwrap(buildTemplate({ kind: 'lens', p: 5, q: 2, resolution: 8 }))],
    ['S^1 x S^2', () => unwrap(buildTemplate({ kind: 's1xs2', genus: 1, resolution: 12 }))],
    ['a 3x3 grid', () => unwrap(buildTemplate({ kind: 'grid', x: [1, 2, 0], o: [0, 1, 2], resolution: 2 }))],
    ['a twisted L(3,1)', () => unwrap(dehnTwist(unwrap(buildTemplate({ kind: 'lens', p: 3, q: 1, resolution: 8 })), 1, 0))],
  ];
  for (const [name, make] of cases) {
    for (const scheme of ['midpoint', 'loop'] as const) {
      it(`keeps every region's chi, corner count and Euler measure of ${name} under ${scheme} subdivision while faces grow 4x (Lipshitz 2006: e(R) is combinatorial)`, () => {
        const d = make();
        const s = unwrap(subdivideDiagram(d, scheme));
        expect(s.mesh.nF).toBe(4 * d.mesh.nF);
        expect(validateConnectivity(s.mesh)).toBeNull();
        expect(signature(s)).toEqual(signature(d));
        expect(s.curves.map((c) => c.vertices.length)).toEqual(d.curves.map((c) => 2 * c.vertices.length));
      });
    }
  }

  it('keeps the original vertices in place under midpoint subdivision and moves them under Loop (Loop 1987)', () => {
    const d = unwrap(buildTemplate({ kind: 'lens', p: 2, q: 1, resolution: 8 }));
    const m = unwrap(subdivideDiagram(d, 'midpoint')), l = unwrap(subdivideDiagram(d, 'loop'));
    expect(Array.from(m.mesh.pos.subarray(0, 3 * d.mesh.nV))).toEqual(Array.from(d.mesh.pos.subarray(0, 3 * d.mesh.nV)));
    expect(Array.from(l.mesh.pos.subarray(0, 3 * d.mesh.nV))).not.toEqual(Array.from(d.mesh.pos.subarray(0, 3 * d.mesh.nV)));
  });

  it('refuses an unknown scheme with a clear message', () => {
    const d = unwrap(buildTemplate({ kind: 'lens', p: 2, q: 1, resolution: 8 }));
    const r = subdivideDiagram(d, 'cubic' as 'loop');
    expect(r.ok).toBe(false);
  });
});
