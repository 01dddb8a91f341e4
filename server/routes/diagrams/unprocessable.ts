/**
 * 422 answers of the lab routes: invalid_file for uploads, invalid_operation for edits the geometry refuses
 * (both with the geometry's problems as details), computation_failed when a geometry worker crashes or
 * times out. All go through the shared error middleware as HttpErrors.
 */
import type { ErrorRequestHandler } from 'express';
import type { Problem } from '../../../geometry/index.js';
import type { FileProblem } from '../../contract/diagrams.js';
import { HttpError } from '../../http/errors.js';
import { GeometryTaskError } from '../../jobs/geometry-pool.js';

/** Problems from the geometry core as contract details (line/offset kept when present). */
export function problemDetails(problems: Problem[]): FileProblem[] {
  return problems.map((p) => ({
    message: p.message,
    ...(p.line !== undefined ? { line: p.line } : {}),
    ...(p.offset !== undefined ? { offset: p.offset } : {}),
  }));
}

/** Turns a geometry worker failure into 422 computation_failed; everything else passes on unchanged. */
export const unprocessableHandler: ErrorRequestHandler = (err, _req, _res, next) => {
  next(err instanceof GeometryTaskError ? new HttpError('computation_failed', err.message) : err);
};
