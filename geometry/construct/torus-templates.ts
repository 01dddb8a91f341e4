/**
 * Genus-1 templates on a torus of revolution X(u, v) = ((R + r cos v) cos u, (R + r cos v) sin u, r sin v)
 * (do Carmo 1976, §4-2): lens spaces L(p, q), general (p, q) torus curves, S^3, S^1 x S^2 and n x n grid
 * diagrams (Manolescu–Ozsváth–Sarkar 2009). Conventions: u runs around the axis (grid index i, "horizontal"),
 * v around the tube (index j, "vertical"); alpha_1 of the genus-1 templates is the meridian u = 0; a (p, q)
 * curve winds p times in u and q times in v, so it meets the meridian p times (GEOMETRY.md, "Torus with a
 * (p,q) curve": grid nu = |q| M, nv = p M, the curve is the diagonal path).
 */
import { fail, ok, type Result } from '../base/result.js';
import { buildTriMesh, type TriMesh } from '../mesh/tri-mesh.js';
import { torusGrid, torusGridVertex } from '../surfaces/torus.js';
import type { Basepoint, HeegaardDiagram } from '../diagram/types.js';
import { closeDiagram, workspaceFrom } from './labels.js';
import { farthestFreeVertex, insertZeroSet, labelCycle, traceMarked } from './paths.js';

const R = 2, r = 0.8;

/** Grid torus; `anti` splits each quad along (i+1, j)-(i, j+1) instead of (i, j)-(i+1, j+1). O(nu nv). */
export function torusMesh(nu: number, nv: number, anti = false): TriMesh {
  const g = torusGrid({ R, r, nu, nv });
  if (anti) {
    const o = { nu, nv };
    let t = 0;
    for (let i = 0; i < nu; i++) {
      for (let j = 0; j < nv; j++) {
        const a = torusGridVertex(o, i, j), b = torusGridVertex(o, i + 1, j);
        const c = torusGridVertex(o, i + 1, j + 1), d = torusGridVertex(o, i, j + 1);
        g.tris[t++] = a; g.tris[t++] = b; g.tris[t++] = d;
        g.tris[t++] = b; g.tris[t++] = c; g.tris[t++] = d;
      }
    }
  }
  return buildTriMesh(g.pos, g.tris).mesh;
}

const gcd = (a: number, b: number): number => (b === 0 ? Math.abs(a) : gcd(b, a % b));
const isInt = (x: unknown): x is number => typeof x === 'number' && Number.isInteger(x);
const bad = (code: string, message: string): Result<never> => fail({ code, message });

/** Adds one z basepoint at the free vertex farthest from the curves, then validates. */
function finish(mesh: TriMesh, curves: { family: 'alpha' | 'beta'; index: number; vertices: ArrayLike<number> }[], extra: Basepoint[] = []): Result<HeegaardDiagram> {
  const ws = workspaceFrom(mesh, curves, extra);
  if (!ws.ok) return ws;
  if (extra.length === 0) ws.value.basepoints.push({ kind: 'z', index: 0, vertex: farthestFreeVertex(ws.value.em) });
  return closeDiagram(ws.value);
}

/**
 * alpha_1 = meridian u = 0, beta_1 = the (p, q) curve (gcd(|p|, |q|) = 1, p >= 0): they meet |p| times
 * transversally. (0, ±1) gives a parallel meridian (disjoint), (1, 0) a longitude. `resolution` is the
 * target number of grid steps around the shorter direction (default 32). O(|q| p M^2).
 */
export function torusCurveDiagram(p: number, q: number, resolution = 32): Result<HeegaardDiagram> {
  if (!isInt(p) || !isInt(q) || p < 0) return bad('bad-parameter', `p must be a whole number >= 0 and q a whole number (got p = ${p}, q = ${q})`);
  if (p > 200 || Math.abs(q) > 200) return bad('bad-parameter', 'p and q must be at most 200 in size');
  if (gcd(p, q) !== 1) return bad('bad-parameter', `a simple closed (p, q) curve needs gcd(p, q) = 1 (got gcd(${p}, ${q}) = ${gcd(p, q)})`);
  if (!isInt(resolution) || resolution < 8 || resolution > 512) return bad('bad-parameter', 'resolution must be a whole number from 8 to 512');
  if (p === 0 || q === 0) {
    const nu = 2 * resolution, nv = resolution;
    const alpha = Array.from({ length: nv }, (_, j) => torusGridVertex({ nu, nv }, 0, j));
    const beta = p === 0
      ? Array.from({ length: nv }, (_, j) => torusGridVertex({ nu, nv }, Math.floor(nu / 2), q * j))
      : Array.from({ length: nu }, (_, i) => torusGridVertex({ nu, nv }, i, Math.floor(nv / 2)));
    return finish(torusMesh(nu, nv), [{ family: 'alpha', index: 0, vertices: alpha }, { family: 'beta', index: 0, vertices: beta }]);
  }
  const aq = Math.abs(q), s = Math.sign(q);
  let M = Math.max(2, Math.ceil(resolution / aq), Math.ceil(resolution / (2 * p)));
  while (M > 2 && aq * p * M * M > 250_000) M--;
  const nu = aq * M, nv = p * M, o = { nu, nv };
  const alpha = Array.from({ length: nv }, (_, j) => torusGridVertex(o, 0, j));
  const beta = Array.from({ length: aq * p * M }, (_, k) => torusGridVertex(o, s * k, k));
  return finish(torusMesh(nu, nv, s < 0), [{ family: 'alpha', index: 0, vertices: alpha }, { family: 'beta', index: 0, vertices: beta }]);
}

/**
 * Genus-1 diagram of the lens space L(p, q): alpha the meridian, beta a (p, q) curve meeting it p times
 * (Ozsváth–Szabó 2004). 1 <= q < p <= 50 with gcd(p, q) = 1; p = 1 (q = 0 or 1) gives S^3.
 */
export function lensDiagram(p: number, q: number, resolution?: number): Result<HeegaardDiagram> {
  if (!isInt(p) || p < 1 || p > 50) return bad('bad-parameter', `p must be a whole number from 1 to 50 (got ${p})`);
  if (p === 1) {
    if (q !== 0 && q !== 1) return bad('bad-parameter', `L(1, q) needs q = 0 or 1 (got ${q}); every L(1, q) is S^3`);
    return torusCurveDiagram(1, 0, resolution);
  }
  if (!isInt(q) || q < 1 || q >= p) return bad('bad-parameter', `q must be a whole number with 1 <= q < p = ${p} (got ${q})`);
  if (gcd(p, q) !== 1) return bad('bad-parameter', `L(p, q) needs gcd(p, q) = 1 (got gcd(${p}, ${q}) = ${gcd(p, q)})`);
  return torusCurveDiagram(p, q, resolution);
}

/** Genus-1 S^1 x S^2: alpha the meridian, beta an isoline u = g(v) that wiggles across it twice (two bigons). */
export function s1xs2TorusDiagram(resolution = 32): Result<HeegaardDiagram> {
  if (!isInt(resolution) || resolution < 8 || resolution > 512) return bad('bad-parameter', 'resolution must be a whole number from 8 to 512');
  const nu = 2 * resolution, nv = resolution, o = { nu, nv };
  const mesh = torusMesh(nu, nv);
  const alpha = Array.from({ length: nv }, (_, j) => torusGridVertex(o, 0, j));
  const ws = workspaceFrom(mesh, [{ family: 'alpha', index: 0, vertices: alpha }], []);
  if (!ws.ok) return ws;
  const em = ws.value.em;
  const du = (2 * Math.PI) / nu, dv = (2 * Math.PI) / nv;
  // beta: u = A (1 - 2 bump(v)), bump peaking at v = pi; level shifted by a fraction of a step so no vertex sits on it.
  const A = Math.max(3.3 * du, 0.3);
  const phi = new Float64Array(em.nV);
  for (let i = 0; i < nu; i++) {
    for (let j = 0; j < nv; j++) {
      const u = i <= nu / 2 ? i * du : (i - nu) * du, v = j * dv + 0.37 * dv;
      const bump = ((1 + Math.cos(v - Math.PI)) / 2) ** 3;
      phi[torusGridVertex(o, i, j)] = Math.abs(u) < Math.PI / 2 ? u - A * (1 - 2 * bump) + 0.013 * du : NaN;
    }
  }
  const mark = insertZeroSet(em, phi);
  let start = -1;
  for (let v = 0; v < em.nV && start < 0; v++) if (mark[v]) start = v;
  ws.value.curves.push({ family: 'beta', index: 0, start });
  labelCycle(em, traceMarked(em, mark, start), 2);
  ws.value.basepoints.push({ kind: 'z', index: 0, vertex: farthestFreeVertex(em) });
  return closeDiagram(ws.value);
}

/** Checks that xs and os are permutations of 0..n-1 that never share a cell. */
function checkGrid(xs: unknown, os: unknown): string | null {
  if (!Array.isArray(xs) || !Array.isArray(os)) return 'x and o must be arrays of 0-based rows, one per column';
  const n = xs.length;
  if (os.length !== n) return `x has ${n} columns but o has ${os.length}`;
  if (n < 2 || n > 12) return `a grid needs 2 to 12 columns (got ${n})`;
  for (const [name, arr] of [['x', xs], ['o', os]] as const) {
    const seen = new Set<number>();
    for (let c = 0; c < n; c++) {
      const row = arr[c];
      if (!isInt(row) || row < 0 || row >= n) return `${name}[${c}] = ${String(row)} is not a row from 0 to ${n - 1}`;
      if (seen.has(row)) return `${name} is not a permutation: row ${row} appears twice`;
      seen.add(row);
    }
  }
  for (let c = 0; c < n; c++) if (xs[c] === os[c]) return `column ${c} has X and O in the same cell (row ${xs[c]})`;
  return null;
}

/**
 * n x n toroidal grid diagram (Manolescu–Ozsváth–Sarkar 2009): alpha_r the horizontal circle below row r,
 * beta_c the vertical circle left of column c, X markings as z basepoints and O markings as w basepoints
 * at cell centres (z_{c+1} and w_{c+1} sit in column c). `cell` grid steps per cell (even, default 4).
 */
export function gridDiagram(xs: number[], os: number[], cell = 4): Result<HeegaardDiagram> {
  const why = checkGrid(xs, os);
  if (why) return bad('bad-grid', why);
  if (!isInt(cell) || cell < 2 || cell % 2 !== 0 || cell > 32) return bad('bad-parameter', 'cell resolution must be an even whole number from 2 to 32');
  const n = xs.length, N = n * cell, o = { nu: N, nv: N }, h = cell / 2;
  const curves = [];
  for (let rI = 0; rI < n; rI++) curves.push({ family: 'alpha' as const, index: rI, vertices: Array.from({ length: N }, (_, i) => torusGridVertex(o, i, rI * cell)) });
  for (let c = 0; c < n; c++) curves.push({ family: 'beta' as const, index: c, vertices: Array.from({ length: N }, (_, j) => torusGridVertex(o, c * cell, j)) });
  const bps: Basepoint[] = [];
  for (let c = 0; c < n; c++) bps.push({ kind: 'z', index: c, vertex: torusGridVertex(o, c * cell + h, xs[c] * cell + h) });
  for (let c = 0; c < n; c++) bps.push({ kind: 'w', index: c, vertex: torusGridVertex(o, c * cell + h, os[c] * cell + h) });
  return finish(torusMesh(N, N), curves, bps);
}
