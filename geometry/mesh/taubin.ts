/**
 * Taubin λ|μ smoothing of a surface (Taubin 1995, "A signal processing approach to fair surface design"):
 * alternating uniform Laplacian steps with λ = 0.5 and μ = −0.53 keep the volume from shrinking.
 * Only positions move; connectivity, and so every curve and basepoint of a diagram, is unchanged.
 */
import { buildTriMesh, next, type TriMesh } from './tri-mesh.js';

/** A new mesh with smoothed positions. O(iterations · F). */
export function taubinSmooth(m: TriMesh, iterations: number): TriMesh {
  const nV = m.nV, nH = 3 * m.nF;
  let pos = m.pos.slice(0, 3 * nV);
  const sum = new Float64Array(3 * nV), deg = new Float64Array(nV);
  for (let h = 0; h < nH; h++) deg[m.heVert[h]]++;
  const step = (factor: number) => {
    sum.fill(0);
    for (let h = 0; h < nH; h++) {
      const a = m.heVert[h], b = m.heVert[next(h)];
      for (let k = 0; k < 3; k++) sum[3 * a + k] += pos[3 * b + k];
    }
    const out = new Float64Array(3 * nV);
    for (let v = 0; v < nV; v++) {
      for (let k = 0; k < 3; k++) {
        const p = pos[3 * v + k];
        out[3 * v + k] = deg[v] > 0 ? p + factor * (sum[3 * v + k] / deg[v] - p) : p;
      }
    }
    pos = out;
  };
  for (let i = 0; i < iterations; i++) {
    step(0.5);
    step(-0.53);
  }
  return buildTriMesh(pos, m.heVert.subarray(0, nH)).mesh;
}
