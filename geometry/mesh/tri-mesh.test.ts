import { describe, expect, it } from 'vitest';
import { buildTriMesh, eulerCharacteristic, outgoingHalfEdges, tipVertex, validateConnectivity } from './tri-mesh.js';
import { torusGrid } from '../surfaces/torus.js';

describe('directed-edge mesh', () => {
  it('joins every half-edge of a grid torus to a twin, giving chi = 0 (do Carmo 1976: the torus has chi 0)', () => {
    const { pos, tris } = torusGrid({ R: 2, r: 1, nu: 8, nv: 6 });
    const { mesh, report } = buildTriMesh(pos, tris);
    expect(report.boundary).toEqual([]);
    expect(report.duplicated).toEqual([]);
    expect(report.nonManifold).toEqual([]);
    expect(eulerCharacteristic(mesh)).toBe(0);
    expect(validateConnectivity(mesh)).toBeNull();
    for (let h = 0; h < 3 * mesh.nF; h++) expect(mesh.heTwin[mesh.heTwin[h]]).toBe(h);
  });

  it('walks a vertex fan counter-clockwise through all six neighbours of a grid vertex', () => {
    const { pos, tris } = torusGrid({ R: 2, r: 1, nu: 8, nv: 6 });
    const { mesh } = buildTriMesh(pos, tris);
    const fan = outgoingHalfEdges(mesh, 0).map((h) => tipVertex(mesh, h));
    expect(new Set(fan).size).toBe(6);
  });
});
