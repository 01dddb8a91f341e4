/**
 * Sign-in throttling: LOGIN_RATE_LIMIT failed attempts per (IP, email) within LOGIN_RATE_WINDOW_MS,
 * then 429 rate_limited. Successful sign-ins do not count. In-memory store (one server process).
 */
import type { RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { Env } from '../env.js';
import { HttpError } from '../http/errors.js';

export function loginRateLimit(env: Env): RequestHandler {
  return rateLimit({
    windowMs: env.LOGIN_RATE_WINDOW_MS,
    limit: env.LOGIN_RATE_LIMIT,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => {
      const body = req.body as { email?: unknown } | undefined;
      const email = typeof body?.email === 'string' ? body.email.trim().toLowerCase() : '';
      return `${ipKeyGenerator(req.ip ?? 'unknown')}|${email}`;
    },
    handler: (_req, _res, next, options) => {
      const minutes = Math.ceil(options.windowMs / 60000);
      next(new HttpError('rate_limited', `Too many sign-in attempts. Try again in ${minutes} minutes.`));
    },
  });
}
