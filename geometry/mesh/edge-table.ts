/**
 * Undirected edges of a triangle list, as a CSR table grouped by the smaller endpoint. Used by surface
 * validation when the directed-edge twins alone cannot say what is wrong (boundaries, non-manifold edges,
 * flipped triangles). Typed arrays only; O(H + sum over vertices of squared degree).
 */

export interface EdgeTable {
  /** Number of undirected edges. */
  nE: number;
  /** Undirected edge of each half-edge, or -1 for a loop a->a (a degenerate triangle). */
  edgeOf: Int32Array;
  /** Half-edges of edge e are list[start[e]] .. list[start[e + 1] - 1], in increasing order. */
  start: Int32Array;
  list: Int32Array;
}

/** Builds the edge table for the first nH half-edges of heVert over nV vertices. O(H + sum deg^2). */
export function buildEdgeTable(heVert: Int32Array, nH: number, nV: number): EdgeTable {
  const tip = new Int32Array(nH);
  for (let h = 0; h < nH; h++) tip[h] = heVert[h % 3 === 2 ? h - 2 : h + 1];
  const lo = new Int32Array(nV + 1);
  for (let h = 0; h < nH; h++) {
    const a = heVert[h], b = tip[h];
    if (a !== b) lo[(a < b ? a : b) + 1]++;
  }
  for (let v = 0; v < nV; v++) lo[v + 1] += lo[v];
  const fill = lo.slice(0, nV);
  const byLo = new Int32Array(lo[nV]), hiOf = new Int32Array(lo[nV]);
  for (let h = 0; h < nH; h++) {
    const a = heVert[h], b = tip[h];
    if (a === b) continue;
    const i = fill[a < b ? a : b]++;
    byLo[i] = h; hiOf[i] = a < b ? b : a;
  }
  const edgeOf = new Int32Array(nH).fill(-1);
  let nE = 0;
  for (let v = 0; v < nV; v++) {
    const end = lo[v + 1];
    for (let i = lo[v]; i < end; i++) {
      const h = byLo[i];
      if (edgeOf[h] >= 0) continue;
      const e = nE++, hi = hiOf[i];
      edgeOf[h] = e;
      for (let j = i + 1; j < end; j++) if (hiOf[j] === hi) edgeOf[byLo[j]] = e;
    }
  }
  const start = new Int32Array(nE + 1);
  for (let h = 0; h < nH; h++) if (edgeOf[h] >= 0) start[edgeOf[h] + 1]++;
  for (let e = 0; e < nE; e++) start[e + 1] += start[e];
  const pos = start.slice(0, nE);
  const list = new Int32Array(start[nE]);
  for (let h = 0; h < nH; h++) if (edgeOf[h] >= 0) list[pos[edgeOf[h]]++] = h;
  return { nE, edgeOf, start, list };
}
