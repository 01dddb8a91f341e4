/**
 * The create-from-template form's model: raw text fields per template, their defaults, validation with
 * messages for each field, and conversion to the API's TemplateSpec.
 */
import type { TemplateKind, TemplateSpec } from '../../../server/contract/index.js';

export interface TemplateForm {
  kind: TemplateKind;
  p: string;
  q: string;
  genus: string;
  /** Grid markings as comma-separated rows, one per column: column c's X sits in row x[c]. */
  x: string;
  o: string;
}

export const TEMPLATE_LABELS: Record<TemplateKind, string> = {
  lens: 'Lens space L(p, q), genus 1',
  'torus-curve': 'Torus with a (p, q) curve',
  grid: 'Grid diagram (X and O markings)',
  s3: 'S³, standard diagram of genus g',
  s1xs2: 'S¹ × S², standard diagram of genus g',
};

/** Sensible starting values: L(5,2); a (3,2) curve; the trefoil's 5×5 grid (MOS09; REFERENCE.md); genus 2 and 1. */
export const DEFAULT_FORM: TemplateForm = { kind: 'lens', p: '5', q: '2', genus: '2', x: '1, 2, 3, 4, 0', o: '4, 0, 1, 2, 3' };

export function defaultsFor(kind: TemplateKind): TemplateForm {
  switch (kind) {
    case 'lens': return { ...DEFAULT_FORM, kind, p: '5', q: '2' };
    case 'torus-curve': return { ...DEFAULT_FORM, kind, p: '3', q: '2' };
    case 'grid': return { ...DEFAULT_FORM, kind };
    case 's3': return { ...DEFAULT_FORM, kind, genus: '2' };
    case 's1xs2': return { ...DEFAULT_FORM, kind, genus: '1' };
  }
}

/** The name a new diagram gets unless the user types one. */
export function suggestedName(f: TemplateForm): string {
  switch (f.kind) {
    case 'lens': return `L(${f.p.trim()},${f.q.trim()})`;
    case 'torus-curve': return `Torus (${f.p.trim()},${f.q.trim()}) curve`;
    case 'grid': return `Grid ${f.x.split(',').length}×${f.x.split(',').length}`;
    case 's3': return `S³ genus ${f.genus.trim()}`;
    case 's1xs2': return `S¹×S² genus ${f.genus.trim()}`;
  }
}

const gcd = (a: number, b: number): number => (b === 0 ? Math.abs(a) : gcd(b, a % b));

function intIn(text: string, min: number, max: number, what: string): { value?: number; error?: string } {
  const t = text.trim();
  if (!/^-?\d+$/.test(t)) return { error: `Enter a whole number for ${what}.` };
  const n = Number(t);
  if (n < min || n > max) return { error: `${what} must be between ${min} and ${max}.` };
  return { value: n };
}

function permutation(text: string, what: string): { value?: number[]; error?: string } {
  const parts = text.split(',').map((s) => s.trim()).filter((s) => s !== '');
  if (parts.some((s) => !/^\d+$/.test(s))) return { error: `${what}: list row numbers separated by commas.` };
  const v = parts.map(Number);
  if (v.length < 2 || v.length > 16) return { error: `${what}: a grid has 2 to 16 columns.` };
  const seen = new Set(v);
  if (seen.size !== v.length || v.some((r) => r >= v.length)) {
    return { error: `${what} must use each row 0…${v.length - 1} exactly once (a permutation).` };
  }
  return { value: v };
}

export type TemplateErrors = Partial<Record<'p' | 'q' | 'genus' | 'x' | 'o', string>>;

/** Validates the form; returns the spec or per-field messages. */
export function toTemplateSpec(f: TemplateForm): { spec?: TemplateSpec; errors: TemplateErrors } {
  const errors: TemplateErrors = {};
  if (f.kind === 'lens' || f.kind === 'torus-curve') {
    const p = intIn(f.p, f.kind === 'lens' ? 1 : 0, 60, 'p');
    const q = intIn(f.q, 0, 60, 'q');
    if (p.error) errors.p = p.error;
    if (q.error) errors.q = q.error;
    if (p.value !== undefined && q.value !== undefined && gcd(p.value, q.value) !== 1) {
      // a (p, q) curve on the torus is simple only when gcd(p, q) = 1 (Farb–Margalit 2012, §1.2)
      errors.q = `p and q must be coprime (gcd(${p.value}, ${q.value}) = ${gcd(p.value, q.value)}).`;
    }
    if (Object.keys(errors).length) return { errors };
    return { spec: { kind: f.kind, p: p.value!, q: q.value! }, errors };
  }
  if (f.kind === 's3' || f.kind === 's1xs2') {
    const g = intIn(f.genus, 1, 6, 'The genus');
    if (g.error) return { errors: { genus: g.error } };
    return { spec: { kind: f.kind, genus: g.value! }, errors };
  }
  const x = permutation(f.x, 'X markings');
  const o = permutation(f.o, 'O markings');
  if (x.error) errors.x = x.error;
  if (o.error) errors.o = o.error;
  if (x.value && o.value) {
    if (x.value.length !== o.value.length) errors.o = 'X and O need the same number of columns.';
    else {
      const clash = x.value.findIndex((r, c) => o.value![c] === r);
      if (clash >= 0) errors.o = `Column ${clash} has its X and O in the same row ${x.value[clash]}; each square holds one marking.`;
    }
  }
  if (Object.keys(errors).length) return { errors };
  return { spec: { kind: 'grid', x: x.value!, o: o.value! }, errors };
}
