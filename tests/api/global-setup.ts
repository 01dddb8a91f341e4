/**
 * API test setup (runs once, in the main vitest process): find the test database, create it when missing,
 * empty it and apply all migrations. The URL comes from QUADRANT_TEST_DATABASE_URL (npm test sets it);
 * otherwise from DATABASE_URL's server or the project-local cluster (started when needed), database
 * `quadrant_test`. The demo database `quadrant` is never touched.
 */
import pg from 'pg';
import type { TestProject } from 'vitest/node';
import { migrateDatabase } from '../../server/db/migrate.js';
import { ensureDatabase } from '../../scripts/lib/database.mjs';
import { databaseName, databaseUrlFor } from '../../scripts/lib/pg-cluster.mjs';

declare module 'vitest' {
  export interface ProvidedContext {
    testDatabaseUrl: string;
  }
}

/** Drop every non-system schema (public, drizzle, job queues) and recreate public. */
export async function emptyDatabase(url: string): Promise<void> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    await client.query('SET client_min_messages TO WARNING');
    const { rows } = await client.query<{ nspname: string }>(
      `select nspname from pg_namespace where nspname not like 'pg\\_%' and nspname <> 'information_schema'`,
    );
    for (const { nspname } of rows) await client.query(`drop schema "${nspname.replace(/"/g, '""')}" cascade`);
    await client.query('create schema public');
  } finally {
    await client.end();
  }
}

export default async function setup(project: TestProject): Promise<void> {
  const url = process.env.QUADRANT_TEST_DATABASE_URL ?? databaseUrlFor('quadrant_test');
  if (!url) throw new Error('No test database: set QUADRANT_TEST_DATABASE_URL or run `npm run db:start`.');
  if (databaseName(url) === 'quadrant') throw new Error('Refusing to run API tests on the demo database `quadrant`.');
  await ensureDatabase(url);
  await emptyDatabase(url);
  await migrateDatabase(url);
  process.env.QUADRANT_TEST_DATABASE_URL = url;
  project.provide('testDatabaseUrl', url);
}
