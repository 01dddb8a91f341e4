/** Thrown when an internal invariant is broken: a bug in Quadrant, never a problem in user input. */
export class InvariantError extends Error {
  override name = 'InvariantError';
}

/** Asserts an internal invariant. User input errors must use Result instead. */
export function assert(condition: unknown, message: string): asserts condition {
  if (!condition) throw new InvariantError(message);
}
