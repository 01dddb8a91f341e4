/**
 * Sessions in PostgreSQL (connect-pg-simple; the `session` table belongs to our migrations) and passport
 * with the local (email + password) strategy.
 */
import connectPgSimple from 'connect-pg-simple';
import { eq } from 'drizzle-orm';
import type { RequestHandler } from 'express';
import session from 'express-session';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { AppDeps } from '../deps.js';
import { users } from '../db/schema.js';
import { DEFAULT_LOG_N, hashPassword, needsRehash, verifyPassword } from './password.js';
import './types.js';

export const SESSION_COOKIE = 'quadrant.sid';
const THIRTY_DAYS_MS = 30 * 24 * 60 * 60 * 1000;

/** Map a users row to the public user shape. */
export function toUser(row: { id: string; email: string; name: string; isAdmin: boolean }): Express.User {
  return { id: row.id, email: row.email, name: row.name, isAdmin: row.isAdmin };
}

/** express-session middleware backed by PostgreSQL. Cookie: httpOnly, SameSite=Lax, Secure on https. */
export function sessionMiddleware(deps: AppDeps): RequestHandler {
  const PgStore = connectPgSimple(session);
  const store = new PgStore({
    pool: deps.pool,
    tableName: 'session',
    createTableIfMissing: false,
    // Tests build many short-lived apps; prune only in long-running servers.
    pruneSessionInterval: deps.env.NODE_ENV === 'test' ? false : 15 * 60,
  });
  deps.onClose(() => store.close());
  const secure = deps.env.PUBLIC_ORIGIN.startsWith('https://');
  return session({
    name: SESSION_COOKIE,
    secret: deps.env.SESSION_SECRET,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: deps.env.TRUST_PROXY,
    cookie: { httpOnly: true, sameSite: 'lax', secure, maxAge: THIRTY_DAYS_MS, path: '/' },
  });
}

// A hash of a random password, verified against when the email is unknown so both paths cost the same.
let dummyHash: Promise<string> | null = null;

/** A passport instance with the local strategy and user (de)serialisation for this app. */
export function createPassport(deps: AppDeps): passport.PassportStatic {
  const instance = new passport.Passport() as unknown as passport.PassportStatic;
  const logN = deps.env.PASSWORD_SCRYPT_LOG_N ?? DEFAULT_LOG_N;
  instance.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      (async () => {
        const rows = await deps.db.select().from(users).where(eq(users.email, email.trim().toLowerCase())).limit(1);
        const row = rows[0];
        if (!row) {
          dummyHash ??= hashPassword('not-a-real-password', logN);
          await verifyPassword(password, await dummyHash);
          return false as const;
        }
        if (!(await verifyPassword(password, row.passwordHash))) return false as const;
        if (needsRehash(row.passwordHash, logN)) {
          await deps.db.update(users).set({ passwordHash: await hashPassword(password, logN) }).where(eq(users.id, row.id));
        }
        return toUser(row);
      })().then(
        (user) => done(null, user),
        (err: unknown) => done(err),
      );
    }),
  );
  instance.serializeUser((user, done) => done(null, (user as Express.User).id));
  instance.deserializeUser((id: string, done) => {
    deps.db
      .select()
      .from(users)
      .where(eq(users.id, id))
      .limit(1)
      .then(
        (rows) => done(null, rows[0] ? toUser(rows[0]) : false),
        (err: unknown) => done(err),
      );
  });
  return instance;
}
