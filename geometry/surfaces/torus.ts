/**
 * Torus of revolution X(u, v) = ((R + r cos v) cos u, (R + r cos v) sin u, r sin v) (do Carmo 1976, §4-2),
 * meshed as an nu x nv grid of quads split along (i, j)-(i+1, j+1). (u, v) is positively oriented for the
 * outward normal, so triangles listed counter-clockwise in (u, v) are counter-clockwise seen from outside.
 */
export interface TorusGridOptions {
  /** Distance from the axis to the tube's centre circle. */
  R: number;
  /** Tube radius, 0 < r < R. */
  r: number;
  /** Steps around the axis (u direction), >= 3. */
  nu: number;
  /** Steps around the tube (v direction), >= 3. */
  nv: number;
}

/** Vertex index of grid point (i, j), indices taken modulo the grid. */
export const torusGridVertex = (o: Pick<TorusGridOptions, 'nu' | 'nv'>, i: number, j: number): number =>
  (((i % o.nu) + o.nu) % o.nu) * o.nv + (((j % o.nv) + o.nv) % o.nv);

/** Positions and triangles of the grid torus. O(nu nv). */
export function torusGrid(o: TorusGridOptions): { pos: Float64Array; tris: Int32Array } {
  const { R, r, nu, nv } = o;
  const pos = new Float64Array(3 * nu * nv);
  for (let i = 0; i < nu; i++) {
    const u = (2 * Math.PI * i) / nu;
    for (let j = 0; j < nv; j++) {
      const v = (2 * Math.PI * j) / nv;
      const k = 3 * (i * nv + j);
      pos[k] = (R + r * Math.cos(v)) * Math.cos(u);
      pos[k + 1] = (R + r * Math.cos(v)) * Math.sin(u);
      pos[k + 2] = r * Math.sin(v);
    }
  }
  const tris = new Int32Array(6 * nu * nv);
  let t = 0;
  for (let i = 0; i < nu; i++) {
    for (let j = 0; j < nv; j++) {
      const a = torusGridVertex(o, i, j), b = torusGridVertex(o, i + 1, j);
      const c = torusGridVertex(o, i + 1, j + 1), d = torusGridVertex(o, i, j + 1);
      tris[t++] = a; tris[t++] = b; tris[t++] = c;
      tris[t++] = a; tris[t++] = c; tris[t++] = d;
    }
  }
  return { pos, tris };
}
