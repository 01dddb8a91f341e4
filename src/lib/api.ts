/**
 * The client's only way to talk to the server: JSON in, JSON out, same-origin cookies.
 *
 * Every failure becomes an {@link ApiError}. When the server cannot be reached at all (network failure,
 * or a gateway answering 502/503/504) the error is an {@link ApiUnreachableError}, so screens can show
 * "Quadrant's server is not answering" instead of a misleading validation message.
 */

/** An error answered by the API as `{ error: { code, message } }`, or synthesised for odd answers. */
export class ApiError extends Error {
  override readonly name: string = 'ApiError';
  /** Machine-readable code from the server, e.g. `invalid_credentials`, `not_found`, `rate_limited`. */
  readonly code: string;
  /** HTTP status; 0 when no answer arrived. */
  readonly status: number;
  /** Optional extra detail from the server (e.g. per-field issues). */
  readonly details: unknown;

  constructor(status: number, code: string, message: string, details?: unknown) {
    super(message);
    this.status = status;
    this.code = code;
    this.details = details;
  }
}

/** The API could not be reached: network error, or 502/503/504 from a proxy or a server that is down. */
export class ApiUnreachableError extends ApiError {
  override readonly name = 'ApiUnreachableError';
  constructor(status: number, message = 'Quadrant’s server is not answering right now.') {
    super(status, 'api_unreachable', message);
  }
}

/** True when `error` means the API is down or unreachable (not a user or server error). */
export function isApiUnreachable(error: unknown): error is ApiUnreachableError {
  return error instanceof ApiUnreachableError;
}

/** True when `error` is an ApiError with the given HTTP status. */
export function hasStatus(error: unknown, status: number): error is ApiError {
  return error instanceof ApiError && error.status === status;
}

export type HttpMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export interface ApiRequestOptions {
  method?: HttpMethod;
  /** Serialised as JSON. */
  body?: unknown;
  signal?: AbortSignal;
  headers?: Record<string, string>;
}

const UNREACHABLE_STATUSES = new Set([502, 503, 504]);

/**
 * Calls the API at `path` (e.g. `/api/workspaces`) and returns its parsed JSON body (undefined for 204).
 * Throws ApiError / ApiUnreachableError. Credentials are same-origin, so the session cookie travels and
 * the browser adds the app's own Origin header that the server requires for state-changing requests.
 */
export async function apiFetch<T>(path: string, options: ApiRequestOptions = {}): Promise<T> {
  const { method = 'GET', body, signal, headers = {} } = options;
  const init: RequestInit = {
    method,
    credentials: 'same-origin',
    signal,
    headers: { Accept: 'application/json', ...headers },
  };
  if (body !== undefined) {
    (init.headers as Record<string, string>)['Content-Type'] = 'application/json';
    init.body = JSON.stringify(body);
  }

  let response: Response;
  try {
    response = await fetch(path, init);
  } catch (cause) {
    if (signal?.aborted) throw cause;
    throw new ApiUnreachableError(0);
  }

  if (response.status === 204) return undefined as T;
  const payload = await readJson(response);

  if (response.ok) return payload as T;

  const error = extractError(payload);
  // A 503 with a structured error from our own server (e.g. health with the database down) is still "down".
  if (UNREACHABLE_STATUSES.has(response.status)) {
    throw new ApiUnreachableError(response.status, error?.message);
  }
  if (error) throw new ApiError(response.status, error.code, error.message, error.details);
  // A 5xx without our JSON error shape came from something in between (a dev proxy with no server behind).
  if (response.status >= 500) throw new ApiUnreachableError(response.status);
  throw new ApiError(response.status, `http_${response.status}`, `Unexpected answer from the server (${response.status}).`);
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

function extractError(payload: unknown): { code: string; message: string; details?: unknown } | undefined {
  if (!payload || typeof payload !== 'object' || !('error' in payload)) return undefined;
  const e = (payload as { error: unknown }).error;
  if (!e || typeof e !== 'object') return undefined;
  const { code, message, details } = e as { code?: unknown; message?: unknown; details?: unknown };
  if (typeof code !== 'string') return undefined;
  return { code, message: typeof message === 'string' ? message : code, details };
}

/** Shorthands. */
export const api = {
  get: <T>(path: string, signal?: AbortSignal) => apiFetch<T>(path, { signal }),
  post: <T>(path: string, body?: unknown) => apiFetch<T>(path, { method: 'POST', body }),
  patch: <T>(path: string, body?: unknown) => apiFetch<T>(path, { method: 'PATCH', body }),
  put: <T>(path: string, body?: unknown) => apiFetch<T>(path, { method: 'PUT', body }),
  delete: <T = void>(path: string) => apiFetch<T>(path, { method: 'DELETE' }),
};

/** A human sentence for any error, for places that just need to show something. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  if (error instanceof Error) return error.message;
  return 'Something went wrong.';
}
