import { describe, expect, it } from 'vitest';
import { validateCurves } from './validate.js';
import { gridMeridian, gridParallel, gridTorusDiagram, lensSpaceDiagram, type GridPath, type GridTorusDiagramSpec } from './grid-torus-diagram.js';
import { torusGridVertex } from '../surfaces/torus.js';
import { buildTriMesh } from '../mesh/tri-mesh.js';
import { torusGrid } from '../surfaces/torus.js';
import type { HeegaardDiagram } from './types.js';

// Rules checked here: DESIGN.md "Geometry conventions" and the count rules of a Heegaard diagram
// (Ozsváth–Szabó 2004 §2; Manolescu–Ozsváth–Sarkar 2009 for several basepoints).
const grid = { R: 2, r: 0.8, nu: 12, nv: 12 };
const V = (i: number, j: number) => torusGridVertex(grid, i, j);
const spec = (s: Partial<GridTorusDiagramSpec>): HeegaardDiagram =>
  gridTorusDiagram({ grid, alpha: [gridMeridian(grid, 0)], beta: [gridParallel(grid, 0)], z: [[6, 6]], ...s });
const codes = (d: HeegaardDiagram) => validateCurves(d).map((p) => p.code);
const only = (d: HeegaardDiagram) => {
  const ps = validateCurves(d);
  expect(ps.length).toBe(1);
  return ps[0];
};
const column = (i: number, from: number, to: number): GridPath => Array.from({ length: to - from + 1 }, (_, k) => [i, from + k]);

describe('curve validation', () => {
  it('accepts the standard genus-1 diagram of S^3 (meridian and longitude meeting once)', () => {
    expect(validateCurves(spec({}))).toEqual([]);
  });

  it('rejects a curve with fewer than three vertices', () => {
    const p = only(spec({ alpha: [[[0, 0], [0, 1]]] }));
    expect(p.code).toBe('curve-too-short');
    expect(p.message).toContain('alpha_1');
  });

  it('rejects a curve that uses a vertex the surface does not have', () => {
    const d = spec({});
    d.curves[0].vertices[3] = 99999;
    expect(codes(d)).toContain('curve-vertex-missing');
  });

  it('rejects a curve through one vertex twice, naming the vertex by its file number', () => {
    const d = spec({ beta: [[[1, 0], [2, 0], [3, 0], [3, 1], [2, 0]]] });
    d.vertexLabels = Int32Array.from({ length: d.mesh.nV }, (_, v) => v + 1001);
    const ps = validateCurves(d);
    const p = ps.find((x) => x.code === 'curve-not-simple')!;
    expect(p.message).toBe(`beta_1 passes through vertex ${V(2, 0) + 1001} more than once; each curve must be simple`);
    expect(p.vertices).toEqual([V(2, 0) + 1001]);
  });

  it('rejects a curve that jumps between vertices not joined by an edge', () => {
    const d = spec({ alpha: [[...column(0, 0, 5), [0, 7], [0, 8], [0, 9], [0, 10], [0, 11]]] });
    const p = only(d);
    expect(p.code).toBe('curve-off-edges');
    expect(p.message).toBe(`alpha_1 steps from vertex ${V(0, 5) + 1} to vertex ${V(0, 7) + 1}, which are not joined by a mesh edge; curves must run along edges`);
  });

  it('rejects two alpha curves sharing an edge', () => {
    const a2: GridPath = [[0, 3], [0, 4], [1, 5], [1, 4]];
    const d = spec({ alpha: [gridMeridian(grid, 0), a2], beta: [gridParallel(grid, 0), gridParallel(grid, 6)], z: [[6, 6], [6, 3]] });
    const cs = codes(d);
    expect(cs).toContain('curves-share-edge');
    expect(cs).toContain('same-family-curves-meet');
  });

  it('rejects an alpha and a beta curve sharing an edge', () => {
    const b: GridPath = [[0, 0], [0, 1], [1, 1], [1, 0]];
    const ps = validateCurves(spec({ beta: [b] }));
    const p = ps.find((x) => x.code === 'alpha-beta-share-edge')!;
    expect(p.message).toContain('alpha_1 and beta_1 share the edge between vertices');
  });

  it('rejects a tangency (alpha, alpha, beta, beta around the vertex) and names the vertex', () => {
    const b: GridPath = [...column(2, 0, 4), [1, 4], [1, 5], [0, 5], [1, 6], ...column(2, 6, 11)];
    const p = only(spec({ beta: [b] }));
    expect(p.code).toBe('tangency');
    expect(p.message).toContain(`alpha_1 and beta_1 touch at vertex ${V(0, 5) + 1} without crossing`);
    expect(p.vertices).toEqual([V(0, 5) + 1]);
  });

  it('rejects two alpha curves meeting at a vertex', () => {
    const a2: GridPath = [[0, 5], [1, 5], [1, 6]];
    const ps = validateCurves(spec({ alpha: [gridMeridian(grid, 0), a2], beta: [gridParallel(grid, 0), gridParallel(grid, 6)], z: [[6, 6], [6, 3]] }));
    expect(ps.map((p) => p.message)).toContain(`alpha_1 and alpha_2 meet at vertex ${V(0, 5) + 1}; the alpha curves must be pairwise disjoint`);
  });

  it('rejects three curves through one vertex', () => {
    const d = spec({ alpha: [gridMeridian(grid, 0), gridMeridian(grid, 6)], beta: [gridParallel(grid, 0), [[11, 11], [0, 0], [1, 1], [1, 2], [0, 2]]], z: [[3, 3], [9, 9]] });
    expect(codes(d)).toContain('too-many-curves-at-vertex');
  });

  it('rejects a basepoint on a curve and a basepoint off the surface', () => {
    const d = spec({ z: [[0, 4]] });
    expect(only(d).message).toBe(`basepoint z_1 sits at vertex ${V(0, 4) + 1} on alpha_1; basepoints must lie off the curves`);
    const e = spec({});
    e.basepoints[0].vertex = -5;
    expect(codes(e)).toEqual(['basepoint-missing']);
  });

  it('rejects unequal numbers of alpha and beta curves', () => {
    const p = only(spec({ beta: [] }));
    expect(p.code).toBe('curve-count');
    expect(p.message).toBe('the diagram has 1 alpha curve and 0 beta curves; a Heegaard diagram has as many alpha as beta curves');
  });

  it('rejects fewer curves than the genus (k ≥ g)', () => {
    const p = only(spec({ alpha: [], beta: [] }));
    expect(p.code).toBe('too-few-curves');
    expect(p.message).toContain('genus 1');
  });

  it('rejects an alpha curve that bounds a disk: Σ ∖ α has 2 pieces, not k − g + 1 = 1', () => {
    const loop: GridPath = [[5, 5], [6, 5], [6, 6], [5, 6]];
    const p = only(spec({ alpha: [loop], z: [[9, 9]] }));
    expect(p.code).toBe('family-does-not-cut');
    expect(p.message).toContain('the alpha curves cut the surface into 2 pieces');
  });

  it('rejects a piece of Σ ∖ α without a z basepoint, and one with two', () => {
    const none = spec({ z: [] });
    expect(codes(none)).toEqual(['piece-without-basepoint', 'piece-without-basepoint']);
    const two = spec({ z: [[6, 6], [3, 3]] });
    const ps = validateCurves(two);
    expect(ps.map((p) => p.code)).toEqual(['piece-with-several-basepoints', 'piece-with-several-basepoints']);
    expect(ps[0].message).toContain('holds 2 z basepoints (z_1, z_2)');
  });

  it('checks w basepoints the same way when they are given (Manolescu–Ozsváth–Sarkar 2009)', () => {
    expect(validateCurves(spec({ w: [[3, 3]] }))).toEqual([]);
    expect(codes(spec({ w: [[3, 3], [9, 9]] }))).toContain('piece-with-several-basepoints');
  });

  it('rejects curve numbers with a gap (alpha_2 without alpha_1)', () => {
    const d = spec({});
    d.curves[0].index = 1;
    expect(codes(d)).toContain('curve-numbering');
  });

  it('rejects a surface with a hole', () => {
    const { pos, tris } = torusGrid(grid);
    const d = lensSpaceDiagram(1, 1, 12);
    d.mesh = buildTriMesh(pos, tris.slice(3)).mesh; // drop one triangle
    expect(codes(d)[0]).toBe('surface-not-closed');
  });
});
