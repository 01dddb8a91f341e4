// Create databases on the server behind a URL (needs node_modules: uses the `pg` package).
import { databaseName, withDatabase } from './pg-cluster.mjs';

/** Create the database named in `url` when it does not exist (connects to the `postgres` database). */
export async function ensureDatabase(url) {
  const { default: pg } = await import('pg');
  const name = databaseName(url);
  // Already reachable? Then nothing to do (works without rights on the `postgres` database).
  const probe = new pg.Client({ connectionString: url });
  try {
    await probe.connect();
    await probe.end();
    return false;
  } catch (err) {
    await probe.end().catch(() => undefined);
    if (!err || err.code !== '3D000') throw err; // 3D000 = database does not exist
  }
  const client = new pg.Client({ connectionString: withDatabase(url, 'postgres') });
  await client.connect();
  try {
    const r = await client.query('select 1 from pg_database where datname = $1', [name]);
    if (r.rowCount === 0) {
      try {
        await client.query(`create database "${name.replace(/"/g, '""')}"`);
        return true;
      } catch (err) {
        // Another process may have created it meanwhile.
        if (err && err.code === '42P04') return false;
        throw err;
      }
    }
    return false;
  } finally {
    await client.end();
  }
}
