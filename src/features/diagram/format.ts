/** Names and numbers as users see them: α₁, x₃, R₂, exact quarters as fractions, TeX for KaTeX. */

const SUB = '₀₁₂₃₄₅₆₇₈₉';

/** 12 → '₁₂'. */
export const subscript = (n: number): string => String(n).split('').map((d) => SUB[Number(d)] ?? d).join('');

/** alpha, 0 → α₁. */
export const curveLabel = (family: 'alpha' | 'beta', index: number) => `${family === 'alpha' ? 'α' : 'β'}${subscript(index + 1)}`;
/** Intersection id 0 → x₁. */
export const pointLabel = (id: number) => `x${subscript(id + 1)}`;
/** Region id 0 → R₁. */
export const regionLabel = (id: number) => `R${subscript(id + 1)}`;
/** Basepoint name z_1 → z₁ (and w). */
export const basepointLabel = (kind: 'z' | 'w', index: number) => `${kind}${subscript(index + 1)}`;

/** Server basepoint names z_1, w_2 → z₁, w₂, joined with commas. */
export const basepointNames = (names: readonly string[]) => names.map((n) => n.replace(/_(\d+)$/, (_, d: string) => subscript(Number(d)))).join(', ');

const MINUS = '−';

/**
 * A number that should be a fraction with a small denominator (Euler measures are multiples of 1/4,
 * Lipshitz 2006) as text: 0, 1/2, −3/4. Falls back to 4 decimals.
 */
export function fractionText(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  for (const den of [1, 2, 4, 3, 6, 8, 12]) {
    const num = Math.round(x * den);
    if (Math.abs(x * den - num) < 1e-9) {
      if (num === 0) return '0';
      const sign = num < 0 ? MINUS : '';
      return den === 1 ? `${sign}${Math.abs(num)}` : `${sign}${Math.abs(num)}/${den}`;
    }
  }
  return decimalText(x);
}

/** Fixed decimals without a '−0.0000'. */
export function decimalText(x: number, digits = 4): string {
  const s = x.toFixed(digits);
  return Number(s) === 0 ? (0).toFixed(digits) : s.replace('-', MINUS);
}

/** A rational as text from the server ("1/2", "-3/4", "2") → TeX. */
export function rationalTex(text: string | null | undefined): string {
  if (text === null || text === undefined) return '?';
  const m = /^\s*(-?)(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
  if (m) return `${m[1] ? '-' : ''}\\tfrac{${m[2]}}{${m[3]}}`;
  return text.trim();
}

/** A rational as text for humans: "-3/4" → "−3/4". */
export const rationalText = (text: string | null | undefined) => (text ?? '—').replace('-', MINUS);

/** A generator {x₁, x₄} from intersection ids. */
export const generatorText = (ids: readonly number[] | null | undefined) => (ids ? `{${ids.map(pointLabel).join(', ')}}` : '—');

const dateFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
export const dateText = (iso: string) => dateFormat.format(new Date(iso));

/**
 * Intersection points typed as "x1, x4" (or "x₁ x₄", or "1 4") → 0-based point ids; undefined when empty,
 * a message when a name is not a point of this diagram.
 */
export function parsePointList(text: string, pointCount: number): number[] | undefined | string {
  const plain = text.replace(/[₀-₉]/g, (c) => String(SUB.indexOf(c))).trim();
  if (!plain) return undefined;
  const ids: number[] = [];
  for (const word of plain.split(/[\s,;{}]+/).filter(Boolean)) {
    const m = /^x?_?(\d+)$/i.exec(word);
    const n = m ? Number(m[1]) : NaN;
    if (!(n >= 1 && n <= pointCount)) return `“${word}” is not an intersection point here (x1 … x${pointCount}).`;
    ids.push(n - 1);
  }
  return ids;
}
