import { describe, expect, it } from 'vitest';
import { analyzeDiagram, toCombinatorial, type HeegaardDiagram, unwrap } from '../../geometry/index.js';
import fc from 'fast-check';
import { firstHomology } from '../../geometry/floer/homology-h1.js';
import { floerSummary } from '../../geometry/index.js';
import { buildTemplate } from '../../geometry/construct/templates.js';
import { curveIndexByName, dehnTwist } from '../../geometry/construct/twist.js';


/** Homology class (winding around the axis, winding around the tube) of a curve on the torus of revolution R = 2. */
function torusClass(d: HeegaardDiagram, c: number): [number, number] {
  const P = d.mesh.pos, vs = d.curves[c].vertices;
  const uv = (x: number) => [Math.atan2(P[3 * x + 1], P[3 * x]), Math.atan2(P[3 * x + 2], Math.hypot(P[3 * x], P[3 * x + 1]) - 2)];
  const wrap = (a: number) => a - 2 * Math.PI * Math.round(a / (2 * Math.PI));
  let wu = 0, wv = 0;
  for (let i = 0; i < vs.length; i++) {
    const a = uv(vs[i]), b = uv(vs[(i + 1) % vs.length]);
    wu += wrap(b[0] - a[0]); wv += wrap(b[1] - a[1]);
  }
  return [Math.round(wu / (2 * Math.PI)), Math.round(wv / (2 * Math.PI))];
}
const det = (a: number[], b: number[]) => a[0] * b[1] - a[1] * b[0];

describe('Dehn twist', () => {
  for (const [p, q] of [[1, 0], [3, 1], [5, 2]]) {
    it(`changes the class of a (${p},${q}) curve by î(a,b) times the meridian a, opposite for the two directions (Farb–Margalit 2012, Prop. 6.3)`, () => {
      const d = unwrap(buildTemplate({ kind: 'torus-curve', p, q, resolution: 16 }));
      const a = torusClass(d, 0), b = torusClass(d, 1);
      const i = det(a, b);
      const pos = torusClass(unwrap(dehnTwist(d, 1, 0)), 1);
      const neg = torusClass(unwrap(dehnTwist(d, 1, 0, { negative: true })), 1);
      // Positive = turning left in the surface's orientation (Farb–Margalit 2012, §3.1); with î = det in the
      // (u, v) chart this gives [b] - î(a,b)[a]; the Prop. 6.3 form holds with î taken as b·a.
      expect(pos).toEqual([b[0] - i * a[0], b[1] - i * a[1]]);
      expect(neg).toEqual([b[0] + i * a[0], b[1] + i * a[1]]);
    });
  }

  it('turns a longitude left onto the meridian: T_a(1,0) = (1,1) (Farb–Margalit 2012, §3.1: a positive twist turns left)', () => {
    const d = unwrap(buildTemplate({ kind: 's3', genus: 1 }));
    expect(torusClass(unwrap(dehnTwist(d, 1, 0)), 1)).toEqual([1, 1]);
  });

  it('undoes a positive twist with a negative one, up to isotopy (Farb–Margalit 2012, §3.1)', () => {
    const d = unwrap(buildTemplate({ kind: 'torus-curve', p: 3, q: 1, resolution: 12 }));
    const back = unwrap(dehnTwist(unwrap(dehnTwist(d, 1, 0)), 1, 0, { negative: true }));
    expect(torusClass(back, 1)).toEqual(torusClass(d, 1));
  });

  it('turns L(5,2) into a diagram of L(5,7) = L(5,2): still 5 intersection points and H_1 = Z/5 (Ozsváth–Szabó 2004)', () => {
    const t = unwrap(dehnTwist(unwrap(buildTemplate({ kind: 'lens', p: 5, q: 2, resolution: 16 })), 1, 0));
    const a = unwrap(analyzeDiagram(t));
    expect(a.defects).toEqual([]);
    expect(a.points.length).toBe(5);
    const h1 = firstHomology(toCombinatorial(a));
    expect(h1.rank).toBe(0);
    expect(h1.torsion).toEqual([5]);
  });

  it('twists alpha along beta too: the twisted alpha still meets beta p times (common practice: î(T_b(a), b) = î(a, b))', () => {
    const t = unwrap(dehnTwist(unwrap(buildTemplate({ kind: 'lens', p: 3, q: 1, resolution: 12 })), 0, 1));
    const a = unwrap(analyzeDiagram(t));
    expect(Math.abs(a.points.reduce((s, x) => s + x.sign, 0))).toBe(3);
    expect(a.eulerMeasureTotal).toBe(0);
  });

  it('refuses to twist beta_1 along an alpha that also meets beta_2, naming the vertex', () => {
    const d = unwrap(buildTemplate({ kind: 'grid', x: [1, 2, 0], o: [0, 1, 2] }));
    const r = dehnTwist(d, curveIndexByName(d, 'beta_1'), curveIndexByName(d, 'alpha_1'));
    expect(r.ok).toBe(false);
    if (!r.ok) { expect(r.errors[0].code).toBe('twist-would-meet'); expect(r.errors[0].vertices?.length).toBe(1); }
  });

  it('leaves a curve unchanged when twisted along a disjoint curve', () => {
    const d = unwrap(buildTemplate({ kind: 'torus-curve', p: 0, q: 1 }));
    const t = unwrap(dehnTwist(d, 1, 0));
    expect(Array.from(t.curves[1].vertices)).toEqual(Array.from(d.curves[1].vertices));
  });

  it('finds curves by the names users see', () => {
    const d = unwrap(buildTemplate({ kind: 'lens', p: 2, q: 1 }));
    expect(curveIndexByName(d, 'alpha_1')).toBe(0);
    expect(curveIndexByName(d, 'beta_1')).toBe(1);
    expect(curveIndexByName(d, 'beta_2')).toBe(-1);
  });

  // A twist along an alpha curve extends over the alpha handlebody, so (Σ, α, T_a(β)) presents the same
  // 3-manifold (Farb–Margalit 2012, ch. 3; Ozsváth–Szabó 2004: HF-hat is a 3-manifold invariant).
  for (const [name, spec, rank, h1] of [
    ['#^1 S^1 x S^2', { kind: 's1xs2', genus: 1 }, 2, 1],
    ['#^2 S^1 x S^2', { kind: 's1xs2', genus: 2 }, 4, 2],
    ['genus-2 S^3', { kind: 's3', genus: 2 }, 1, 0],
  ] as const) {
    it(`keeps HF-hat of rank ${rank} and H_1 of rank ${h1} when beta_1 of ${name} is twisted along alpha_1, even with intersection signs of both kinds (Ozsváth–Szabó 2004)`, () => {
      const d = unwrap(buildTemplate(spec));
      for (const negative of [false, true]) {
        const t = unwrap(dehnTwist(d, curveIndexByName(d, 'beta_1'), curveIndexByName(d, 'alpha_1'), { negative }));
        const a = unwrap(analyzeDiagram(t));
        expect(a.defects).toEqual([]);
        const f = floerSummary(toCombinatorial(a));
        expect(f.h1.rank).toBe(h1);
        expect(f.hfHat?.rank).toBe(rank);
      }
    });
  }

  it('keeps H_1(S^3) = 0 under random sequences of twists between the families of the genus-2 S^3 diagram (property test; Farb–Margalit 2012, ch. 3)', () => {
    const d0 = unwrap(buildTemplate({ kind: 's3', genus: 2, resolution: 2 }));
    const names = ['alpha_1', 'alpha_2', 'beta_1', 'beta_2'];
    fc.assert(fc.property(fc.array(fc.tuple(fc.nat(3), fc.nat(1), fc.boolean()), { minLength: 1, maxLength: 3 }), (ops) => {
      let d = d0;
      for (const [c, i, negative] of ops) {
        const curve = names[c], along = (curve.startsWith('alpha') ? 'beta_' : 'alpha_') + (i + 1);
        const r = dehnTwist(d, curveIndexByName(d, curve), curveIndexByName(d, along), { negative });
        if (!r.ok) { expect(r.errors[0].code).toBe('twist-would-meet'); continue; }
        d = r.value;
      }
      const a = unwrap(analyzeDiagram(d));
      expect(a.defects).toEqual([]);
      const h = firstHomology(toCombinatorial(a));
      expect([h.rank, h.torsion.length]).toEqual([0, 0]);
    }), { numRuns: 12, seed: 11 });
  });
});
