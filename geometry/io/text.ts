/**
 * Shared plumbing for the file readers: a private exception that carries a line number or byte offset and
 * is turned into a Result at the reader's edge (readers never throw on bad input), byte/text conversion
 * without DOM or Node APIs, and a small allocation-light scanner over one line of text.
 */
import type { Problem, Result } from '../base/result.js';
import { fail, ok } from '../base/result.js';

/** Thrown inside readers only; caught by `guard` and returned as a Problem. */
export class FileProblem extends Error {
  constructor(readonly code: string, message: string, readonly line?: number, readonly offset?: number) {
    super(message);
  }
}

/** Runs a reader body, turning FileProblem into a failed Result. Other exceptions are bugs and propagate. */
export function guard<T>(body: () => T): Result<T> {
  try {
    return ok(body());
  } catch (e) {
    if (e instanceof FileProblem) {
      const p: Problem = { code: e.code, message: e.message };
      if (e.line !== undefined) p.line = e.line;
      if (e.offset !== undefined) p.offset = e.offset;
      return fail(p);
    }
    throw e;
  }
}

/**
 * Bytes as text, one character per byte (Latin-1; every keyword of OBJ/PLY/OFF/STL is ASCII). A leading
 * UTF-8 byte-order mark is dropped. O(n).
 */
export function asText(input: Uint8Array | string): string {
  if (typeof input === 'string') return input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  if (input[0] === 0xef && input[1] === 0xbb && input[2] === 0xbf) input = input.subarray(3);
  const parts: string[] = [];
  for (let i = 0; i < input.length; i += 0x8000) parts.push(String.fromCharCode.apply(null, input.subarray(i, i + 0x8000) as unknown as number[]));
  return parts.join('');
}

/** Text as bytes, one byte per character (characters above 255 become '?'). O(n). */
export function asBytes(input: Uint8Array | string): Uint8Array {
  if (typeof input !== 'string') return input;
  const out = new Uint8Array(input.length);
  for (let i = 0; i < input.length; i++) {
    const c = input.charCodeAt(i);
    out[i] = c < 256 ? c : 63;
  }
  return out;
}

/** Scans whitespace-separated tokens of one line. Reuse one instance per file (`reset` per line). */
export class LineScanner {
  text = '';
  pos = 0;
  end = 0;
  line = 0;

  reset(text: string, start: number, end: number, line: number): this {
    this.text = text; this.pos = start; this.end = end; this.line = line;
    return this;
  }

  /** Next token, or '' at the end of the line (a '#' starts a comment). */
  token(): string {
    const t = this.text;
    let i = this.pos;
    while (i < this.end && isSpace(t.charCodeAt(i))) i++;
    if (i >= this.end || t.charCodeAt(i) === 35) { this.pos = this.end; return ''; }
    let j = i;
    while (j < this.end && !isSpace(t.charCodeAt(j))) j++;
    this.pos = j;
    return t.slice(i, j);
  }

  /** Next token as a finite number; `what` names it in the error. */
  number(what: string): number {
    const tok = this.token();
    const x = tok === '' ? NaN : Number(tok);
    if (!Number.isFinite(x)) throw new FileProblem('bad-number', tok === '' ? `Line ${this.line}: ${what} is missing.` : `Line ${this.line}: ${what} '${tok}' is not a number.`, this.line);
    return x;
  }

  /** Next token as an integer. */
  integer(what: string): number {
    const x = this.number(what);
    if (!Number.isInteger(x)) throw new FileProblem('bad-number', `Line ${this.line}: ${what} '${x}' is not a whole number.`, this.line);
    return x;
  }
}

const isSpace = (c: number): boolean => c === 32 || c === 9 || c === 13 || c === 11 || c === 12;

/**
 * Calls `each(start, end, lineNo)` for every line of text (without its line break). Lines are 1-based.
 * Returning false stops the walk. O(n).
 */
export function forEachLine(text: string, each: (start: number, end: number, line: number) => boolean | void): void {
  let start = 0, line = 1;
  while (start <= text.length) {
    let end = text.indexOf('\n', start);
    if (end < 0) end = text.length;
    if (each(start, end, line) === false) return;
    start = end + 1; line++;
  }
}

/** Growable typed buffer for numbers read from a file (amortised O(1) push). */
export class GrowArray<T extends Float64Array | Int32Array> {
  length = 0;
  constructor(public data: T) {}
  push(x: number): void {
    if (this.length === this.data.length) {
      const bigger = new (this.data.constructor as { new (n: number): T })(Math.max(16, this.data.length * 2));
      bigger.set(this.data);
      this.data = bigger;
    }
    this.data[this.length++] = x;
  }
  /** A trimmed copy. */
  done(): T {
    return this.data.slice(0, this.length) as T;
  }
}
