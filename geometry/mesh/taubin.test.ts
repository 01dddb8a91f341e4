import { describe, expect, it } from 'vitest';
import { buildTriMesh, eulerCharacteristic, validateConnectivity } from './tri-mesh.js';
import { taubinSmooth } from './taubin.js';
import { surfaceStats } from './validate.js';
import { torusGrid } from '../surfaces/torus.js';

describe('Taubin smoothing', () => {
  it('moves positions but keeps connectivity, so the total angle defect stays 2πχ = 0 on a torus (Descartes; Polthier & Schmies 1998)', () => {
    const { pos, tris } = torusGrid({ R: 2, r: 0.7, nu: 24, nv: 12 });
    const { mesh } = buildTriMesh(pos, tris);
    const smooth = taubinSmooth(mesh, 5);
    expect(validateConnectivity(smooth)).toBeNull();
    expect(Array.from(smooth.heVert)).toEqual(Array.from(mesh.heVert.subarray(0, 3 * mesh.nF)));
    expect(eulerCharacteristic(smooth)).toBe(0);
    expect(Math.abs(surfaceStats(smooth).totalAngleDefect)).toBeLessThan(1e-9);
    let moved = 0;
    for (let i = 0; i < 3 * mesh.nV; i++) moved = Math.max(moved, Math.abs(smooth.pos[i] - mesh.pos[i]));
    expect(moved).toBeGreaterThan(1e-4);
  });
});
