/**
 * Cross-site request check: every state-changing request must come from the app's own origin.
 * Origin header first, Referer's origin when Origin is absent; it must equal PUBLIC_ORIGIN or the
 * request's own scheme://host. Otherwise 403 bad_origin. (OWASP CSRF cheat sheet, "Verifying origin
 * with standard headers"; common practice.) Complements SameSite=Lax session cookies.
 */
import type { RequestHandler } from 'express';
import { HttpError } from '../http/errors.js';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

function originOf(value: string | undefined): string | null {
  if (!value || value === 'null') return null;
  try {
    return new URL(value).origin;
  } catch {
    return null;
  }
}

/** Middleware rejecting state-changing requests from foreign or unknown origins. */
export function requireSameOrigin(publicOrigin: string): RequestHandler {
  const allowedPublic = new URL(publicOrigin).origin;
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) {
      next();
      return;
    }
    const claimed = originOf(req.get('origin')) ?? originOf(req.get('referer'));
    const host = req.get('host');
    const own = host ? `${req.protocol}://${host}` : null;
    if (claimed && (claimed === allowedPublic || claimed === own)) {
      next();
      return;
    }
    next(
      new HttpError(
        'bad_origin',
        claimed ? `Requests from ${claimed} are not accepted.` : 'The request has no Origin or Referer header.',
      ),
    );
  };
}
