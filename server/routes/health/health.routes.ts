/** GET /api/health: 200 only when the database answers, else 503. */
import { Router } from 'express';
import type { HealthResponse } from '../../contract/health.js';
import type { AppDeps } from '../../deps.js';
import { APP_VERSION } from '../../version.js';

export function healthRouter(deps: AppDeps): Router {
  const r = Router();
  r.get('/health', async (_req, res) => {
    let up = false;
    try {
      const client = await deps.pool.connect();
      try {
        await client.query({ text: 'select 1', query_timeout: 3000 } as never);
        up = true;
      } finally {
        client.release();
      }
    } catch {
      up = false;
    }
    const body: HealthResponse = { ok: up, database: up ? 'up' : 'down', version: APP_VERSION };
    res.status(up ? 200 : 503).set('Cache-Control', 'no-store').json(body);
  });
  return r;
}
