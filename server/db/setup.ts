/**
 * `node --import tsx server/db/setup.ts`: migrate DATABASE_URL and load the demo seed (idempotent).
 * Used by npm start before the server starts.
 */
import { createDb, createPool } from './client.js';
import { migrateDatabase } from './migrate.js';
import { seedAll } from '../seed/index.js';

async function main(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set');
  await migrateDatabase(url);
  console.log('    migrations applied');
  const pool = createPool(url, 2);
  try {
    const seed = await seedAll(createDb(pool));
    console.log(`    demo workspace ready (${seed.workspaceId})`);
  } finally {
    await pool.end();
  }
}

main().catch((err: unknown) => {
  console.error(`database setup failed: ${err instanceof Error ? (err.stack ?? err.message) : String(err)}`);
  process.exit(1);
});
