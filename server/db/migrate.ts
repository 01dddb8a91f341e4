/**
 * Apply the SQL migrations in drizzle/ with drizzle-orm's node-postgres migrator.
 * Run directly: `node --import tsx server/db/migrate.ts` (uses DATABASE_URL).
 */
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import pg from 'pg';

/** Folder holding the generated migrations. */
export const MIGRATIONS_FOLDER = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..', 'drizzle');

/** Bring the database at `url` up to the newest migration. Idempotent; serialised by an advisory lock. */
export async function migrateDatabase(url: string): Promise<void> {
  const client = new pg.Client({ connectionString: url, application_name: 'quadrant-migrate' });
  await client.connect();
  try {
    await client.query('SET client_min_messages TO WARNING');
    await client.query('SELECT pg_advisory_lock(7453021)');
    await migrate(drizzle(client), { migrationsFolder: MIGRATIONS_FOLDER });
  } finally {
    await client.query('SELECT pg_advisory_unlock(7453021)').catch(() => undefined);
    await client.end();
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const url = process.env.DATABASE_URL;
  if (!url) {
    console.error('DATABASE_URL is not set');
    process.exit(1);
  }
  migrateDatabase(url).then(
    () => console.log('migrations applied'),
    (err: unknown) => {
      console.error(`migration failed: ${err instanceof Error ? err.message : String(err)}`);
      process.exit(1);
    },
  );
}
