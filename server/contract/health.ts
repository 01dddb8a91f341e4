/** Health check contract. Client-safe. */
import { z } from 'zod';

export const HEALTH_PATH = '/api/health';
/** 200 when the database answers, else 503 with ok:false and database:'down'. */
export const healthResponseSchema = z.object({
  ok: z.boolean(),
  database: z.enum(['up', 'down']),
  version: z.string(),
});
export type HealthResponse = z.infer<typeof healthResponseSchema>;
