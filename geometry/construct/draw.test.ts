import { unwrap } from '../base/result.js';
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyzeDiagram, buildTemplate, torusGridVertex, validateConnectivity, type HeegaardDiagram } from '../index.js';
import { deleteCurve, renameCurve, addBasepoint, moveBasepoint, removeBasepoint } from './curve-ops.js';
import { addCurve, drawCurve, shortestPath, type SurfacePoint } from './draw.js';

// S^3 on a 32 x 16 torus grid with beta deleted: only alpha_1 = column 0 and z_1 remain.
const nu = 32, nv = 16, o = { nu, nv };
const g = (i: number, j: number) => torusGridVertex(o, i, j);
const alphaOnly = (): HeegaardDiagram => unwrap(deleteCurve(unwrap(buildTemplate({ kind: 's3', genus: 1, resolution: 16 })), 1));
const cellPoint = (i: number, j: number, bary: [number, number, number] = [0.5, 0.3, 0.2]): SurfacePoint =>
  ({ face: 2 * (((i % nu) + nu) % nu * nv + j), bary });

describe('drawing curves', () => {
  it('cuts a drawn closed polyline into the mesh as a beta meeting the meridian once: S^3 again (Ozsváth–Szabó 2004)', () => {
    const pts = Array.from({ length: 12 }, (_, k) => cellPoint(Math.floor((k * nu) / 12), 5 + (k % 3)));
    const d = unwrap(drawCurve(alphaOnly(), 'beta', pts));
    expect(d.curves.map((c) => `${c.family}_${c.index + 1}`)).toEqual(['alpha_1', 'beta_1']);
    const a = unwrap(analyzeDiagram(d));
    expect(a.defects).toEqual([]);
    expect(a.points.length).toBe(1);
    expect(a.eulerMeasureTotal).toBe(0);
  });

  it('joins clicked vertices by shortest edge paths (Dijkstra 1959) into a closed curve', () => {
    const d = alphaOnly();
    const clicks = [g(1, 8), g(12, 9), g(22, 7)];
    const cyc: number[] = [];
    for (let k = 0; k < 3; k++) cyc.push(...shortestPath(d.mesh, clicks[k], clicks[(k + 1) % 3])!.slice(0, -1));
    const a = unwrap(analyzeDiagram(unwrap(addCurve(d, 'beta', cyc))));
    expect(a.points.length).toBe(1);
  });

  it('finds the shortest path of 5 edges between grid vertices 5 apart on a row (common practice)', () => {
    expect(shortestPath(alphaOnly().mesh, g(3, 2), g(8, 2))?.length).toBe(6);
  });

  it('refuses a curve that runs along alpha, is tangent to it, touches its own family, or does not close — naming vertices', () => {
    const d = alphaOnly();
    const along = addCurve(d, 'beta', [g(0, 1), g(0, 2), g(1, 2)]);
    expect(!along.ok && along.errors[0].code).toBe('runs-along-curve');
    const tangent = addCurve(d, 'beta', [g(1, 4), g(0, 4), g(1, 5)]);
    expect(tangent.ok).toBe(false);
    if (!tangent.ok) { expect(tangent.errors[0].code).toBe('tangency'); expect(tangent.errors[0].vertices).toEqual([g(0, 4) + 1]); }
    const own = addCurve(d, 'alpha', [g(1, 4), g(0, 4), g(1, 5)]);
    expect(!own.ok && own.errors[0].code).toBe('same-family-meet');
    const open = addCurve(d, 'beta', [g(3, 3), g(4, 3), g(5, 3)]);
    expect(!open.ok && open.errors[0].code).toBe('curve-not-closed');
  });

  it('never leaves an invalid mesh for random drawn polylines (property test)', () => {
    const d = alphaOnly();
    fc.assert(fc.property(fc.array(fc.tuple(fc.nat(nu - 1), fc.nat(nv - 1), fc.nat(1)), { minLength: 3, maxLength: 7 }), (raw) => {
      const pts = raw.map(([i, j, s]) => ({ face: 2 * (i * nv + j) + s, bary: [0.4, 0.35, 0.25] as [number, number, number] }));
      const r = drawCurve(d, 'beta', pts);
      if (!r.ok) { expect(r.errors[0].message.length).toBeGreaterThan(10); return; }
      expect(validateConnectivity(r.value.mesh)).toBeNull();
    }), { numRuns: 40, seed: 3 });
  });
});

describe('curve and basepoint bookkeeping', () => {
  it('renames, deletes and re-adds curves and basepoints', () => {
    const d = unwrap(buildTemplate({ kind: 's3', genus: 1, resolution: 16 }));
    expect(renameCurve(d, 1, 'alpha', 0).ok).toBe(false);
    const moved = unwrap(moveBasepoint(d, 0, g(10, 10)));
    expect(moved.basepoints[0].vertex).toBe(g(10, 10));
    expect(moveBasepoint(d, 0, g(0, 3)).ok).toBe(false);
    const w = unwrap(addBasepoint(d, 'w', { face: 40, bary: [1, 1, 1] }));
    expect(w.mesh.nV).toBe(d.mesh.nV + 1);
    expect(w.basepoints[1]).toEqual({ kind: 'w', index: 0, vertex: d.mesh.nV });
    expect(unwrap(removeBasepoint(w, 1)).basepoints.length).toBe(1);
  });
});
