import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { buildTriMesh, eulerCharacteristic, validateConnectivity } from './tri-mesh.js';
import { checkLabelSymmetry, compactMesh, findHalfEdge, setEdgeLabel, splitEdge, splitFace, toEditMesh } from './edit.js';
import { torusGrid } from '../surfaces/torus.js';

const smallTorus = () => buildTriMesh(...Object.values(torusGrid({ R: 2, r: 1, nu: 6, nv: 5 })) as [Float64Array, Int32Array]).mesh;

describe('mesh editing', () => {
  it('keeps connectivity valid and chi = 0 under random edge splits (common practice: splits do not change topology)', () => {
    fc.assert(fc.property(fc.array(fc.tuple(fc.nat(), fc.double({ min: 0.05, max: 0.95, noNaN: true })), { minLength: 1, maxLength: 60 }), (ops) => {
      const m = toEditMesh(smallTorus());
      for (const [r, t] of ops) splitEdge(m, r % (3 * m.nF), t);
      expect(validateConnectivity(m)).toBeNull();
      expect(eulerCharacteristic(m)).toBe(0);
      expect(validateConnectivity(compactMesh(m))).toBeNull();
    }), { numRuns: 60 });
  });

  it('keeps connectivity valid and chi = 0 under random face splits', () => {
    fc.assert(fc.property(fc.array(fc.nat(), { minLength: 1, maxLength: 40 }), (ops) => {
      const m = toEditMesh(smallTorus());
      for (const r of ops) splitFace(m, r % m.nF, 1, 2, 3);
      expect(validateConnectivity(m)).toBeNull();
      expect(eulerCharacteristic(m)).toBe(0);
    }), { numRuns: 40 });
  });

  it('carries a curve label onto both halves of a split edge, antisymmetric across twins', () => {
    fc.assert(fc.property(fc.array(fc.nat(), { maxLength: 30 }), (ops) => {
      const m = toEditMesh(smallTorus());
      const h = findHalfEdge(m, 0, 1);
      setEdgeLabel(m, h, 1);
      const v = splitEdge(m, h, 0.5);
      for (const r of ops) splitEdge(m, r % (3 * m.nF), 0.5);
      expect(checkLabelSymmetry(m)).toBe(-1);
      // The labelled edges form one path 0 -> ... -> 1 through v: follow positive labels from 0.
      let at = 0, steps = 0, sawV = false;
      while (at !== 1 && steps++ < 1000) {
        let out = -1;
        for (let k = 0; k < 3 * m.nF; k++) if (m.heVert[k] === at && m.heCurve[k] > 0) out = k;
        expect(out).toBeGreaterThanOrEqual(0);
        at = m.heVert[out % 3 === 2 ? out - 2 : out + 1];
        if (at === v) sawV = true;
      }
      expect(at).toBe(1);
      expect(sawV).toBe(true);
    }), { numRuns: 30 });
  });

  it('leaves the input mesh untouched', () => {
    const base = smallTorus();
    const before = base.heVert.slice();
    const m = toEditMesh(base);
    splitEdge(m, 0, 0.5);
    expect(base.heVert).toEqual(before);
    expect(base.nF).toBe(60);
  });
});
