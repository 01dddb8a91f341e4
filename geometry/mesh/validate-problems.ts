/**
 * Collects surface problems per kind: the first few offenders become one sentence each, the rest are
 * folded into one summary problem that still lists every offending vertex and face.
 */
import type { Problem } from '../base/result.js';

/** How many problems of one kind are spelled out one by one before the rest are summarised. */
export const LISTED_PER_KIND = 20;

/** Problem codes that describe a surface that is usable but untidy; everything else is an error. */
export const SURFACE_WARNING_CODES: ReadonlySet<string> = new Set(['unused-vertex']);

/** True when the problem is only a warning (see SURFACE_WARNING_CODES). */
export const isWarning = (p: Problem): boolean => SURFACE_WARNING_CODES.has(p.code);

export class ProblemList {
  readonly problems: Problem[] = [];
  private readonly overflow = new Map<string, { count: number; vertices: number[]; faces: number[]; noun: string }>();
  private readonly counts = new Map<string, number>();

  /** Adds one offender of kind `code`; `noun` names the offenders for the summary ("open edges"). */
  add(code: string, noun: string, message: string, vertices: number[], faces?: number[]): void {
    const n = (this.counts.get(code) ?? 0) + 1;
    this.counts.set(code, n);
    if (n <= LISTED_PER_KIND) {
      this.problems.push(faces ? { code, message, vertices, faces } : { code, message, vertices });
      return;
    }
    let o = this.overflow.get(code);
    if (!o) this.overflow.set(code, (o = { count: 0, vertices: [], faces: [], noun }));
    o.count++;
    for (const v of vertices) o.vertices.push(v);
    if (faces) for (const f of faces) o.faces.push(f);
  }

  /** Number of offenders recorded for `code`. */
  count(code: string): number {
    return this.counts.get(code) ?? 0;
  }

  /** The problems, with one summary per kind that had more than LISTED_PER_KIND offenders. */
  finish(): Problem[] {
    for (const [code, o] of this.overflow) {
      const total = this.counts.get(code) ?? 0;
      this.problems.push({
        code,
        message: `…and ${o.count} more ${o.noun} (${total} in all); their vertices are listed with this message.`,
        vertices: o.vertices,
        faces: o.faces,
      });
    }
    return this.problems;
  }
}

/** "3, 7 and 9" */
export function listWords(items: ArrayLike<number | string>, max = 8): string {
  const n = items.length;
  const shown: string[] = [];
  for (let i = 0; i < Math.min(n, max); i++) shown.push(String(items[i]));
  if (n > max) return `${shown.join(', ')} and ${n - max} more`;
  if (n <= 1) return shown.join('');
  return `${shown.slice(0, -1).join(', ')} and ${shown[n - 1]}`;
}
