import { describe, expect, it } from 'vitest';
import { analyzeDiagram, type DiagramAnalysis } from './analyze.js';
import { toCombinatorial } from './combinatorial.js';
import { gridMeridian, gridParallel, gridTorusDiagram, lensSpaceDiagram, type GridPath } from './grid-torus-diagram.js';
import type { HeegaardDiagram } from './types.js';

const analyse = (d: HeegaardDiagram): DiagramAnalysis => {
  const r = analyzeDiagram(d);
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
  return r.value;
};

/** beta isotopic to the meridian alpha (column 0), pushed to column 2 with a finger to column -2 between rows j1 and j2. */
function fingerPath(nv: number, j1: number, j2: number): GridPath {
  const p: GridPath = [];
  for (let j = 0; j < j1; j++) p.push([2, j]);
  for (let i = 2; i > -2; i--) p.push([i, j1]);
  for (let j = j1; j < j2; j++) p.push([-2, j]);
  for (let i = -2; i < 2; i++) p.push([i, j2]);
  for (let j = j2; j < nv; j++) p.push([2, j]);
  return p;
}

/** The genus-1 diagram of S^1 x S^2 with alpha and beta isotopic, meeting twice (Ozsváth–Szabó 2004). */
export function bigonDiagram(): HeegaardDiagram {
  const grid = { R: 2, r: 0.8, nu: 12, nv: 12 };
  return gridTorusDiagram({ grid, alpha: [gridMeridian(grid, 0)], beta: [fingerPath(12, 3, 8)], z: [[6, 6]] });
}

/** Global sanity checks of REFERENCE.md, derived from Lipshitz 2006 additivity. */
function expectGlobalSanity(a: DiagramAnalysis): void {
  const chiSigma = 2 - 2 * a.genus;
  // Lipshitz 2006: Euler measure is additive, so Σ_R e(R) = e(Σ) = χ(Σ) = 2 − 2g.
  expect(a.eulerMeasureTotal).toBe(chiSigma);
  // REFERENCE.md "Global sanity" [derived]: Σ corners = 4 #(α∩β); Σ χ(R) = 2 − 2g + #(α∩β).
  expect(a.regions.reduce((s, r) => s + r.corners.length, 0)).toBe(4 * a.points.length);
  expect(a.regions.reduce((s, r) => s + r.chi, 0)).toBe(chiSigma + a.points.length);
  for (const r of a.regions) {
    // Discrete Gauss–Bonnet (do Carmo 1976 §4-5; REFERENCE.md): total curvature = 2π χ(R).
    expect(Math.abs(r.gaussBonnetChi - r.chi)).toBeLessThan(1e-9);
    // Lipshitz 2006: e(R) = (1/2π)∫K for a metric with right-angled geodesic corners = χ − corners/4.
    expect(Math.abs(r.geometricEulerMeasure - r.eulerMeasure)).toBeLessThan(1e-9);
    expect(r.curvature.interior + r.curvature.boundary + r.curvature.corners).toBeCloseTo(r.eulerMeasure, 9);
  }
  expect(a.defects).toEqual([]);
  // Discrete Gauss–Bonnet on the closed surface: Σ_v (2π − Θ_v) = 2π χ(Σ).
  expect(a.totalCurvature).toBeCloseTo(chiSigma, 9);
}

describe('regions of a lens-space diagram', () => {
  it('gives a meridian and a (1,q) curve one disk region with all four corners at one vertex (GEOMETRY.md)', () => {
    const a = analyse(lensSpaceDiagram(1, 3, 3));
    expect(a.points.length).toBe(1);
    expect(a.regions.length).toBe(1);
    const [r] = a.regions;
    expect(r.chi).toBe(1); // a disk, although its closure is the whole torus (chi 0)
    expect(r.corners.map((c) => c.quadrant).sort()).toEqual([0, 1, 2, 3]);
    expect(new Set(r.corners.map((c) => c.point)).size).toBe(1);
    expect(r.eulerMeasure).toBe(0); // χ(T^2) = 0 (Lipshitz 2006 additivity)
    expectGlobalSanity(a);
  });

  for (const [p, q] of [[2, 1], [3, 1], [5, 2], [7, 3]]) {
    it(`cuts the torus into p = ${p} rectangles for L(${p},${q}), each with e = 0 (Lipshitz 2006; common practice)`, () => {
      const a = analyse(lensSpaceDiagram(p, q, 3));
      expect(a.points.length).toBe(p); // the (p,q) curve meets the meridian p times (GEOMETRY.md)
      expect(a.regions.length).toBe(p);
      for (const r of a.regions) {
        expect(r.chi).toBe(1);
        expect(r.corners.length).toBe(4);
        expect(r.eulerMeasure).toBe(0);
        expect(r.eulerQuarters).toBe(0);
      }
      // All crossings have the same sign, so |α·β| = p = |H_1(L(p,q))| (Ozsváth–Szabó 2004).
      expect(Math.abs(a.points.reduce((s, x) => s + x.sign, 0))).toBe(p);
      expect(a.basepoints[0].region).toBeGreaterThanOrEqual(0);
      expectGlobalSanity(a);
    });
  }
});

describe('regions of an S^1 x S^2 diagram with two bigons', () => {
  it('gives each bigon Euler measure 1/2 and the annulus −1 (Lipshitz 2006; REFERENCE.md worked values)', () => {
    const a = analyse(bigonDiagram());
    expect(a.points.length).toBe(2);
    expect(a.points.map((p) => p.sign).sort()).toEqual([-1, 1]); // isotopic curves: algebraic count 0
    const bigons = a.regions.filter((r) => r.corners.length === 2);
    expect(bigons.length).toBe(2);
    for (const b of bigons) {
      expect(b.chi).toBe(1);
      expect(b.eulerMeasure).toBe(0.5);
      expect(b.basepoints).toEqual([]);
    }
    const annulus = a.regions.find((r) => r.corners.length === 4)!;
    expect(annulus.chi).toBe(0); // annulus with two convex corners on each boundary circle: e = −1
    expect(annulus.eulerMeasure).toBe(-1);
    expect(annulus.basepoints).toEqual([0]);
    expectGlobalSanity(a);
  });

  it('puts a bigon in quadrants whose boundary-rule signs are +1 and −1 (combinatorics.ts convention)', () => {
    const a = analyse(bigonDiagram());
    const ruleSign = [1, -1, 1, -1]; // (a_NE + a_SW) − (a_NW + a_SE)
    for (const b of a.regions.filter((r) => r.corners.length === 2)) {
      const signs = b.corners.map((c) => ruleSign[c.quadrant]).sort();
      expect(signs).toEqual([-1, 1]);
      // and the quadrant tables of the points agree with the corners
      for (const c of b.corners) expect(a.points[c.point].quadrants[c.quadrant]).toBe(b.id);
    }
  });

  it('puts the bigon on alpha\'s left in quadrants NE and NW (north of alpha in its own chart)', () => {
    // alpha runs along column 0 with v increasing; (u, v) is positively oriented for the outward normal
    // (do Carmo 1976 §4-2), so alpha's left is u < 0, where the finger bigon lies: north in alpha's chart.
    const a = analyse(bigonDiagram());
    const west = a.regions.find((r) => r.corners.length === 2 && r.faces === 2 * 5 * 2)!; // 2 x 5 cells, 2 triangles each
    expect(west).toBeDefined();
    const quads = west.corners.map((c) => c.quadrant).sort();
    expect(quads).toEqual([0, 1]); // both north of alpha: NE and NW
    // At row 3 beta runs towards u < 0, i.e. alpha's left: (alpha', beta') positive, sign +1, and the
    // bigon lies ahead along alpha there (NE); at row 8 beta runs back, sign −1, bigon behind (NW).
    const byRow = (j: number) => west.corners.find((c) => a.points[c.point].vertex === j)!;
    expect([a.points[byRow(3).point].sign, byRow(3).quadrant]).toEqual([1, 0]);
    expect([a.points[byRow(8).point].sign, byRow(8).quadrant]).toEqual([-1, 1]);
  });

  it('gives the meridian and the diagonal (p,q) curve negative crossings: (alpha\', beta\') = ((0,1), (1,1)) in (u, v)', () => {
    // derived: det [[0, 1], [1, 1]] = −1 in the positively oriented (u, v) chart (do Carmo 1976 §4-2)
    expect(analyse(lensSpaceDiagram(3, 2, 3)).points.map((p) => p.sign)).toEqual([-1, -1, -1]);
  });
});

describe('multi-pointed rectangle diagram on the torus', () => {
  it('gives four rectangles, two basepoints and e = 0 each (Manolescu–Ozsváth–Sarkar 2009 count rules)', () => {
    const grid = { R: 2, r: 0.8, nu: 12, nv: 12 };
    const d = gridTorusDiagram({
      grid, alpha: [gridMeridian(grid, 0), gridMeridian(grid, 3)], beta: [gridParallel(grid, 0), gridParallel(grid, 3)],
      z: [[1, 6], [6, 1]],
    });
    const a = analyse(d);
    expect(a.points.length).toBe(4);
    expect(a.regions.length).toBe(4);
    for (const r of a.regions) expect([r.chi, r.corners.length, r.eulerMeasure]).toEqual([1, 4, 0]);
    expectGlobalSanity(a);
  });
});

describe('combinatorial shadow', () => {
  it('copies points, regions and basepoints in the floer/combinatorics.ts shape', () => {
    const a = analyse(lensSpaceDiagram(3, 1, 3));
    const c = toCombinatorial(a);
    expect(c.genus).toBe(1);
    expect(c.curveCount).toBe(1);
    expect(c.points.length).toBe(3);
    expect(c.regions.every((r) => r.eulerQuarters === 4 * r.chi - r.corners)).toBe(true);
    expect(c.basepoints).toEqual([{ kind: 'z', index: 0 }]);
    expect(c.regions.filter((r) => r.basepoints.length === 1).length).toBe(1);
    // every region fills exactly as many quadrants as it has corners
    const filled = new Map<number, number>();
    for (const p of c.points) for (const r of p.quadrants) filled.set(r, (filled.get(r) ?? 0) + 1);
    for (const r of c.regions) expect(filled.get(r.id) ?? 0).toBe(r.corners);
  });
});

describe('defects', () => {
  it('reports, never hides, a Gauss–Bonnet disagreement on a region (a collapsed edge breaks the angle sum π of its triangles)', () => {
    const d = lensSpaceDiagram(2, 1, 4);
    const v = d.basepoints[0].vertex, w = d.mesh.heVert[d.mesh.vertHe[v] + (d.mesh.vertHe[v] % 3 === 2 ? -2 : 1)];
    for (let k = 0; k < 3; k++) d.mesh.pos[3 * v + k] = d.mesh.pos[3 * w + k]; // vertex v sits on its neighbour w
    const a = analyse(d);
    expect(a.defects.length).toBeGreaterThan(0);
    expect(a.regions.some((r) => r.defect !== undefined)).toBe(true);
    expect(a.defects[0].message).toMatch(/^region R_\d+: /);
  });
});
