/** Accounts: create (first account becomes site administrator) and look up. */
import { sql } from 'drizzle-orm';
import type { SignupRequest } from '../../contract/auth.js';
import type { Db } from '../../db/client.js';
import { users } from '../../db/schema.js';
import { hashPassword, toUser } from '../../auth/index.js';
import { HttpError } from '../../http/errors.js';

/**
 * Create an account. The first account on an empty installation is site administrator; an advisory
 * lock makes that decision safe against concurrent sign-ups. Duplicate email → 409 conflict.
 */
export async function createUser(db: Db, input: SignupRequest, logN?: number): Promise<Express.User> {
  const passwordHash = await hashPassword(input.password, logN);
  const email = input.email.trim().toLowerCase();
  return db.transaction(async (tx) => {
    await tx.execute(sql`select pg_advisory_xact_lock(7453022)`);
    const existing = await tx.execute<{ has_any: boolean; taken: boolean }>(
      sql`select exists(select 1 from users) as has_any, exists(select 1 from users where email = ${email}) as taken`,
    );
    const flags = existing.rows[0];
    if (flags.taken) throw new HttpError('conflict', 'An account with this email already exists.');
    const [row] = await tx
      .insert(users)
      .values({ email, name: input.name.trim(), passwordHash, isAdmin: !flags.has_any })
      .returning();
    return toUser(row);
  });
}
