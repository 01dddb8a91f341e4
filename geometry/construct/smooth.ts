/**
 * Curve smoothing: moves each curve vertex that is not an intersection point toward the midpoint of its two
 * curve neighbours (one umbrella step of Laplacian smoothing along the curve, Taubin 1995), in the tangent
 * plane of the surface at that vertex. Connectivity never changes, so the topology of the diagram is kept;
 * a step that would flip or collapse a triangle is halved, then skipped.
 */
import { fail, type Result } from '../base/result.js';
import type { HeegaardDiagram } from '../diagram/types.js';
import { closeDiagram, fan, openDiagram } from './labels.js';
import type { EditMesh } from '../mesh/edit.js';

/** Options for smoothCurves. */
export interface SmoothOptions {
  /** Passes over all curves (default 5, at most 100). */
  iterations?: number;
  /** Fraction of the way to the neighbours' midpoint per pass, 0 < strength <= 1 (default 0.5). */
  strength?: number;
  /** Positions in d.curves of the curves to smooth (default: all). */
  curves?: number[];
  /** Move only vertices numbered from this one on (0-based; default 0), e.g. those an operation created. */
  fromVertex?: number;
}

/** Normal of face f (unnormalised, length = twice the area). */
function faceNormal(p: Float64Array, em: EditMesh, f: number, out: number[]): void {
  const a = em.heVert[3 * f], b = em.heVert[3 * f + 1], c = em.heVert[3 * f + 2];
  const u = [0, 1, 2].map((k) => p[3 * b + k] - p[3 * a + k]), v = [0, 1, 2].map((k) => p[3 * c + k] - p[3 * a + k]);
  out[0] = u[1] * v[2] - u[2] * v[1]; out[1] = u[2] * v[0] - u[0] * v[2]; out[2] = u[0] * v[1] - u[1] * v[0];
}

/** Tries to move v by delta; keeps the move only if every face around v keeps its orientation and >= 25% of its area. */
function tryMove(em: EditMesh, v: number, delta: number[]): boolean {
  const p = em.pos, faces = fan(em, v).map((h) => (h / 3) | 0);
  const before = faces.map(() => [0, 0, 0]);
  faces.forEach((f, i) => faceNormal(p, em, f, before[i]));
  const old = [p[3 * v], p[3 * v + 1], p[3 * v + 2]];
  for (let k = 0; k < 3; k++) p[3 * v + k] += delta[k];
  const n = [0, 0, 0];
  const good = faces.every((f, i) => {
    faceNormal(p, em, f, n);
    const b = before[i], bb = Math.hypot(b[0], b[1], b[2]);
    return n[0] * b[0] + n[1] * b[1] + n[2] * b[2] > 0.25 * bb * bb;
  });
  if (!good) for (let k = 0; k < 3; k++) p[3 * v + k] = old[k];
  return good;
}

/** Smooths every curve of the diagram; returns a new diagram with the same mesh connectivity. O(iterations x curve length x degree). */
export function smoothCurves(d: HeegaardDiagram, options: SmoothOptions = {}): Result<HeegaardDiagram> {
  const iterations = options.iterations ?? 5, strength = options.strength ?? 0.5;
  if (!Number.isInteger(iterations) || iterations < 1 || iterations > 100) return fail({ code: 'bad-parameter', message: 'iterations must be a whole number from 1 to 100' });
  if (!(strength > 0 && strength <= 1)) return fail({ code: 'bad-parameter', message: 'strength must be above 0 and at most 1' });
  const ws = openDiagram(d);
  if (!ws.ok) return ws;
  const em = ws.value.em, p = em.pos;
  const only = options.curves;
  if (only && !only.every((c) => Number.isInteger(c) && c >= 0 && c < d.curves.length)) return fail({ code: 'unknown-curve', message: `curve positions must be 0 to ${d.curves.length - 1}` });
  const crossing = new Uint8Array(em.nV);
  for (const c of d.curves) for (const v of c.vertices) crossing[v]++;
  for (let it = 0; it < iterations; it++) {
    for (const [ci, c] of d.curves.entries()) {
      if (only && !only.includes(ci)) continue;
      const vs = c.vertices, n = vs.length;
      for (let i = 0; i < n; i++) {
        const v = vs[i];
        if (crossing[v] > 1 || v < (options.fromVertex ?? 0)) continue;
        const a = vs[(i + n - 1) % n], b = vs[(i + 1) % n];
        const delta = [0, 1, 2].map((k) => strength * (0.5 * (p[3 * a + k] + p[3 * b + k]) - p[3 * v + k]));
        // Remove the normal component (vertex normal = sum of face normals around v).
        const nv = [0, 0, 0], fn = [0, 0, 0];
        for (const h of fan(em, v)) { faceNormal(p, em, (h / 3) | 0, fn); for (let k = 0; k < 3; k++) nv[k] += fn[k]; }
        const nn = nv[0] * nv[0] + nv[1] * nv[1] + nv[2] * nv[2];
        if (nn > 0) {
          const s = (delta[0] * nv[0] + delta[1] * nv[1] + delta[2] * nv[2]) / nn;
          for (let k = 0; k < 3; k++) delta[k] -= s * nv[k];
        }
        if (!tryMove(em, v, delta)) tryMove(em, v, delta.map((x) => 0.5 * x));
      }
    }
  }
  em.version++;
  return closeDiagram(ws.value, { partial: true });
}
