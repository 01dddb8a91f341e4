/**
 * PostgreSQL pool and Drizzle handle. One pool per process (or per test app).
 */
import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import * as schema from './schema.js';

export type Schema = typeof schema;
/** The Drizzle database handle used across the server (with the relational schema attached). */
export type Db = NodePgDatabase<Schema> & { $client: pg.Pool };

/** Open a pool on `url` (max 10 connections unless given). Close it with `pool.end()`. */
export function createPool(url: string, max = 10): pg.Pool {
  const pool = new pg.Pool({ connectionString: url, max, application_name: 'quadrant' });
  // An idle client losing its connection must not crash the process.
  pool.on('error', (err) => {
    console.error(`[db] idle client error: ${err.message}`);
  });
  return pool;
}

/** Wrap a pool in Drizzle. */
export function createDb(pool: pg.Pool): Db {
  return drizzle(pool, { schema }) as Db;
}

export { schema };
