/**
 * Weak admissibility (Ozsváth–Szabó 2004, Definition 4.10): every non-zero periodic domain has both positive and
 * negative coefficients. With a periodic basis P_1..P_b (an injective map c -> Σ c_k P_k), the diagram fails
 * exactly when the cone {c : Σ c_k P_k >= 0} is not {0}; since the map is injective this is the feasibility of
 *   Σ c_k P_k >= 0 (one inequality per region),  Σ_r (Σ c_k P_k)_r = 1,
 * decided exactly by Fourier–Motzkin elimination over BigInt (Schrijver 1986, Theory of Linear and Integer
 * Programming, §12.2), with back-substitution giving an offending periodic domain. The elimination is
 * exponential in b in the worst case; b = b_1(Y) is small for diagrams drawn by hand, and a cap returns
 * "undecided" instead of running away.
 */
import { absBig, gcdBig } from '../algebra/integer-matrix.js';

/** a · c + a0 >= 0; coefs has one entry per variable. */
interface Ineq { coefs: bigint[]; a0: bigint }

interface Frac { n: bigint; d: bigint }
const frac = (n: bigint, d: bigint): Frac => {
  if (d < 0n) { n = -n; d = -d; }
  const g = gcdBig(n, d) || 1n;
  return { n: n / g, d: d / g };
};

function normalize(q: Ineq): Ineq {
  let g = absBig(q.a0);
  for (const c of q.coefs) g = gcdBig(g, c);
  if (g <= 1n) return q;
  return { coefs: q.coefs.map((c) => c / g), a0: q.a0 / g };
}

/** One Fourier–Motzkin step eliminating variable v; null when the constraint count passes the cap. */
function eliminate(sys: Ineq[], v: number, cap: number): Ineq[] | null {
  const pos = sys.filter((q) => q.coefs[v] > 0n), neg = sys.filter((q) => q.coefs[v] < 0n);
  const out = new Map<string, Ineq>();
  const add = (q: Ineq) => {
    const n = normalize(q);
    if (n.coefs.every((c) => c === 0n) && n.a0 >= 0n) return; // trivially true
    out.set(`${n.coefs.join(',')}|${n.a0}`, n);
  };
  for (const q of sys) if (q.coefs[v] === 0n) add(q);
  for (const p of pos) {
    for (const q of neg) {
      const a = p.coefs[v], b = -q.coefs[v];
      add({ coefs: p.coefs.map((c, i) => b * c + a * q.coefs[i]), a0: b * p.a0 + a * q.a0 });
      if (out.size > cap) return null;
    }
  }
  return [...out.values()];
}

/** Value for variable v satisfying every constraint of sys given the other values (all assigned or zero). */
function pick(sys: Ineq[], v: number, val: Frac[]): Frac {
  let lo: Frac | null = null, hi: Frac | null = null;
  for (const q of sys) {
    const a = q.coefs[v];
    if (a === 0n) continue;
    // rest = a0 + Σ_{j≠v} coefs_j val_j as a fraction
    let rn = q.a0, rd = 1n;
    q.coefs.forEach((c, j) => { if (j !== v && c !== 0n) { rn = rn * val[j].d + c * val[j].n * rd; rd *= val[j].d; } });
    const bound = frac(-rn, rd * a); // a > 0: c_v >= bound; a < 0: c_v <= bound
    if (a > 0n) { if (!lo || bound.n * lo.d > lo.n * bound.d) lo = bound; } else if (!hi || bound.n * hi.d < hi.n * bound.d) hi = bound;
  }
  return lo ?? hi ?? { n: 0n, d: 1n };
}

/**
 * Fourier–Motzkin version of nonNegativePeriodic (exponential in b; kept as an independent cross-check for
 * small b): a non-zero periodic domain with all coefficients >= 0, null when none exists, or 'undecided' when
 * elimination exceeds `cap` constraints.
 */
export function nonNegativePeriodicFM(basis: Int32Array[], cap = 200_000): Int32Array | null | 'undecided' {
  const b = basis.length;
  if (b === 0) return null;
  const R = basis[0].length;
  const s = basis.map((P) => P.reduce((x, y) => x + y, 0));
  const k0 = s.findIndex((v) => v !== 0);
  if (k0 < 0) return null; // Σ coefficients vanishes on the whole lattice: P >= 0 forces P = 0
  const sk = BigInt(s[k0]), sg = sk > 0n ? 1n : -1n;
  const vars = [...Array(b).keys()].filter((k) => k !== k0);
  let sys: Ineq[] = [];
  for (let r = 0; r < R; r++) {
    const a = basis.map((P) => BigInt(P[r]));
    if (a.every((x) => x === 0n)) continue;
    sys.push(normalize({ coefs: vars.map((j) => sg * (a[j] * sk - a[k0] * BigInt(s[j]))), a0: sg * a[k0] }));
  }
  const stages: Ineq[][] = [sys];
  for (let v = 0; v < vars.length; v++) {
    const next = eliminate(sys, v, cap);
    if (!next) return 'undecided';
    sys = next;
    stages.push(sys);
  }
  if (sys.some((q) => q.a0 < 0n)) return null;
  const val: Frac[] = vars.map(() => ({ n: 0n, d: 1n }));
  for (let v = vars.length - 1; v >= 0; v--) val[v] = pick(stages[v], v, val);
  // c_{k0} = (1 - Σ s_j c_j) / s_{k0}
  let rn = 1n, rd = 1n;
  vars.forEach((j, v) => { rn = rn * val[v].d - BigInt(s[j]) * val[v].n * rd; rd *= val[v].d; });
  const c: Frac[] = new Array(b);
  c[k0] = frac(rn, rd * sk);
  vars.forEach((j, v) => { c[j] = val[v]; });
  let lcm = 1n;
  for (const f of c) lcm = (lcm / (gcdBig(lcm, f.d) || 1n)) * f.d;
  const out = new Array<bigint>(R).fill(0n);
  c.forEach((f, k) => { const m = (f.n * lcm) / f.d; if (m !== 0n) basis[k].forEach((x, r) => { out[r] += m * BigInt(x); }); });
  let g = 0n;
  for (const x of out) g = gcdBig(g, x);
  return Int32Array.from(out, (x) => Number(g > 1n ? x / g : x));
}
