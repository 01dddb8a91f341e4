/**
 * What every router and middleware needs: the database, the parsed environment, the mailer, and a place
 * to register clean-up work. Routers receive it as an argument; middleware reads it from req.app.locals.
 */
import type { Request } from 'express';
import type pg from 'pg';
import type { Db } from './db/client.js';
import type { Env } from './env.js';
import type { Mailer } from './mail/mailer.js';

export interface AppDeps {
  pool: pg.Pool;
  db: Db;
  env: Env;
  mailer: Mailer;
  /** Register work to run when the app closes (stop workers, timers). Runs in reverse order. */
  onClose(fn: () => Promise<void> | void): void;
}

/** The dependencies of the app serving `req`. */
export function depsOf(req: Request): AppDeps {
  const deps = req.app.locals.deps as AppDeps | undefined;
  if (!deps) throw new Error('app.locals.deps is not set; build the app with createApp');
  return deps;
}
