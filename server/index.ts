/**
 * Production entry: parse env, open the pool, build the app, listen, and shut down gracefully on
 * SIGINT/SIGTERM. Run with `node --import tsx server/index.ts` (npm start does this after migrating).
 * `startServer` is exported for browser tests that want a real HTTP server in-process.
 */
import type { AddressInfo } from 'node:net';
import { pathToFileURL } from 'node:url';
import { createApp, type QuadrantApp } from './app.js';
import { createPool } from './db/client.js';
import { EnvError, parseEnv, type Env } from './env.js';

export interface RunningServer {
  app: QuadrantApp;
  /** e.g. http://127.0.0.1:3000 */
  url: string;
  port: number;
  close(): Promise<void>;
}

/** Start the app on env.HOST:env.PORT (PORT 0 picks a free port). Closes app and pool on close(). */
export async function startServer(env: Env): Promise<RunningServer> {
  const pool = createPool(env.DATABASE_URL);
  const app = createApp({ pool, env });
  const server = app.listen(env.PORT, env.HOST);
  await new Promise<void>((resolve, reject) => {
    server.once('listening', resolve);
    server.once('error', reject);
  });
  server.keepAliveTimeout = 65_000;
  const port = (server.address() as AddressInfo).port;
  let closing: Promise<void> | null = null;
  return {
    app,
    port,
    url: `http://${env.HOST}:${port}`,
    close: () =>
      (closing ??= (async () => {
        await new Promise<void>((resolve) => {
          server.close(() => resolve());
          server.closeIdleConnections();
          setTimeout(() => server.closeAllConnections(), 5000).unref();
        });
        await app.close();
        await pool.end();
      })()),
  };
}

async function main(): Promise<void> {
  let env: Env;
  try {
    env = parseEnv();
  } catch (err) {
    if (err instanceof EnvError) {
      console.error(err.message);
      process.exit(1);
    }
    throw err;
  }
  const running = await startServer(env).catch((err: unknown) => {
    const message = err instanceof Error ? err.message : String(err);
    console.error(`Quadrant could not start on ${env.HOST}:${env.PORT}: ${message}`);
    process.exit(1);
  });
  console.log(`Quadrant is serving ${env.PUBLIC_ORIGIN} (listening on ${running.url})`);
  let shuttingDown = false;
  const shutdown = (signal: string) => {
    // A terminal Ctrl-C reaches us twice (directly and forwarded by npm start): act once.
    if (shuttingDown) return;
    shuttingDown = true;
    console.log(`${signal} received; shutting down`);
    const force = setTimeout(() => process.exit(1), 10_000);
    force.unref();
    running.close().then(
      () => process.exit(0),
      () => process.exit(1),
    );
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  void main();
}
