import { describe, expect, it } from 'vitest';
import { torusGrid } from '../../geometry/surfaces/torus';
import { barycentric, boundingSphere, cornerColors, faceSoup, maskedFaces, tubeAlongCycle, vertexNormals } from './mesh-buffers';
import { divergingColor, faceColorsFromRegions, symmetricExtent } from './color-scale';

/** A torus of revolution built with code (do Carmo 1976, §4-2). */
function torus() {
  const { pos, tris } = torusGrid({ R: 2, r: 0.7, nu: 12, nv: 8 });
  return { positions: new Float32Array(pos), triangles: new Uint32Array(tris) };
}

describe('viewer buffers', () => {
  it('gives outward unit normals on a torus (counter-clockwise faces point outwards, DESIGN.md)', () => {
    const { positions, triangles } = torus();
    const n = vertexNormals(positions, triangles);
    for (let v = 0; v < positions.length / 3; v++) {
      const x = positions[3 * v], y = positions[3 * v + 1], z = positions[3 * v + 2];
      const rho = Math.hypot(x, y);
      // outward direction from the tube's centre circle (common practice)
      const cx = (2 * x) / rho, cy = (2 * y) / rho;
      const dot = n[3 * v] * (x - cx) + n[3 * v + 1] * (y - cy) + n[3 * v + 2] * z;
      expect(dot).toBeGreaterThan(0);
      expect(Math.hypot(n[3 * v], n[3 * v + 1], n[3 * v + 2])).toBeCloseTo(1, 5);
    }
  });

  it('unrolls faces so each face owns three corners and can carry its own colour', () => {
    const { positions, triangles } = torus();
    const soup = faceSoup(positions, triangles, vertexNormals(positions, triangles));
    expect(soup.positions.length).toBe(triangles.length * 3);
    const faceColors = new Float32Array((triangles.length / 3) * 3);
    faceColors.set([1, 0, 0], 3 * 5);
    const colors = cornerColors(triangles, [0.5, 0.5, 0.5], faceColors, null);
    expect(Array.from(colors.slice(45, 54))).toEqual([1, 0, 0, 1, 0, 0, 1, 0, 0]);
    expect(Array.from(colors.slice(0, 3))).toEqual([0, 0, 0]);
  });

  it('keeps only masked faces in an overlay', () => {
    const { positions, triangles } = torus();
    const mask = new Uint8Array(triangles.length / 3);
    mask[3] = 1; mask[7] = 1;
    expect(maskedFaces(positions, triangles, vertexNormals(positions, triangles), mask, 0.01).length).toBe(18);
  });

  it('builds a closed tube with one ring per curve vertex', () => {
    const { positions, triangles } = torus();
    const meridian = Array.from({ length: 8 }, (_, j) => j); // grid column i = 0 (a meridian)
    const t = tubeAlongCycle(positions, vertexNormals(positions, triangles), meridian, 0.05, 0.02, 6);
    expect(t.positions.length).toBe(8 * 6 * 3);
    expect(t.indices.length).toBe(8 * 6 * 6);
    expect(Math.max(...t.indices)).toBe(8 * 6 - 1);
  });

  it('recovers barycentric coordinates of a point inside a triangle (common practice)', () => {
    const b = barycentric([0.25, 0.25, 0], [0, 0, 0], [1, 0, 0], [0, 1, 0]);
    expect(b[0]).toBeCloseTo(0.5); expect(b[1]).toBeCloseTo(0.25); expect(b[2]).toBeCloseTo(0.25);
  });

  it('bounds the torus of revolution by a sphere of radius R + r (do Carmo 1976)', () => {
    const s = boundingSphere(torus().positions);
    expect(s.center.map((c) => Math.abs(c) < 1e-6)).toEqual([true, true, true]);
    expect(s.radius).toBeCloseTo(2.7, 5);
  });
});

describe('colour scale', () => {
  it('maps zero to near-white and the ends to purple and green (ColorBrewer PRGn)', () => {
    expect(divergingColor(0).every((c) => c > 0.9)).toBe(true);
    const neg = divergingColor(-1), pos = divergingColor(1);
    expect(neg[0]).toBeGreaterThan(neg[1]);
    expect(pos[1]).toBeGreaterThan(pos[0]);
  });

  it('colours faces by their region value', () => {
    const cols = faceColorsFromRegions([0, 1, 1], [-2, 2], symmetricExtent([-2, 2]), [0.5, 0.5, 0.5]);
    expect(Array.from(cols.slice(3, 6))).toEqual(Array.from(cols.slice(6, 9)));
    expect(cols[0]).not.toBe(cols[3]);
  });
});
