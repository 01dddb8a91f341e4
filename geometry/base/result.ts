/** A value or a list of user-facing problems. Geometry returns Result for user input and asserts invariants. */
export type Result<T, E = Problem> = { ok: true; value: T } | { ok: false; errors: E[] };

/** A problem in user input, in words a topologist uses, with the offending elements when known. */
export interface Problem {
  /** Stable machine-readable code, e.g. 'open-boundary', 'curve-not-closed'. */
  code: string;
  /** Human-readable sentence. */
  message: string;
  /** Line number in the source file (1-based), when the problem comes from a file. */
  line?: number;
  /** Byte offset in the source file, for binary formats. */
  offset?: number;
  /** Offending vertices, numbered as the user sees them (1-based file numbering). */
  vertices?: number[];
  /** Offending faces (0-based internal indices). */
  faces?: number[];
}

export const ok = <T>(value: T): Result<T, never> => ({ ok: true, value });
export const fail = <E = Problem>(...errors: E[]): Result<never, E> => ({ ok: false, errors });

/**
 * The value of an ok Result, else throws with the problems listed. For tests, scripts and places where a
 * failure is a bug in Quadrant; user input is handled by inspecting the Result instead. O(1).
 */
export function unwrap<T>(r: Result<T, unknown>): T {
  if (!r.ok) throw new Error(`expected a value, got problems: ${JSON.stringify(r.errors)}`);
  return r.value;
}
