/**
 * Connected components of faces across edges that carry no curve of the chosen families: the regions of
 * a diagram (both families cut), or the pieces of the complement of one family (GEOMETRY.md, "Regions").
 */
import type { TriMesh } from '../mesh/tri-mesh.js';

/** Component label per face and the number of components. */
export interface FaceComponents {
  label: Int32Array;
  count: number;
  /** Faces per component. */
  faces: Int32Array;
  /** Lowest face of each component. */
  firstFace: Int32Array;
}

/**
 * Depth-first search over faces, crossing half-edge h only when its curve's family bit is not in mask
 * (familyBit: 1 alpha, 2 beta, per curve position; mask 3 cuts along both families). Components are
 * numbered in order of their lowest face. O(F), one Int32Array stack, no per-face objects.
 */
export function faceComponents(m: TriMesh, heCurve: Int32Array, familyBit: Uint8Array, mask: number): FaceComponents {
  const nF = m.nF;
  const label = new Int32Array(nF).fill(-1);
  const stack = new Int32Array(nF);
  const twin = m.heTwin;
  let count = 0;
  const sizes: number[] = [], firsts: number[] = [];
  for (let seed = 0; seed < nF; seed++) {
    if (label[seed] >= 0) continue;
    let top = 0, size = 0;
    stack[top++] = seed;
    label[seed] = count;
    while (top > 0) {
      const f = stack[--top];
      size++;
      for (let h = 3 * f; h < 3 * f + 3; h++) {
        const c = heCurve[h];
        if (c !== 0 && (mask === 3 || (familyBit[(c < 0 ? -c : c) - 1] & mask) !== 0)) continue;
        const t = twin[h];
        if (t < 0) continue;
        const g = (t / 3) | 0;
        if (label[g] < 0) { label[g] = count; stack[top++] = g; }
      }
    }
    sizes.push(size);
    firsts.push(seed);
    count++;
  }
  return { label, count, faces: Int32Array.from(sizes), firstFace: Int32Array.from(firsts) };
}
