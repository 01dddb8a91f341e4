/**
 * Icosphere: the regular icosahedron, refined `level` times by midpoint 1->4 subdivision with every new
 * vertex pushed out to the unit sphere (common practice). Faces counter-clockwise seen from outside.
 * V = 10·4^level + 2, F = 20·4^level.
 */

/** Positions on the unit sphere and triangles of the icosphere. O(20·4^level). */
export function sphereMesh(level: number): { pos: Float64Array; tris: Int32Array } {
  if (!Number.isInteger(level) || level < 0 || level > 9) throw new RangeError('sphereMesh: level must be an integer 0..9');
  const t = (1 + Math.sqrt(5)) / 2;
  const base = [
    -1, t, 0, 1, t, 0, -1, -t, 0, 1, -t, 0, 0, -1, t, 0, 1, t, 0, -1, -t, 0, 1, -t, t, 0, -1, t, 0, 1, -t, 0, -1, -t, 0, 1,
  ];
  const faces = [
    0, 11, 5, 0, 5, 1, 0, 1, 7, 0, 7, 10, 0, 10, 11, 1, 5, 9, 5, 11, 4, 11, 10, 2, 10, 7, 6, 7, 1, 8,
    3, 9, 4, 3, 4, 2, 3, 2, 6, 3, 6, 8, 3, 8, 9, 4, 9, 5, 2, 4, 11, 6, 2, 10, 8, 6, 7, 9, 8, 1,
  ];
  const nVFinal = 10 * 4 ** level + 2;
  const pos = new Float64Array(3 * nVFinal);
  for (let i = 0; i < 12; i++) normalizeInto(pos, i, base[3 * i], base[3 * i + 1], base[3 * i + 2]);
  let tris = Int32Array.from(faces);
  let nV = 12;
  for (let l = 0; l < level; l++) {
    const mid = new Map<number, number>();
    const out = new Int32Array(tris.length * 4);
    const midpoint = (a: number, b: number): number => {
      const key = Math.min(a, b) * nVFinal + Math.max(a, b);
      let m = mid.get(key);
      if (m === undefined) {
        m = nV++;
        mid.set(key, m);
        normalizeInto(pos, m, pos[3 * a] + pos[3 * b], pos[3 * a + 1] + pos[3 * b + 1], pos[3 * a + 2] + pos[3 * b + 2]);
      }
      return m;
    };
    for (let f = 0; f < tris.length / 3; f++) {
      const a = tris[3 * f], b = tris[3 * f + 1], c = tris[3 * f + 2];
      const ab = midpoint(a, b), bc = midpoint(b, c), ca = midpoint(c, a);
      out.set([a, ab, ca, b, bc, ab, c, ca, bc, ab, bc, ca], 12 * f);
    }
    tris = out;
  }
  return { pos, tris };
}

function normalizeInto(pos: Float64Array, i: number, x: number, y: number, z: number): void {
  const r = Math.sqrt(x * x + y * y + z * z);
  pos[3 * i] = x / r; pos[3 * i + 1] = y / r; pos[3 * i + 2] = z / r;
}
