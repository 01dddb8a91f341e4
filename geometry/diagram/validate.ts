/**
 * Curve validation of a Heegaard diagram on a closed oriented triangle mesh (DESIGN.md "Geometry
 * conventions"; the count rules of Ozsváth–Szabó 2004 §2 and Manolescu–Ozsváth–Sarkar 2009 for
 * multi-pointed diagrams). Every message names curves 1-based (alpha_1) and vertices by file number.
 */
import type { Problem } from '../base/result.js';
import { eulerCharacteristic, prev, type TriMesh } from '../mesh/tri-mesh.js';
import { curveNameAt, labelCurveEdges, type CurveLabels } from './curve-edges.js';
import { faceComponents, type FaceComponents } from './face-components.js';
import { vertexLabel, type HeegaardDiagram } from './types.js';

/** Everything validation learned, reused by the analysis so nothing is computed twice. */
export interface CurveCheck {
  labels: CurveLabels;
  problems: Problem[];
  genus: number;
  /** Number of alpha curves (= beta curves when valid). */
  k: number;
  /** Regions of Σ ∖ (α ∪ β), when the curves lie on the mesh without structural problems. */
  regions?: FaceComponents;
}

/** Families of the curve half-edges around v, counter-clockwise (1 alpha, 2 beta). O(degree). */
function curveFamiliesAround(m: TriMesh, L: CurveLabels, v: number): number[] {
  const out: number[] = [];
  const first = m.vertHe[v];
  let h = first;
  let steps = 0;
  do {
    const c = L.heCurve[h];
    if (c !== 0) out.push(L.familyBit[Math.abs(c) - 1]);
    h = m.heTwin[prev(h)];
  } while (h >= 0 && h !== first && ++steps < 100000);
  return out;
}

/** Checks every vertex where two or more curves meet: one alpha, one beta, crossing transversally. */
function checkCrossings(d: HeegaardDiagram, L: CurveLabels, problems: Problem[]): void {
  const m = d.mesh;
  for (const [v, list] of L.crowded) {
    const lab = vertexLabel(d, v);
    const names = list.map((c) => curveNameAt(d, c));
    problems.push({ code: 'too-many-curves-at-vertex', message: `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]} all pass through vertex ${lab}; at most one alpha and one beta curve may meet at a vertex`, vertices: [lab] });
  }
  for (let i = 0; i < L.curveHe.length; i++) {
    const v = m.heVert[L.curveHe[i]];
    const a = L.vertCurveA[v], b = L.vertCurveB[v];
    if (b < 0 || a !== Math.abs(L.heCurve[L.curveHe[i]]) - 1 || L.crowded.has(v)) continue;
    const lab = vertexLabel(d, v);
    const na = curveNameAt(d, a), nb = curveNameAt(d, b);
    if (L.familyBit[a] === L.familyBit[b]) {
      problems.push({ code: 'same-family-curves-meet', message: `${na} and ${nb} meet at vertex ${lab}; the ${d.curves[a].family} curves must be pairwise disjoint`, vertices: [lab] });
      continue;
    }
    const fam = curveFamiliesAround(m, L, v);
    if (fam.length !== 4) continue; // an edge problem, already reported by labelCurveEdges
    if (fam[0] === fam[1] || fam[1] === fam[2]) {
      const [alpha, beta] = L.familyBit[a] === 1 ? [na, nb] : [nb, na];
      problems.push({ code: 'tangency', message: `${alpha} and ${beta} touch at vertex ${lab} without crossing (a tangency: around the vertex the curves come in the order alpha, alpha, beta, beta); an alpha and a beta curve must cross transversally, alternating alpha, beta, alpha, beta`, vertices: [lab] });
    }
  }
}

/** Curve numbering: alpha_1..alpha_k and beta_1..beta_k, each once. */
function checkNumbering(d: HeegaardDiagram, problems: Problem[]): { nA: number; nB: number } {
  let nA = 0, nB = 0;
  for (const fam of ['alpha', 'beta'] as const) {
    const idx = d.curves.filter((c) => c.family === fam).map((c) => c.index).sort((x, y) => x - y);
    if (fam === 'alpha') nA = idx.length; else nB = idx.length;
    for (let i = 0; i < idx.length; i++) {
      if (idx[i] !== i) {
        problems.push({ code: 'curve-numbering', message: `the ${fam} curves are numbered ${idx.map((x) => `${fam}_${x + 1}`).join(', ')}; they must be ${fam}_1 to ${fam}_${idx.length}, each once` });
        break;
      }
    }
  }
  return { nA, nB };
}

/** Basepoints must be vertices of the surface off every curve. */
function checkBasepointPlaces(d: HeegaardDiagram, L: CurveLabels, problems: Problem[]): void {
  const m = d.mesh;
  for (const p of d.basepoints) {
    const name = `${p.kind}_${p.index + 1}`;
    if (!(p.vertex >= 0 && p.vertex < m.nV) || m.vertHe[p.vertex] < 0) {
      problems.push({ code: 'basepoint-missing', message: `basepoint ${name} is at vertex ${p.vertex + 1}, which is not a vertex of the surface` });
      continue;
    }
    const c = L.vertCurveA[p.vertex];
    if (c >= 0) {
      const lab = vertexLabel(d, p.vertex);
      problems.push({ code: 'basepoint-on-curve', message: `basepoint ${name} sits at vertex ${lab} on ${curveNameAt(d, c)}; basepoints must lie off the curves`, vertices: [lab] });
    }
  }
}

/** A vertex of face f, by file number, to name a piece of the surface. */
const faceVertexLabel = (d: HeegaardDiagram, f: number): number => vertexLabel(d, d.mesh.heVert[3 * f]);

/**
 * Pieces of Σ minus one family, as a piece number per region: regions joined across the other family's
 * edges (union–find over regions, Tarjan 1975). O(curve edges + regions).
 */
function piecesOfRegions(d: HeegaardDiagram, L: CurveLabels, regions: FaceComponents, famBit: number): { piece: Int32Array; count: number } {
  const parent = Int32Array.from({ length: regions.count }, (_, i) => i);
  const find = (x: number): number => {
    while (parent[x] !== x) { parent[x] = parent[parent[x]]; x = parent[x]; }
    return x;
  };
  const m = d.mesh;
  for (let i = 0; i < L.curveHe.length; i++) {
    const h = L.curveHe[i];
    if (L.familyBit[L.heCurve[h] - 1] === famBit) continue;
    const a = find(regions.label[(h / 3) | 0]), b = find(regions.label[(m.heTwin[h] / 3) | 0]);
    if (a !== b) parent[Math.max(a, b)] = Math.min(a, b);
  }
  const piece = new Int32Array(regions.count).fill(-1);
  let count = 0;
  for (let r = 0; r < regions.count; r++) {
    const root = find(r);
    piece[r] = root === r ? count++ : piece[root];
  }
  return { piece, count };
}

/**
 * Count rules for one family: Σ minus the family has k - g + 1 pieces and each piece holds exactly one
 * z basepoint (and one w basepoint when w basepoints are given) [Ozsváth–Szabó 2004; MOS 2009].
 * Pieces of a closed surface cut along k disjoint circles number 1 + k - g + Σ genus(piece), so too many
 * pieces means some piece keeps a handle.
 */
function checkFamilyPieces(d: HeegaardDiagram, L: CurveLabels, regions: FaceComponents, fam: 'alpha' | 'beta', k: number, g: number, problems: Problem[]): void {
  const m = d.mesh;
  const parts = piecesOfRegions(d, L, regions, fam === 'alpha' ? 1 : 2);
  const want = k - g + 1;
  if (parts.count !== want) {
    problems.push({ code: 'family-does-not-cut', message: `the ${fam} curves cut the surface into ${parts.count} piece${parts.count === 1 ? '' : 's'}, but with k = ${k} curves on a genus-${g} surface there must be k - g + 1 = ${want}: some piece still carries a handle, so the ${fam} curves do not bound a handlebody` });
    return;
  }
  const firstFace = new Int32Array(parts.count).fill(-1);
  for (let r = 0; r < regions.count; r++) if (firstFace[parts.piece[r]] < 0) firstFace[parts.piece[r]] = regions.firstFace[r];
  for (const kind of ['z', 'w'] as const) {
    const pts = d.basepoints.filter((p) => p.kind === kind && p.vertex >= 0 && p.vertex < m.nV && m.vertHe[p.vertex] >= 0 && L.vertCurveA[p.vertex] < 0);
    if (kind === 'w' && pts.length === 0) continue;
    const held: string[][] = Array.from({ length: parts.count }, () => []);
    for (const p of pts) held[parts.piece[regions.label[(m.vertHe[p.vertex] / 3) | 0]]].push(`${kind}_${p.index + 1}`);
    held.forEach((names, i) => {
      if (names.length === 1) return;
      const where = `the piece of the surface cut along the ${fam} curves that contains vertex ${faceVertexLabel(d, firstFace[i])}`;
      problems.push({ code: names.length === 0 ? 'piece-without-basepoint' : 'piece-with-several-basepoints', message: names.length === 0 ? `${where} holds no ${kind} basepoint; each piece must hold exactly one` : `${where} holds ${names.length} ${kind} basepoints (${names.join(', ')}); each piece must hold exactly one` });
    });
  }
}

/** Full curve check, keeping the labels for the analysis. O(F + total curve length x degree). */
export function checkCurves(d: HeegaardDiagram): CurveCheck {
  const m = d.mesh;
  const L = labelCurveEdges(d);
  const problems = L.problems;
  for (let h = 0; h < 3 * m.nF; h++) {
    if (m.heTwin[h] >= 0) continue;
    problems.unshift({ code: 'surface-not-closed', message: 'the surface has an open boundary or a non-manifold edge; a Heegaard surface must be closed' });
    break;
  }
  const chi = eulerCharacteristic(m);
  const genus = (2 - chi) / 2;
  const { nA, nB } = checkNumbering(d, problems);
  checkCrossings(d, L, problems);
  checkBasepointPlaces(d, L, problems);
  const k = nA;
  if (problems.length > 0) return { labels: L, problems, genus, k };
  if (nA !== nB) {
    problems.push({ code: 'curve-count', message: `the diagram has ${nA} alpha curve${nA === 1 ? '' : 's'} and ${nB} beta curve${nB === 1 ? '' : 's'}; a Heegaard diagram has as many alpha as beta curves` });
  } else if (k < genus) {
    problems.push({ code: 'too-few-curves', message: `the surface has genus ${genus} but the diagram has only ${k} alpha and ${k} beta curve${k === 1 ? '' : 's'}; a Heegaard diagram needs at least g = ${genus} of each` });
  }
  const regions = faceComponents(m, L.heCurve, L.familyBit, 3);
  if (problems.length === 0) {
    checkFamilyPieces(d, L, regions, 'alpha', k, genus, problems);
    checkFamilyPieces(d, L, regions, 'beta', k, genus, problems);
  }
  return { labels: L, problems, genus, k, regions };
}

/**
 * Checks the curves and basepoints of a diagram on a closed, connected, oriented surface mesh (the mesh
 * itself is checked by the mesh validation). Returns [] when the diagram is a valid Heegaard diagram.
 * O(F + total curve length x vertex degree).
 */
export function validateCurves(d: HeegaardDiagram): Problem[] {
  return checkCurves(d).problems;
}
