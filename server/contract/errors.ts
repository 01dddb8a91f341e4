/**
 * Error envelope shared by every API route: `{ error: { code, message, details? } }`.
 * The client imports this file; it must stay free of server-only imports.
 */
import { z } from 'zod';

/** Every error code the API answers with, and the HTTP status it comes with. */
export const ERROR_STATUS = {
  validation: 400,
  invalid_credentials: 401,
  unauthenticated: 401,
  forbidden: 403,
  bad_origin: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  /** An uploaded file that is not a valid diagram; details list the problems with line numbers. */
  invalid_file: 422,
  /** An edit the geometry refuses (the reason and the place in details). */
  invalid_operation: 422,
  /** A computation that crashed or ran out of time in the geometry worker. */
  computation_failed: 422,
  rate_limited: 429,
  internal: 500,
  unavailable: 503,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

export const errorCodeSchema = z.enum(Object.keys(ERROR_STATUS) as [ErrorCode, ...ErrorCode[]]);

export const apiErrorSchema = z.object({
  error: z.object({
    code: errorCodeSchema,
    message: z.string(),
    /** Field errors for `validation` (zod's flattened shape). */
    details: z.unknown().optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof apiErrorSchema>;

/** Type guard for a parsed JSON body that is an API error envelope. */
export function isApiError(body: unknown): body is ApiErrorBody {
  return apiErrorSchema.safeParse(body).success;
}
