/** POST /api/auth/signup, POST /api/auth/login, POST /api/auth/logout, GET /api/auth/me. */
import { Router, type Request } from 'express';
import type passport from 'passport';
import { loginRequestSchema, signupRequestSchema } from '../../contract/auth.js';
import { loginRateLimit, requireUser } from '../../auth/index.js';
import type { AppDeps } from '../../deps.js';
import { HttpError, parseOr400 } from '../../http/errors.js';
import { createUser } from './auth.service.js';

function logIn(req: Request, user: Express.User): Promise<void> {
  return new Promise((resolve, reject) => req.login(user, (err) => (err ? reject(err) : resolve())));
}

function authenticate(auth: passport.Authenticator, req: Request): Promise<Express.User | false> {
  return new Promise((resolve, reject) => {
    auth.authenticate('local', { session: false }, (err: unknown, user: Express.User | false) =>
      err ? reject(err) : resolve(user),
    )(req, req.res!, (err: unknown) => reject(err));
  });
}

export function authRouter(deps: AppDeps, auth: passport.Authenticator): Router {
  const r = Router();

  r.post('/auth/signup', async (req, res) => {
    const input = parseOr400(signupRequestSchema, req.body);
    const user = await createUser(deps.db, input, deps.env.PASSWORD_SCRYPT_LOG_N);
    await logIn(req, user);
    res.status(201).json({ user });
  });

  r.post('/auth/login', loginRateLimit(deps.env), async (req, res) => {
    const input = parseOr400(loginRequestSchema, req.body);
    req.body = input;
    const user = await authenticate(auth, req);
    if (!user) throw new HttpError('invalid_credentials', 'Email or password is not correct.');
    await logIn(req, user);
    res.status(200).json({ user });
  });

  r.post('/auth/logout', (req, res, next) => {
    req.logout((err) => {
      if (err) return next(err);
      req.session.destroy((destroyErr) => {
        if (destroyErr) return next(destroyErr);
        res.clearCookie('quadrant.sid', { path: '/' });
        res.status(204).end();
      });
    });
  });

  r.get('/auth/me', requireUser, (req, res) => {
    res.json({ user: req.user });
  });

  return r;
}
