/** Small helpers to turn zod results and API validation errors into per-field messages. */
import { z } from 'zod';
import { ApiError } from './api';

export type FieldErrors = Partial<Record<string, string>>;

/** Validates `values` with a contract schema; on failure gives the first message per field. */
export function validate<S extends z.ZodType>(schema: S, values: unknown):
  | { ok: true; data: z.infer<S> }
  | { ok: false; errors: FieldErrors } {
  const result = schema.safeParse(values);
  if (result.success) return { ok: true, data: result.data };
  const flat = z.flattenError(result.error);
  const errors: FieldErrors = {};
  for (const [field, messages] of Object.entries(flat.fieldErrors as Record<string, string[] | undefined>)) {
    if (messages?.length) errors[field] = messages[0];
  }
  if (flat.formErrors.length) errors._form = flat.formErrors[0];
  return { ok: false, errors };
}

/** Field messages from a server `validation` error (details in zod's flattened shape), if any. */
export function serverFieldErrors(error: unknown): FieldErrors {
  if (!(error instanceof ApiError) || error.code !== 'validation') return {};
  const details = error.details as { fieldErrors?: Record<string, string[] | undefined> } | undefined;
  const errors: FieldErrors = {};
  for (const [field, messages] of Object.entries(details?.fieldErrors ?? {})) {
    if (messages?.length) errors[field] = messages[0];
  }
  return errors;
}
