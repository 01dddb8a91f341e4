import { describe, expect, it } from 'vitest';
import { buildTriMesh } from './tri-mesh.js';
import { isWarning, surfaceStats, validateSurface } from './validate.js';
import { LISTED_PER_KIND } from './validate-problems.js';
import { torusGrid } from '../surfaces/torus.js';
import { sphereMesh } from '../surfaces/sphere.js';

/** Builds and validates; returns the problem codes. */
function codesOf(pos: ArrayLike<number>, tris: ArrayLike<number>, labels?: Int32Array) {
  const { mesh, report } = buildTriMesh(Float64Array.from(pos), tris);
  const problems = validateSurface(mesh, report, labels);
  return { problems, codes: [...new Set(problems.map((p) => p.code))].sort() };
}

/** Octahedron, counter-clockwise from outside (common practice). */
const octPos = [1, 0, 0, -1, 0, 0, 0, 1, 0, 0, -1, 0, 0, 0, 1, 0, 0, -1];
const octTris = [0, 2, 4, 2, 1, 4, 1, 3, 4, 3, 0, 4, 2, 0, 5, 1, 2, 5, 3, 1, 5, 0, 3, 5];

describe('validateSurface', () => {
  it('accepts a closed octahedron, icospheres and grid tori (common practice: these are closed oriented surfaces)', () => {
    expect(codesOf(octPos, octTris).problems).toEqual([]);
    const s = sphereMesh(2);
    expect(codesOf(s.pos, s.tris).problems).toEqual([]);
    const t = torusGrid({ R: 2, r: 1, nu: 12, nv: 7 });
    expect(codesOf(t.pos, t.tris).problems).toEqual([]);
  });

  it('reports an open boundary edge by its file vertex numbers', () => {
    const { problems, codes } = codesOf(octPos, octTris.slice(3));
    expect(codes).toEqual(['open-boundary']);
    expect(problems).toHaveLength(3);
    expect(problems[0].message).toMatch(/open boundary along edge \d–\d/);
    const labelled = codesOf(octPos, octTris.slice(3), Int32Array.from([11, 12, 13, 14, 15, 16]));
    expect(labelled.problems.flatMap((p) => p.vertices).sort()).toEqual([11, 13, 13, 15, 15, 11].sort());
  });

  it('reports an edge shared by three triangles as non-manifold', () => {
    // Octahedron plus a fin on edge 0–2 (common practice: an edge of a surface borders exactly two faces).
    const pos = [...octPos, 5, 5, 5];
    const { problems, codes } = codesOf(pos, [...octTris, 0, 6, 2]);
    expect(codes).toContain('non-manifold-edge');
    expect(problems.find((p) => p.code === 'non-manifold-edge')!.message).toContain('Edge 1–3 is shared by 3 triangles');
  });

  it('reports a second a->b half-edge as inconsistent orientation, but an orientable surface', () => {
    const tris = [...octTris];
    [tris[1], tris[2]] = [tris[2], tris[1]]; // reverse triangle 1
    const { codes, problems } = codesOf(octPos, tris);
    expect(codes).toEqual(['inconsistent-orientation']);
    expect(problems).toHaveLength(3);
  });

  it('reports a Möbius band glued into a closed-looking strip as non-orientable', () => {
    // Möbius band from a 6x1 strip with its ends glued with a half twist (common practice).
    const n = 6, pos: number[] = [], tris: number[] = [];
    for (let i = 0; i < n; i++) for (const s of [-1, 1]) pos.push(Math.cos((2 * Math.PI * i) / n), Math.sin((2 * Math.PI * i) / n), s * 0.3 + i * 0.01);
    for (let i = 0; i < n; i++) {
      const a = 2 * i, b = 2 * i + 1;
      const last = i === n - 1;
      const c = last ? 1 : 2 * i + 2, d = last ? 0 : 2 * i + 3;
      tris.push(a, c, d, a, d, b);
    }
    const { codes } = codesOf(pos, tris);
    expect(codes).toContain('non-orientable');
    expect(codes).toContain('open-boundary');
  });

  it('reports a closed Klein bottle as non-orientable (common practice: the Klein bottle is non-orientable)', () => {
    // Grid on [0, nu) x [0, nv) glued (nu, j) ~ (0, -j): a closed surface with one orientation-reversing seam.
    const nu = 8, nv = 6;
    const { pos } = torusGrid({ R: 3, r: 1, nu, nv });
    const id = (i: number, j: number) => (i === nu ? 0 : i) * nv + ((((i === nu ? -j : j) % nv) + nv) % nv);
    const tris: number[] = [];
    for (let i = 0; i < nu; i++) for (let j = 0; j < nv; j++) tris.push(id(i, j), id(i + 1, j), id(i + 1, j + 1), id(i, j), id(i + 1, j + 1), id(i, j + 1));
    const { codes, problems } = codesOf(pos, tris);
    expect(codes).toEqual(['inconsistent-orientation', 'non-orientable']);
    expect(problems.find((p) => p.code === 'non-orientable')!.message).toMatch(/^The surface is not orientable \(it contains a Möbius band\)/);
  });

  it('reports degenerate triangles: a repeated vertex and zero area', () => {
    const pos = [...octPos, 0.5, 0.5, 0];
    expect(codesOf(pos, [...octTris, 0, 0, 2]).codes).toContain('degenerate-face');
    expect(codesOf(pos, [...octTris, 0, 6, 2]).codes).toContain('zero-area-face');
  });

  it('reports duplicate triangles, with and without reversed orientation', () => {
    expect(codesOf(octPos, [...octTris, 0, 2, 4]).codes).toContain('duplicate-face');
    const twin = codesOf(octPos, [...octTris, 4, 2, 0]);
    expect(twin.codes).toContain('duplicate-face');
    // A pair glued along all three edges also forms a closed sphere on its own.
    const pair = codesOf([0, 0, 0, 1, 0, 0, 0, 1, 0], [0, 1, 2, 0, 2, 1]);
    expect(pair.codes).toEqual(['duplicate-face']);
  });

  it('reports a pinch vertex where two spheres touch', () => {
    // Two octahedra sharing vertex 0 (common practice: a manifold vertex has one disk of triangles).
    const pos = [...octPos, ...octPos.map((x, i) => (i % 3 === 0 ? x + 2 : x))];
    const shifted = octTris.map((v) => (v === 1 ? 0 : v + 6));
    const { codes } = codesOf(pos, [...octTris, ...shifted]);
    expect(codes).toContain('non-manifold-vertex');
    expect(codes).not.toContain('several-components');
  });

  it('reports unused vertices as a warning and several components as an error', () => {
    const { problems } = codesOf([...octPos, 9, 9, 9], octTris);
    expect(problems.map((p) => p.code)).toEqual(['unused-vertex']);
    expect(isWarning(problems[0])).toBe(true);
    expect(problems[0].message).toBe('Vertex 7 is not used by any triangle; it will be ignored.');
    const two = codesOf([...octPos, ...octPos.map((x) => x + 5)], [...octTris, ...octTris.map((v) => v + 6)]);
    expect(two.codes).toEqual(['several-components']);
    expect(two.problems[0].message).toContain('2 separate pieces (with 8 and 8 triangles)');
  });

  it('summarises offenders past the listing limit without losing any', () => {
    const t = torusGrid({ R: 2, r: 1, nu: 12, nv: 7 });
    const { problems } = codesOf(t.pos, t.tris.filter((_, i) => ((i / 3) | 0) % 2 === 0));
    const open = problems.filter((p) => p.code === 'open-boundary');
    expect(open).toHaveLength(LISTED_PER_KIND + 1);
    expect(open[LISTED_PER_KIND].message).toMatch(/more open edges/);
  });
});

describe('surfaceStats', () => {
  const expectGaussBonnet = (pos: Float64Array, tris: Int32Array, chi: number) => {
    const s = surfaceStats(buildTriMesh(pos, tris).mesh);
    expect(s.eulerCharacteristic).toBe(chi);
    // Descartes' theorem / discrete Gauss–Bonnet (Polthier & Schmies 1998): total angle defect = 2πχ exactly.
    expect(Math.abs(s.totalAngleDefect - 2 * Math.PI * chi)).toBeLessThan(1e-9);
    expect(Math.abs(s.totalCurvature - chi)).toBeLessThan(1e-9);
    return s;
  };

  it('gives icospheres total defect 4π (Descartes: a convex polyhedron has total defect 4π)', () => {
    for (const level of [0, 1, 3]) {
      const { pos, tris } = sphereMesh(level);
      const s = expectGaussBonnet(pos, tris, 2);
      expect(s.vertices).toBe(10 * 4 ** level + 2); // common practice: icosphere counts
      expect(s.genus).toBe(0);
    }
  });

  it('gives grid tori total defect 0 and genus 1 (do Carmo 1976: the torus has χ = 0)', () => {
    for (const [nu, nv] of [[8, 5], [30, 17]]) {
      const { pos, tris } = torusGrid({ R: 3, r: 1, nu, nv });
      expect(expectGaussBonnet(pos, tris, 0).genus).toBe(1);
    }
  });
});
