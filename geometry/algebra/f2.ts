/**
 * Linear algebra over F2. Sparse matrices are given column by column as sorted row lists; the rank is computed
 * by the standard column reduction with a pivot lookup by lowest row (Edelsbrunner–Letscher–Zomorodian 2002,
 * "Topological persistence and simplification", §4; Edelsbrunner–Harer 2010, Computational Topology, §VII.1).
 * Dense rows use 32-bit word bitsets (Gaussian elimination).
 */

/** A sparse 0/1 matrix in compressed columns: rows of column j are rowIdx[colStart[j] .. colStart[j+1]), sorted ascending. */
export interface SparseF2 {
  rows: number;
  cols: number;
  colStart: Int32Array;
  rowIdx: Int32Array;
}

/** Symmetric difference of two sorted Int32 lists into a fresh sorted list. O(|a| + |b|) */
function xorSorted(a: Int32Array, b: Int32Array): Int32Array {
  const out = new Int32Array(a.length + b.length);
  let i = 0, j = 0, k = 0;
  while (i < a.length && j < b.length) {
    const x = a[i], y = b[j];
    if (x < y) { out[k++] = x; i++; } else if (y < x) { out[k++] = y; j++; } else { i++; j++; }
  }
  while (i < a.length) out[k++] = a[i++];
  while (j < b.length) out[k++] = b[j++];
  return out.subarray(0, k);
}

/**
 * Rank over F2 by column reduction with pivot lookup (ELZ 2002): each column is reduced by the stored reduced
 * column owning its lowest row until its lowest row is new or it is empty. Worst case O(cols * rows * fill),
 * in practice near-linear on sparse complexes. Rows should be numbered so that fill-in stays low (e.g. by
 * grading). `onProgress` gets the fraction of columns done.
 */
export function rankF2(m: SparseF2, onProgress?: (fraction: number) => void): number {
  return reduceF2(m, null, onProgress).rank;
}

/**
 * Column reduction as in rankF2, skipping the columns flagged in `skip` and returning the lowest row of every
 * surviving column. With chain complexes (∂∂ = 0), the pivot rows of ∂_{d+1} are columns of ∂_d that reduce
 * to zero, so they may be skipped ("clearing", Chen–Kerber 2011, Persistent homology computation with a twist).
 */
export function reduceF2(m: SparseF2, skip: Uint8Array | null, onProgress?: (fraction: number) => void): { rank: number; pivotRows: Int32Array } {
  const owner = new Int32Array(m.rows).fill(-1);
  const reduced: (Int32Array | null)[] = new Array(m.cols).fill(null);
  const pivots: number[] = [];
  const every = Math.max(1, Math.floor(m.cols / 50));
  for (let j = 0; j < m.cols; j++) {
    if (skip && skip[j]) continue;
    let col: Int32Array = m.rowIdx.subarray(m.colStart[j], m.colStart[j + 1]);
    while (col.length > 0) {
      const low = col[col.length - 1];
      const o = owner[low];
      if (o < 0) {
        owner[low] = j;
        reduced[j] = col; // input subarrays are never written: xorSorted always allocates
        pivots.push(low);
        break;
      }
      col = xorSorted(col, reduced[o] as Int32Array);
    }
    if (onProgress && j % every === 0) onProgress(j / m.cols);
  }
  return { rank: pivots.length, pivotRows: Int32Array.from(pivots) };
}

/** Builds a SparseF2 from (row, col) pairs; repeated pairs cancel mod 2. O(E log E) */
export function sparseF2FromPairs(rows: number, cols: number, rowOf: Int32Array, colOf: Int32Array, count = rowOf.length): SparseF2 {
  const colStart = new Int32Array(cols + 1);
  for (let e = 0; e < count; e++) colStart[colOf[e] + 1]++;
  for (let j = 0; j < cols; j++) colStart[j + 1] += colStart[j];
  const fill = colStart.slice(0, cols);
  const tmp = new Int32Array(count);
  for (let e = 0; e < count; e++) tmp[fill[colOf[e]]++] = rowOf[e];
  const out = new Int32Array(count);
  const outStart = new Int32Array(cols + 1);
  let k = 0;
  for (let j = 0; j < cols; j++) {
    const seg = tmp.subarray(colStart[j], colStart[j + 1]).sort();
    for (let i = 0; i < seg.length; ) {
      let e = i;
      while (e < seg.length && seg[e] === seg[i]) e++;
      if ((e - i) & 1) out[k++] = seg[i];
      i = e;
    }
    outStart[j + 1] = k;
  }
  return { rows, cols, colStart: outStart, rowIdx: out.slice(0, k) };
}

/** Rank over F2 of dense rows given as bitsets of `words` 32-bit words each, by Gaussian elimination. O(rows^2 * words) */
export function rankF2Dense(rowBits: Uint32Array[], words: number): number {
  const rows = rowBits.map((r) => r.slice());
  let rank = 0;
  for (let w = 0; w < words; w++) {
    for (let b = 0; b < 32; b++) {
      const mask = (1 << b) >>> 0;
      const p = rows.findIndex((r, i) => i >= rank && (r[w] & mask) !== 0);
      if (p < 0) continue;
      [rows[rank], rows[p]] = [rows[p], rows[rank]];
      const pr = rows[rank];
      for (let i = 0; i < rows.length; i++) {
        if (i !== rank && (rows[i][w] & mask) !== 0) for (let x = w; x < words; x++) rows[i][x] ^= pr[x];
      }
      rank++;
    }
  }
  return rank;
}
