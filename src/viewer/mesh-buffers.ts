/**
 * Pure buffer builders for the surface viewer: no three.js, no DOM, so they are unit-tested in Node and
 * cost nothing in the main chunk. All work is O(size of the mesh or curve) over typed arrays.
 *
 * Orientation: triangles are counter-clockwise seen from outside (DESIGN.md), so the area-weighted sum of
 * face normals at a vertex points outwards.
 */

/** Area-weighted vertex normals of an indexed triangle mesh. O(V + F). */
export function vertexNormals(positions: Float32Array, triangles: Uint32Array): Float32Array {
  const n = new Float32Array(positions.length);
  for (let f = 0; f < triangles.length; f += 3) {
    const a = triangles[f] * 3, b = triangles[f + 1] * 3, c = triangles[f + 2] * 3;
    const ux = positions[b] - positions[a], uy = positions[b + 1] - positions[a + 1], uz = positions[b + 2] - positions[a + 2];
    const vx = positions[c] - positions[a], vy = positions[c + 1] - positions[a + 1], vz = positions[c + 2] - positions[a + 2];
    // cross product has length 2·area: area weighting for free
    const nx = uy * vz - uz * vy, ny = uz * vx - ux * vz, nz = ux * vy - uy * vx;
    for (const i of [a, b, c]) { n[i] += nx; n[i + 1] += ny; n[i + 2] += nz; }
  }
  for (let i = 0; i < n.length; i += 3) {
    const l = Math.hypot(n[i], n[i + 1], n[i + 2]) || 1;
    n[i] /= l; n[i + 1] /= l; n[i + 2] /= l;
  }
  return n;
}

/** Non-indexed buffers: every face owns its three corners so each face can carry its own colour. */
export interface FaceSoup {
  /** 9 floats per face: the three corner positions. */
  positions: Float32Array;
  /** 9 floats per face: smooth vertex normals copied to the corners. */
  normals: Float32Array;
}

/** Unrolls an indexed mesh into per-corner buffers. O(F). */
export function faceSoup(positions: Float32Array, triangles: Uint32Array, normals: Float32Array): FaceSoup {
  const out = new Float32Array(triangles.length * 3);
  const nrm = new Float32Array(triangles.length * 3);
  for (let k = 0; k < triangles.length; k++) {
    const v = triangles[k] * 3;
    out[3 * k] = positions[v]; out[3 * k + 1] = positions[v + 1]; out[3 * k + 2] = positions[v + 2];
    nrm[3 * k] = normals[v]; nrm[3 * k + 1] = normals[v + 1]; nrm[3 * k + 2] = normals[v + 2];
  }
  return { positions: out, normals: nrm };
}

/**
 * Per-corner colours (9 floats per face). `vertexColors` (3 per vertex) wins over `faceColors`
 * (3 per face); with neither, every corner gets `base`. O(F).
 */
export function cornerColors(
  triangles: Uint32Array,
  base: readonly [number, number, number],
  faceColors?: Float32Array | null,
  vertexColors?: Float32Array | null,
): Float32Array {
  const out = new Float32Array(triangles.length * 3);
  for (let k = 0; k < triangles.length; k++) {
    const f = (k / 3) | 0;
    let r = base[0], g = base[1], b = base[2];
    if (vertexColors) {
      const v = triangles[k] * 3;
      r = vertexColors[v]; g = vertexColors[v + 1]; b = vertexColors[v + 2];
    } else if (faceColors) {
      r = faceColors[3 * f]; g = faceColors[3 * f + 1]; b = faceColors[3 * f + 2];
    }
    out[3 * k] = r; out[3 * k + 1] = g; out[3 * k + 2] = b;
  }
  return out;
}

/** Corner positions (9 floats per face) of the faces whose mask entry is nonzero, lifted by `lift` along the normals. O(F). */
export function maskedFaces(positions: Float32Array, triangles: Uint32Array, normals: Float32Array, mask: Uint8Array, lift: number): Float32Array {
  let count = 0;
  for (let f = 0; f < mask.length; f++) if (mask[f]) count++;
  const out = new Float32Array(count * 9);
  let o = 0;
  for (let f = 0; f < mask.length; f++) {
    if (!mask[f]) continue;
    for (let k = 0; k < 3; k++) {
      const v = triangles[3 * f + k] * 3;
      out[o++] = positions[v] + lift * normals[v];
      out[o++] = positions[v + 1] + lift * normals[v + 1];
      out[o++] = positions[v + 2] + lift * normals[v + 2];
    }
  }
  return out;
}

/** Centre of the axis-aligned bounding box and the largest distance of a vertex from it. O(V). */
export function boundingSphere(positions: Float32Array): { center: [number, number, number]; radius: number } {
  if (positions.length < 3) return { center: [0, 0, 0], radius: 1 };
  const lo = [Infinity, Infinity, Infinity], hi = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < positions.length; i += 3) {
    for (let d = 0; d < 3; d++) {
      const x = positions[i + d];
      if (x < lo[d]) lo[d] = x;
      if (x > hi[d]) hi[d] = x;
    }
  }
  const center: [number, number, number] = [(lo[0] + hi[0]) / 2, (lo[1] + hi[1]) / 2, (lo[2] + hi[2]) / 2];
  let r2 = 0;
  for (let i = 0; i < positions.length; i += 3) {
    const d = (positions[i] - center[0]) ** 2 + (positions[i + 1] - center[1]) ** 2 + (positions[i + 2] - center[2]) ** 2;
    if (d > r2) r2 = d;
  }
  return { center, radius: Math.sqrt(r2) || 1 };
}

/** Mean edge length over all face edges (each interior edge counted twice; fine for a scale). O(F). */
export function meanEdgeLength(positions: Float32Array, triangles: Uint32Array): number {
  if (triangles.length === 0) return 1;
  let sum = 0;
  for (let k = 0; k < triangles.length; k++) {
    const a = triangles[k] * 3;
    const b = triangles[k % 3 === 2 ? k - 2 : k + 1] * 3;
    sum += Math.hypot(positions[b] - positions[a], positions[b + 1] - positions[a + 1], positions[b + 2] - positions[a + 2]);
  }
  return sum / triangles.length;
}

/** Indexed tube geometry around a closed polyline. */
export interface TubeBuffers {
  positions: Float32Array;
  normals: Float32Array;
  indices: Uint32Array;
}

/**
 * A closed tube of `radius` around the cycle of mesh vertices `cycle`, lifted by `lift` along the surface
 * normal so it sits just above the surface. The ring frame at each vertex uses the surface normal
 * (made orthogonal to the tangent), so there is no seam twist on closed curves. O(|cycle| · sides).
 */
export function tubeAlongCycle(
  positions: Float32Array,
  normals: Float32Array,
  cycle: ArrayLike<number>,
  radius: number,
  lift: number,
  sides = 8,
): TubeBuffers {
  const n = cycle.length;
  const pos = new Float32Array(n * sides * 3);
  const nrm = new Float32Array(n * sides * 3);
  const idx = new Uint32Array(n * sides * 6);
  const P = (i: number, d: number) => {
    const v = cycle[((i % n) + n) % n] * 3;
    return positions[v + d] + lift * normals[v + d];
  };
  for (let i = 0; i < n; i++) {
    const v = cycle[i] * 3;
    let tx = P(i + 1, 0) - P(i - 1, 0), ty = P(i + 1, 1) - P(i - 1, 1), tz = P(i + 1, 2) - P(i - 1, 2);
    const tl = Math.hypot(tx, ty, tz) || 1;
    tx /= tl; ty /= tl; tz /= tl;
    let nx = normals[v], ny = normals[v + 1], nz = normals[v + 2];
    const dot = nx * tx + ny * ty + nz * tz;
    nx -= dot * tx; ny -= dot * ty; nz -= dot * tz;
    const nl = Math.hypot(nx, ny, nz) || 1;
    nx /= nl; ny /= nl; nz /= nl;
    const bx = ty * nz - tz * ny, by = tz * nx - tx * nz, bz = tx * ny - ty * nx;
    for (let s = 0; s < sides; s++) {
      const t = (2 * Math.PI * s) / sides, c = Math.cos(t), sn = Math.sin(t);
      const ox = c * nx + sn * bx, oy = c * ny + sn * by, oz = c * nz + sn * bz;
      const o = 3 * (i * sides + s);
      pos[o] = P(i, 0) + radius * ox; pos[o + 1] = P(i, 1) + radius * oy; pos[o + 2] = P(i, 2) + radius * oz;
      nrm[o] = ox; nrm[o + 1] = oy; nrm[o + 2] = oz;
    }
  }
  let k = 0;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    for (let s = 0; s < sides; s++) {
      const s2 = (s + 1) % sides;
      const a = i * sides + s, b = j * sides + s, c = j * sides + s2, d = i * sides + s2;
      idx[k++] = a; idx[k++] = b; idx[k++] = d;
      idx[k++] = b; idx[k++] = c; idx[k++] = d;
    }
  }
  return { positions: pos, normals: nrm, indices: idx };
}

/**
 * Barycentric coordinates of point p in triangle (a, b, c), clamped to be non-negative and renormalised
 * (a hit point from the ray caster lies in the triangle up to rounding). O(1).
 */
export function barycentric(
  p: readonly [number, number, number],
  a: readonly [number, number, number],
  b: readonly [number, number, number],
  c: readonly [number, number, number],
): [number, number, number] {
  const v0 = [b[0] - a[0], b[1] - a[1], b[2] - a[2]];
  const v1 = [c[0] - a[0], c[1] - a[1], c[2] - a[2]];
  const v2 = [p[0] - a[0], p[1] - a[1], p[2] - a[2]];
  const d00 = v0[0] * v0[0] + v0[1] * v0[1] + v0[2] * v0[2];
  const d01 = v0[0] * v1[0] + v0[1] * v1[1] + v0[2] * v1[2];
  const d11 = v1[0] * v1[0] + v1[1] * v1[1] + v1[2] * v1[2];
  const d20 = v2[0] * v0[0] + v2[1] * v0[1] + v2[2] * v0[2];
  const d21 = v2[0] * v1[0] + v2[1] * v1[1] + v2[2] * v1[2];
  const den = d00 * d11 - d01 * d01;
  if (Math.abs(den) < 1e-30) return [1 / 3, 1 / 3, 1 / 3];
  let v = (d11 * d20 - d01 * d21) / den;
  let w = (d00 * d21 - d01 * d20) / den;
  let u = 1 - v - w;
  u = Math.max(0, u); v = Math.max(0, v); w = Math.max(0, w);
  const s = u + v + w || 1;
  return [u / s, v / s, w / s];
}

/** Centroid of face f. O(1). */
export function faceCentroid(positions: Float32Array, triangles: Uint32Array, f: number): [number, number, number] {
  const a = triangles[3 * f] * 3, b = triangles[3 * f + 1] * 3, c = triangles[3 * f + 2] * 3;
  return [
    (positions[a] + positions[b] + positions[c]) / 3,
    (positions[a + 1] + positions[b + 1] + positions[c + 1]) / 3,
    (positions[a + 2] + positions[b + 2] + positions[c + 2]) / 3,
  ];
}

/** Unit normal of face f (counter-clockwise orientation). O(1). */
export function faceNormal(positions: Float32Array, triangles: Uint32Array, f: number): [number, number, number] {
  const a = triangles[3 * f] * 3, b = triangles[3 * f + 1] * 3, c = triangles[3 * f + 2] * 3;
  const ux = positions[b] - positions[a], uy = positions[b + 1] - positions[a + 1], uz = positions[b + 2] - positions[a + 2];
  const vx = positions[c] - positions[a], vy = positions[c + 1] - positions[a + 1], vz = positions[c + 2] - positions[a + 2];
  const nx = uy * vz - uz * vy, ny = uz * vx - ux * vz, nz = ux * vy - uy * vx;
  const l = Math.hypot(nx, ny, nz) || 1;
  return [nx / l, ny / l, nz / l];
}
