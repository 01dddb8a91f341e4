import { describe, expect, it } from 'vitest';
import {
  classesAndGradings, combinatorialKnotGrid, domainLattice, floerSummary, generatorTable,
} from '../../geometry/index.js';

// Grid gradings of Manolescu–Ozsváth–Sarkar 2009 (REFERENCE.md, "Grid diagrams"): points and markings in the
// fundamental square [0, n)^2; generator x = {(c, σ(c))}; markings at half-integer points.
type Pt = [number, number];
const I = (A: Pt[], B: Pt[]) => { let s = 0; for (const a of A) for (const b of B) if (a[0] < b[0] && a[1] < b[1]) s++; return s; };
const J = (A: Pt[], B: Pt[]) => (I(A, B) + I(B, A)) / 2;
const M = (x: Pt[], O: Pt[]) => J(x, x) - 2 * J(x, O) + J(O, O) + 1;

function gradings(xs: number[], os: number[], x: Pt[]): { m: number; a: number } {
  const n = xs.length;
  const X: Pt[] = xs.map((r, c) => [c + 0.5, r + 0.5]), O: Pt[] = os.map((r, c) => [c + 0.5, r + 0.5]);
  const mO = M(x, O), mX = M(x, X);
  return { m: mO, a: (mO - mX) / 2 - (n - 1) / 2 };
}

const XS = [1, 2, 3, 4, 0], OS = [4, 0, 1, 2, 3]; // REFERENCE.md trefoil check values

describe('the 5x5 trefoil grid (MOS 2009; REFERENCE.md check values)', () => {
  const c = combinatorialKnotGrid(XS, OS);
  const T = generatorTable(c, 120);
  const CG = classesAndGradings(domainLattice(c, 'all'), T.gens, T.count);
  const pts = (g: number): Pt[] => Array.from(T.gens.subarray(g * 5, g * 5 + 5), (p) => [c.points[p].beta, c.points[p].alpha]);
  const abs = Array.from({ length: T.count }, (_, g) => gradings(XS, OS, pts(g)));

  it('gives every spin^c class of the all-markings lattice one Alexander grading, and μ the Maslov grading M_O up to a shift', () => {
    const shift = new Map<number, number>(), alex = new Map<number, number>();
    for (let g = 0; g < T.count; g++) {
      const k = CG.classOf[g];
      if (!shift.has(k)) { shift.set(k, abs[g].m - CG.grading[g]); alex.set(k, abs[g].a); }
      expect(abs[g].m - CG.grading[g]).toBe(shift.get(k));
      expect(abs[g].a).toBe(alex.get(k));
    }
  });

  it('gives HFK-hat of rank 3 in (Maslov, Alexander) = (2,1), (1,0), (0,-1): tilde = HFK-hat ⊗ V^4, V = F(0,0) ⊕ F(-1,-1)', () => {
    const s = floerSummary(c, { blocked: 'all' });
    const tilde = new Map<string, number>();
    for (const cls of s.hfHat!.bySpinc) {
      const root = abs[cls.root];
      for (const { grading, rawRank } of cls.byGrading) {
        const key = `${root.m + grading - CG.grading[cls.root]},${root.a}`;
        tilde.set(key, (tilde.get(key) ?? 0) + rawRank);
      }
    }
    // expected tilde ranks: Σ over HFK-hat generators (m, a) and subsets of the 4 V factors
    const expected = new Map<string, number>();
    for (const [m, a] of [[2, 1], [1, 0], [0, -1]]) {
      for (let j = 0; j <= 4; j++) {
        const key = `${m - j},${a - j}`;
        expected.set(key, (expected.get(key) ?? 0) + [1, 4, 6, 4, 1][j]);
      }
    }
    expect(new Map([...tilde].filter(([, v]) => v > 0))).toEqual(expected);
  });
});
