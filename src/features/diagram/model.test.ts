import { describe, expect, it } from 'vitest';
import { encodeFloat32Base64, encodeInt32Base64, type AnalysisResult, type Region } from '../../../server/contract/index.js';
import { coloring, regionIndex, regionMask } from './model';
import { fractionText, rationalTex } from './format';

/** Three regions over six faces, built with code: faces 0–1 in R1, 2–3 in R2, 4–5 in R3. */
function fakeResult(): AnalysisResult {
  const region = (id: number, e: number): Region => ({
    id, faces: 2, area: 1, chi: 1, convexCorners: 2, reflexCorners: 0, eulerMeasure: e, geometricEulerMeasure: e,
    curvature: { interior: 0, boundary: 0, corners: 0 }, difference: 0, basepoints: [], corners: 2,
  });
  return {
    stats: { vertices: 4, edges: 6, faces: 6, eulerCharacteristic: 2, genus: 0, area: 1, bbox: { min: [0, 0, 0], max: [1, 1, 1] } },
    curves: [], basepoints: [], intersections: [],
    regions: [region(0, 0.5), region(1, -1), region(2, 0.5)],
    faceRegion: encodeInt32Base64([0, 0, 1, 1, 2, 2]),
    vertexDefect: encodeFloat32Base64([0.1, -0.1, 0, 0]),
    warnings: [], floer: null, floerUnavailable: 'test',
  } as AnalysisResult;
}

describe('the lab model', () => {
  it('groups faces by region and masks a region’s faces', () => {
    const idx = regionIndex(fakeResult(), 3);
    expect(idx.facesOf).toEqual([[0, 1], [2, 3], [4, 5]]);
    expect(Array.from(regionMask(idx.faceRegion, [1])!)).toEqual([0, 0, 1, 1, 0, 0]);
    expect(regionMask(idx.faceRegion, [])).toBeNull();
  });

  it('colours faces by domain coefficient, equal within a region', () => {
    const r = fakeResult();
    const c = coloring('domain', r, regionIndex(r, 3), { 0: 1 }, null);
    expect(c.legend?.extent).toBe(1);
    const f = c.faceColors!;
    expect(Array.from(f.slice(0, 3))).toEqual(Array.from(f.slice(3, 6)));
    expect(f[1]).toBeGreaterThan(f[0]); // positive: green (ColorBrewer PRGn)
  });

  it('gives per-vertex colours for the curvature heat map and none for the plain surface', () => {
    const r = fakeResult();
    expect(coloring('defect', r, regionIndex(r, 3), {}, null).vertexColors?.length).toBe(12);
    expect(coloring('plain', r, regionIndex(r, 3), {}, null).legend).toBeNull();
  });

  it('writes Euler measures as exact quarters (Lipshitz 2006: e is a multiple of 1/4)', () => {
    expect(fractionText(0.5)).toBe('1/2');
    expect(fractionText(-0.25)).toBe('−1/4');
    expect(fractionText(0)).toBe('0');
    expect(rationalTex('-3/4')).toBe('-\\tfrac{3}{4}');
  });
});
