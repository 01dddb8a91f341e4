/**
 * Build the Express app. Tests call `createApp({ pool, env })` directly; server/index.ts adds listen and
 * graceful shutdown. `app.close()` releases what the app started (session store timer, mailer, workers)
 * but not the pool, which belongs to the caller.
 */
import { existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import express, { Router, type Express } from 'express';
import helmet from 'helmet';
import type pg from 'pg';
import { createPassport, requireSameOrigin, sessionMiddleware } from './auth/index.js';
import { createDb, type Db } from './db/client.js';
import type { AppDeps } from './deps.js';
import type { Env } from './env.js';
import { apiNotFound, errorMiddleware } from './http/errors.js';
import { createMailer, type Mailer } from './mail/mailer.js';
import { registerRoutes } from './routes/index.js';

export const DIST_DIR = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', 'dist');

export interface CreateAppOptions {
  pool: pg.Pool;
  env: Env;
  /** Defaults to a Drizzle handle on `pool`. */
  db?: Db;
  /** Defaults to createMailer(env). */
  mailer?: Mailer;
  /** Serve dist/ with SPA fallback when it exists (default true). */
  serveClient?: boolean;
  /** Log sink for server errors (default console.error). */
  log?: (message: string) => void;
}

/** The Express app plus its dependencies and a close function. */
export type QuadrantApp = Express & { deps: AppDeps; close(): Promise<void> };

export function createApp(options: CreateAppOptions): QuadrantApp {
  const { pool, env } = options;
  const closers: (() => Promise<void> | void)[] = [];
  const mailer = options.mailer ?? createMailer(env);
  const deps: AppDeps = {
    pool,
    env,
    db: options.db ?? createDb(pool),
    mailer,
    onClose: (fn) => closers.push(fn),
  };
  if (!options.mailer) closers.push(() => mailer.close());

  const app = express() as QuadrantApp;
  app.locals.deps = deps;
  app.disable('x-powered-by');
  if (env.TRUST_PROXY) app.set('trust proxy', 1);

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // three.js and Vite's worker chunks need blob: workers; KaTeX uses inline styles.
          'script-src': ["'self'"],
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'worker-src': ["'self'", 'blob:'],
          'connect-src': ["'self'"],
          'upgrade-insecure-requests': env.PUBLIC_ORIGIN.startsWith('https://') ? [] : null,
        },
      },
      strictTransportSecurity: env.PUBLIC_ORIGIN.startsWith('https://'),
    }),
  );

  const auth = createPassport(deps);
  const api = Router();
  api.use(express.json({ limit: '1mb' }));
  api.use(requireSameOrigin(env.PUBLIC_ORIGIN));
  api.use(sessionMiddleware(deps));
  api.use(auth.initialize());
  api.use(auth.session());
  api.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });
  registerRoutes(api, deps, auth);
  api.use(apiNotFound);
  app.use('/api', api);

  if (options.serveClient !== false && existsSync(path.join(DIST_DIR, 'index.html'))) {
    app.use(express.static(DIST_DIR, { index: false, maxAge: '1h' }));
    app.get('/{*splat}', (req, res, next) => {
      if (req.method !== 'GET' && req.method !== 'HEAD') return next();
      res.set('Cache-Control', 'no-cache').sendFile(path.join(DIST_DIR, 'index.html'));
    });
  }

  app.use(errorMiddleware(options.log));

  app.deps = deps;
  app.close = async () => {
    for (const fn of closers.reverse()) {
      try {
        await fn();
      } catch (err) {
        (options.log ?? console.error)(`[app] close failed: ${err instanceof Error ? err.message : String(err)}`);
      }
    }
  };
  return app;
}
