/**
 * 422 answers of the lab routes (invalid_file for uploads, invalid_operation for edits the geometry refuses).
 * The shared error middleware knows only ERROR_STATUS codes, so these routers answer 422 themselves through
 * `unprocessableHandler`, keeping the `{ error: { code, message, details } }` envelope. A geometry worker
 * crash or timeout answers 422 computation_failed with the reason (LAB_ERROR_STATUS in the contract).
 */
import type { ErrorRequestHandler } from 'express';
import type { Problem } from '../../../geometry/index.js';
import type { FileProblem } from '../../contract/diagrams.js';
import { GeometryTaskError } from '../../jobs/geometry-pool.js';

export class Unprocessable extends Error {
  constructor(readonly code: 'invalid_file' | 'invalid_operation', message: string, readonly details: FileProblem[]) {
    super(message);
  }
}

/** Problems from the geometry core as contract details (line/offset kept when present). */
export function problemDetails(problems: Problem[]): FileProblem[] {
  return problems.map((p) => ({
    message: p.message,
    ...(p.line !== undefined ? { line: p.line } : {}),
    ...(p.offset !== undefined ? { offset: p.offset } : {}),
  }));
}

export const unprocessableHandler: ErrorRequestHandler = (err, _req, res, next) => {
  if (err instanceof GeometryTaskError) {
    res.status(422).json({ error: { code: 'computation_failed', message: err.message } });
    return;
  }
  if (!(err instanceof Unprocessable)) {
    next(err);
    return;
  }
  res.status(422).json({ error: { code: err.code, message: err.message, details: err.details } });
};
