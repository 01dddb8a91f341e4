#!/usr/bin/env node
// Project-local PostgreSQL: `node scripts/db.mjs start|stop|status|ensure|url [database]`.
// When DATABASE_URL is set, everything points at that server instead and this script changes nothing.
import { pathToFileURL } from 'node:url';
import { UserError, info, main, step } from './lib/run.mjs';
import { clusterStatus, ensureCluster, redact, stopCluster, withDatabase } from './lib/pg-cluster.mjs';

const USAGE = 'usage: node scripts/db.mjs start|stop|status|ensure|url [database]';

export async function db(command, arg) {
  if (process.env.DATABASE_URL) {
    if (command === 'url') {
      process.stdout.write(withDatabase(process.env.DATABASE_URL, arg ?? 'quadrant') + '\n');
      return 0;
    }
    info(`DATABASE_URL is set (${redact(process.env.DATABASE_URL)}); the project-local cluster is not used.`);
    return 0;
  }
  switch (command) {
    case 'start':
    case 'ensure': {
      step('database server');
      const c = ensureCluster();
      info(`connect with: ${redact(c.url('quadrant'))}`);
      return 0;
    }
    case 'stop': {
      step('database server');
      info(stopCluster() ? 'stopped the project-local PostgreSQL' : 'the project-local PostgreSQL is not running');
      return 0;
    }
    case 'status': {
      const s = clusterStatus();
      info(`binaries:    ${s.bin ?? 'not installed'}`);
      info(`cluster:     ${s.initialised ? s.data : 'not created yet'}`);
      info(`state:       ${s.running ? `running on 127.0.0.1:${s.port}` : 'stopped'}`);
      return s.running ? 0 : 3;
    }
    case 'url': {
      const c = ensureCluster({ quiet: true });
      process.stdout.write(c.url(arg ?? 'quadrant') + '\n');
      return 0;
    }
    default:
      throw new UserError(USAGE);
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  main(() => db(process.argv[2], process.argv[3]));
}
