/**
 * HTTP errors and the one error middleware. Routes throw `HttpError` (or helpers below); anything else
 * becomes 500 internal with no stack in the response.
 */
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { z } from 'zod';
import { ERROR_STATUS, type ErrorCode } from '../contract/errors.js';

/** An error with an API code; the status comes from ERROR_STATUS. */
export class HttpError extends Error {
  readonly code: ErrorCode;
  readonly status: number;
  readonly details?: unknown;
  constructor(code: ErrorCode, message: string, details?: unknown) {
    super(message);
    this.code = code;
    this.status = ERROR_STATUS[code];
    this.details = details;
  }
}

export const notFound = (message = 'Not found.') => new HttpError('not_found', message);
export const forbidden = (message = 'You do not have permission to do that.') => new HttpError('forbidden', message);
export const unauthenticated = (message = 'Sign in first.') => new HttpError('unauthenticated', message);
export const conflict = (message: string) => new HttpError('conflict', message);

/** Parse `value` with `schema` or throw 400 validation with zod's flattened field errors. */
export function parseOr400<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const r = schema.safeParse(value);
  if (r.success) return r.data;
  const first = r.error.issues[0];
  const where = first?.path.length ? `${first.path.join('.')}: ` : '';
  throw new HttpError('validation', `${where}${first?.message ?? 'Invalid request.'}`, z.flattenError(r.error));
}

/** Unknown /api paths answer 404 JSON. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new HttpError('not_found', `No API route ${req.method} ${req.path}.`));
};

/** Body-parser and other library errors carry `status`/`type`; map the common ones. */
function fromLibraryError(err: unknown): HttpError | null {
  if (typeof err !== 'object' || err === null) return null;
  const e = err as { type?: string; status?: number; statusCode?: number };
  if (e.type === 'entity.too.large') return new HttpError('payload_too_large', 'The request body is too large.');
  if (e.type === 'entity.parse.failed') return new HttpError('validation', 'The request body is not valid JSON.');
  const status = e.status ?? e.statusCode;
  if (status === 400) return new HttpError('validation', 'Bad request.');
  if (status === 404) return new HttpError('not_found', 'Not found.');
  if (status === 413) return new HttpError('payload_too_large', 'The request body is too large.');
  return null;
}

/** The single error middleware: answers `{ error: { code, message, details? } }`. */
export function errorMiddleware(log: (msg: string) => void = (m) => console.error(m)): ErrorRequestHandler {
  return (err, req, res, next) => {
    if (res.headersSent) {
      next(err);
      return;
    }
    const http = err instanceof HttpError ? err : fromLibraryError(err);
    if (http) {
      res.status(http.status).json({
        error: { code: http.code, message: http.message, ...(http.details !== undefined ? { details: http.details } : {}) },
      });
      return;
    }
    log(`[http] ${req.method} ${req.originalUrl} failed: ${err instanceof Error ? (err.stack ?? err.message) : String(err)}`);
    res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on the server.' } });
  };
}
