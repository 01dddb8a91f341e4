/** Small vector maths on flat Float64Array position buffers (3 numbers per vertex). No allocation in hot paths. */

/** Angle at vertex b of the triangle (a, b, c), by atan2(|u x v|, u . v): stable near 0 and pi. O(1). */
export function cornerAngle(pos: Float64Array, a: number, b: number, c: number): number {
  const bx = pos[3 * b], by = pos[3 * b + 1], bz = pos[3 * b + 2];
  const ux = pos[3 * a] - bx, uy = pos[3 * a + 1] - by, uz = pos[3 * a + 2] - bz;
  const vx = pos[3 * c] - bx, vy = pos[3 * c + 1] - by, vz = pos[3 * c + 2] - bz;
  const cx = uy * vz - uz * vy, cy = uz * vx - ux * vz, cz = ux * vy - uy * vx;
  return Math.atan2(Math.sqrt(cx * cx + cy * cy + cz * cz), ux * vx + uy * vy + uz * vz);
}

/** Squared distance between vertices a and b. O(1). */
export function dist2(pos: Float64Array, a: number, b: number): number {
  const dx = pos[3 * a] - pos[3 * b], dy = pos[3 * a + 1] - pos[3 * b + 1], dz = pos[3 * a + 2] - pos[3 * b + 2];
  return dx * dx + dy * dy + dz * dz;
}

/** Twice the area of triangle (a, b, c). O(1). */
export function doubleArea(pos: Float64Array, a: number, b: number, c: number): number {
  const ux = pos[3 * b] - pos[3 * a], uy = pos[3 * b + 1] - pos[3 * a + 1], uz = pos[3 * b + 2] - pos[3 * a + 2];
  const vx = pos[3 * c] - pos[3 * a], vy = pos[3 * c + 1] - pos[3 * a + 1], vz = pos[3 * c + 2] - pos[3 * a + 2];
  const cx = uy * vz - uz * vy, cy = uz * vx - ux * vz, cz = ux * vy - uy * vx;
  return Math.sqrt(cx * cx + cy * cy + cz * cz);
}
