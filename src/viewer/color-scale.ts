/**
 * Colour scales for region and vertex quantities. Pure (no three.js), shared by the 3D view and the DOM
 * legend. The diverging scale is ColorBrewer PRGn (Brewer & Harrower, colorbrewer2.org, 2003; marked
 * colour-blind safe there): purple for negative, near-white for zero, green for positive. It avoids the
 * blue and vermilion of the alpha and beta curves.
 */

export type Rgb = [number, number, number];

const PRGN = ['#762a83', '#af8dc3', '#e7d4e8', '#f7f7f7', '#d9f0d3', '#7fbf7b', '#1b7837'];

/** '#rrggbb' → [r, g, b] in 0..1. */
export function hexToRgb(hex: string): Rgb {
  const h = hex.replace('#', '');
  return [parseInt(h.slice(0, 2), 16) / 255, parseInt(h.slice(2, 4), 16) / 255, parseInt(h.slice(4, 6), 16) / 255];
}

const STOPS = PRGN.map(hexToRgb);

/** Diverging colour for t in [−1, 1] (clamped); 0 is near-white. O(1). */
export function divergingColor(t: number): Rgb {
  const x = Math.max(-1, Math.min(1, Number.isFinite(t) ? t : 0));
  const u = ((x + 1) / 2) * (STOPS.length - 1);
  const i = Math.min(STOPS.length - 2, Math.floor(u));
  const f = u - i;
  const a = STOPS[i], b = STOPS[i + 1];
  return [a[0] + (b[0] - a[0]) * f, a[1] + (b[1] - a[1]) * f, a[2] + (b[2] - a[2]) * f];
}

/** CSS colour string for a diverging value (legend swatches, table chips). */
export function divergingCss(t: number): string {
  const [r, g, b] = divergingColor(t);
  return `rgb(${Math.round(r * 255)} ${Math.round(g * 255)} ${Math.round(b * 255)})`;
}

/** The symmetric range [−m, m] that covers all finite values (m ≥ tiny, so division is safe). O(n). */
export function symmetricExtent(values: ArrayLike<number>): number {
  let m = 0;
  for (let i = 0; i < values.length; i++) {
    const v = Math.abs(values[i]);
    if (Number.isFinite(v) && v > m) m = v;
  }
  return m > 1e-12 ? m : 1;
}

/**
 * A symmetric range that covers the q-quantile of |value| (q = 0.95 ignores a few spikes, so a heat map of
 * curvature defects shows its pattern rather than one extreme vertex). O(n log n).
 */
export function robustExtent(values: ArrayLike<number>, q = 0.95): number {
  const a: number[] = [];
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i])) a.push(Math.abs(values[i]));
  if (a.length === 0) return 1;
  a.sort((x, y) => x - y);
  const m = a[Math.min(a.length - 1, Math.floor(q * (a.length - 1)))];
  return m > 1e-12 ? m : symmetricExtent(values);
}

/**
 * Per-face colours (3 floats per face) from a per-region value: face f gets the colour of
 * value[faceRegion[f]] on the scale [−extent, extent]. Regions with NaN keep `neutral`. O(F).
 */
export function faceColorsFromRegions(faceRegion: ArrayLike<number>, regionValue: ArrayLike<number>, extent: number, neutral: Rgb): Float32Array {
  const out = new Float32Array(faceRegion.length * 3);
  const cache = new Map<number, Rgb>();
  for (let f = 0; f < faceRegion.length; f++) {
    const r = faceRegion[f];
    let c = cache.get(r);
    if (!c) {
      const v = regionValue[r];
      c = v === undefined || Number.isNaN(v) ? neutral : divergingColor(v / extent);
      cache.set(r, c);
    }
    out[3 * f] = c[0]; out[3 * f + 1] = c[1]; out[3 * f + 2] = c[2];
  }
  return out;
}

/** Per-vertex colours (3 floats per vertex) from a per-vertex value on [−extent, extent]. O(V). */
export function vertexColorsFromValues(values: ArrayLike<number>, extent: number): Float32Array {
  const out = new Float32Array(values.length * 3);
  for (let v = 0; v < values.length; v++) {
    const c = divergingColor(values[v] / extent);
    out[3 * v] = c[0]; out[3 * v + 1] = c[1]; out[3 * v + 2] = c[2];
  }
  return out;
}
