import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyzeDiagram, torusGridVertex, validateConnectivity, type HeegaardDiagram, unwrap } from '../../geometry/index.js';
import { buildTemplate } from '../../geometry/construct/templates.js';
import { fingerMove } from '../../geometry/construct/finger.js';
import { fan } from '../../geometry/construct/labels.js';

const analyse = (d: HeegaardDiagram) => {
  const a = unwrap(analyzeDiagram(d));
  expect(a.defects).toEqual([]);
  return a;
};

describe('finger move', () => {
  // S^3 on the torus: nu = 64, nv = 32 (resolution 32); alpha = column 0, beta = row 16.
  const o = { nu: 64, nv: 32 };
  const g = (i: number, j: number) => torusGridVertex(o, i, j);

  it('adds two intersection points and a bigon of Euler measure 1/2 at the finger tip, leaving the sum of Euler measures χ(T^2) = 0 (Lipshitz 2006)', () => {
    const d = unwrap(buildTemplate({ kind: 's3', genus: 1 }));
    const before = analyse(d);
    const path = [g(3, 16), g(3, 17), g(2, 17), g(1, 17), g(0, 17), g(-1, 17), g(-2, 17)];
    const after = analyse(unwrap(fingerMove(d, 1, path)));
    expect(after.points.length).toBe(before.points.length + 2);
    const bigons = after.regions.filter((r) => r.chi === 1 && r.corners.length === 2);
    // The finger tip beyond alpha is a new bigon; on this torus the finger's base is a second one, and the
    // old square (e = 0) becomes an octagon of e = 1 - 8/4 = -1 (Lipshitz 2006 corner formula).
    expect(bigons.length).toBe(2);
    for (const b of bigons) expect(b.eulerMeasure).toBe(0.5);
    expect(after.regions.map((r) => r.eulerMeasure).sort()).toEqual([-1, 0.5, 0.5]);
    expect(after.regions.reduce((s, r) => s + r.corners.length, 0)).toBe(4 * after.points.length);
    expect(after.eulerMeasureTotal).toBe(before.eulerMeasureTotal);
    expect(after.regions.reduce((s, r) => s + r.eulerMeasure, 0)).toBe(0);
  });

  it('refuses a path that ends on a curve, runs along one, or starts off the curve, naming the vertex', () => {
    const d = unwrap(buildTemplate({ kind: 's3', genus: 1 }));
    const endOn = fingerMove(d, 1, [g(3, 16), g(3, 17), g(2, 17), g(1, 17), g(0, 17)]);
    expect(endOn.ok).toBe(false);
    if (!endOn.ok) { expect(endOn.errors[0].code).toBe('finger-tip-on-curve'); expect(endOn.errors[0].vertices).toEqual([g(0, 17) + 1]); }
    const along = fingerMove(d, 1, [g(3, 16), g(4, 16), g(4, 17)]);
    expect(!along.ok && along.errors[0].code).toBe('finger-along-curve');
    const off = fingerMove(d, 1, [g(3, 18), g(3, 19)]);
    expect(!off.ok && off.errors[0].code).toBe('finger-start');
  });

  it('never produces an invalid mesh or diagram along random picked paths (property test; Lipshitz 2006: Σ e(R) = χ)', () => {
    const d = unwrap(buildTemplate({ kind: 'lens', p: 3, q: 1, resolution: 12 }));
    const m = d.mesh, beta = d.curves[1].vertices;
    const before = analyse(d).points.length;
    let accepted = 0;
    fc.assert(fc.property(fc.nat(), fc.array(fc.nat(), { minLength: 1, maxLength: 8 }), (s, steps) => {
      const path = [beta[s % beta.length]];
      for (const k of steps) {
        const ring = fan(m as never, path[path.length - 1]).map((h) => m.heVert[h % 3 === 2 ? h - 2 : h + 1]);
        path.push(ring[k % ring.length]);
      }
      const r = fingerMove(d, 1, path);
      if (!r.ok) { expect(r.errors[0].message.length).toBeGreaterThan(10); return; }
      expect(validateConnectivity(r.value.mesh)).toBeNull();
      const a = analyse(r.value);
      expect(a.eulerMeasureTotal).toBe(0);
      expect((a.points.length - before) % 2).toBe(0);
      accepted++;
    }), { numRuns: 80, seed: 7 });
    expect(accepted).toBeGreaterThan(5);
  });
});
