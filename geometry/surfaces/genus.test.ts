import { describe, expect, it } from 'vitest';
import { genusSurface, voxelSlabCage } from './genus.js';
import { buildTriMesh, outgoingHalfEdges, tipVertex, type TriMesh } from '../mesh/tri-mesh.js';
import { surfaceStats, validateSurface } from '../mesh/validate.js';

/** Signed volume by the divergence theorem: positive when faces are counter-clockwise from outside (common practice). */
function signedVolume(pos: Float64Array, tris: Int32Array): number {
  let vol = 0;
  for (let f = 0; f < tris.length / 3; f++) {
    const [a, b, c] = [3 * tris[3 * f], 3 * tris[3 * f + 1], 3 * tris[3 * f + 2]];
    vol += pos[a] * (pos[b + 1] * pos[c + 2] - pos[b + 2] * pos[c + 1])
      - pos[a + 1] * (pos[b] * pos[c + 2] - pos[b + 2] * pos[c])
      + pos[a + 2] * (pos[b] * pos[c + 1] - pos[b + 1] * pos[c]);
  }
  return vol / 6;
}

function isEdge(m: TriMesh, a: number, b: number): boolean {
  return outgoingHalfEdges(m, a).some((h) => tipVertex(m, h) === b);
}

describe('genusSurface', () => {
  it('matches the measured counts for genus 2, level 3: V = 7422, E = 22272, F = 14848, χ = −2 (GEOMETRY.md)', () => {
    const s = genusSurface({ genus: 2, level: 3 });
    const st = surfaceStats(buildTriMesh(s.pos, s.tris).mesh);
    expect([st.vertices, st.edges, st.faces, st.eulerCharacteristic]).toEqual([7422, 22272, 14848, -2]);
  });

  for (let g = 0; g <= 4; g++) {
    it(`builds a valid closed outward surface of genus ${g} with χ = ${2 - 2 * g} and total angle defect 2πχ (χ = 2 − 2g, common practice; Descartes / discrete Gauss–Bonnet, Polthier & Schmies 1998)`, () => {
      for (const level of [0, 1, 2]) {
        const s = genusSurface({ genus: g, level });
        const { mesh, report } = buildTriMesh(s.pos, s.tris);
        expect(validateSurface(mesh, report)).toEqual([]);
        const st = surfaceStats(mesh);
        expect(st.eulerCharacteristic).toBe(2 - 2 * g);
        expect(st.genus).toBe(g);
        expect(Math.abs(st.totalAngleDefect - 2 * Math.PI * st.eulerCharacteristic)).toBeLessThan(1e-9);
        expect(signedVolume(s.pos, s.tris)).toBeGreaterThan(0);
        expect(s.tris.length / 3).toBe(2 * (44 * g + 28) * 4 ** level);
      }
    });
  }

  it('builds genus 8 at level 1 as a valid surface (χ = −14, common practice)', () => {
    const s = genusSurface({ genus: 8, level: 1 });
    const { mesh, report } = buildTriMesh(s.pos, s.tris);
    expect(validateSurface(mesh, report)).toEqual([]);
    expect(surfaceStats(mesh).eulerCharacteristic).toBe(-14);
    expect(s.alphas).toHaveLength(8);
  });

  it('gives genus 0 a sphere with no curves', () => {
    const s = genusSurface({ genus: 0, level: 2 });
    expect(s.alphas).toEqual([]);
    expect(s.betas).toEqual([]);
  });

  for (const level of [0, 2]) {
    it(`gives curves along mesh edges with alpha_i ∩ beta_j = δ_ij, crossing transversally (standard genus-g diagram of S^3), level ${level}`, () => {
      const g = 3;
      const s = genusSurface({ genus: g, level });
      const { mesh } = buildTriMesh(s.pos, s.tris);
      for (const c of [...s.alphas, ...s.betas]) {
        expect(new Set(c).size).toBe(c.length);
        for (let k = 0; k < c.length; k++) expect(isEdge(mesh, c[k], c[(k + 1) % c.length])).toBe(true);
      }
      const sets = [...s.alphas, ...s.betas].map((c) => new Set(c));
      for (let i = 0; i < g; i++) for (let j = i + 1; j < g; j++) {
        expect([...sets[i]].some((v) => sets[j].has(v))).toBe(false); // alphas pairwise disjoint
        expect([...sets[g + i]].some((v) => sets[g + j].has(v))).toBe(false); // betas pairwise disjoint
      }
      for (let i = 0; i < g; i++) for (let j = 0; j < g; j++) {
        const common = [...sets[i]].filter((v) => sets[g + j].has(v));
        expect(common.length).toBe(i === j ? 1 : 0);
        if (i !== j) continue;
        const x = common[0], a = s.alphas[i], b = s.betas[j];
        const ia = a.indexOf(x), ib = b.indexOf(x);
        const aN = new Set([a[(ia + 1) % a.length], a[(ia + a.length - 1) % a.length]]);
        const bN = new Set([b[(ib + 1) % b.length], b[(ib + b.length - 1) % b.length]]);
        const fan = outgoingHalfEdges(mesh, x).map((h) => tipVertex(mesh, h));
        const pattern = fan.filter((v) => aN.has(v) || bN.has(v)).map((v) => (aN.has(v) ? 'a' : 'b')).join('');
        expect(['abab', 'baba']).toContain(pattern);
      }
      for (const set of sets) expect(set.has(s.basepoint)).toBe(false);
    });
  }

  it('builds the cage with 44g + 28 quads', () => {
    for (let g = 0; g <= 8; g++) expect(voxelSlabCage(g).mesh.quads.length / 4).toBe(44 * g + 28);
  });
});
