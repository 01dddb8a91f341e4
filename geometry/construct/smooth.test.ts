import { unwrap } from '../base/result.js';
import { describe, expect, it } from 'vitest';
import { addCurve, analyzeDiagram, buildTemplate, deleteCurve, shortestPath, torusGridVertex, type HeegaardDiagram } from '../index.js';
import { smoothCurves } from './smooth.js';

const curveLength = (d: HeegaardDiagram, c: number) => {
  const P = d.mesh.pos, vs = d.curves[c].vertices;
  let L = 0;
  for (let i = 0; i < vs.length; i++) {
    const a = vs[i], b = vs[(i + 1) % vs.length];
    L += Math.hypot(P[3 * a] - P[3 * b], P[3 * a + 1] - P[3 * b + 1], P[3 * a + 2] - P[3 * b + 2]);
  }
  return L;
};

describe('curve smoothing', () => {
  it('shortens a staircase curve while keeping every region, its chi and corners, and Gauss–Bonnet exact (common practice)', () => {
    const g = (i: number, j: number) => torusGridVertex({ nu: 32, nv: 16 }, i, j);
    const d0 = unwrap(deleteCurve(unwrap(buildTemplate({ kind: 's3', genus: 1, resolution: 16 })), 1));
    const clicks = [g(1, 8), g(12, 11), g(22, 5)];
    const cyc: number[] = [];
    for (let k = 0; k < 3; k++) cyc.push(...shortestPath(d0.mesh, clicks[k], clicks[(k + 1) % 3])!.slice(0, -1));
    const d = unwrap(addCurve(d0, 'beta', cyc));
    const s = unwrap(smoothCurves(d, { iterations: 20 }));
    expect(curveLength(s, 1)).toBeLessThan(0.9 * curveLength(d, 1));
    expect(Array.from(s.mesh.heVert)).toEqual(Array.from(d.mesh.heVert));
    const a = unwrap(analyzeDiagram(s));
    expect(a.defects).toEqual([]);
    expect(a.regions.map((r) => [r.chi, r.corners.length])).toEqual(unwrap(analyzeDiagram(d)).regions.map((r) => [r.chi, r.corners.length]));
  });

  it('refuses bad options', () => {
    const d = unwrap(buildTemplate({ kind: 's3', genus: 1, resolution: 16 }));
    expect(smoothCurves(d, { iterations: 0 }).ok).toBe(false);
    expect(smoothCurves(d, { strength: 2 }).ok).toBe(false);
  });
});
