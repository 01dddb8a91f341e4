/**
 * All seed data, idempotent. `npm start` runs it after migrating; the e2e setup runs it on its database.
 */
import type { Db } from '../db/client.js';
import { seedDemo, type DemoSeed } from './demo.js';
import { seedDemoDiagrams } from './diagrams.js';

export interface SeedOptions {
  /** scrypt cost exponent for demo passwords (tests lower it). */
  passwordLogN?: number;
}

export async function seedAll(db: Db, options: SeedOptions = {}): Promise<DemoSeed> {
  const demo = await seedDemo(db, options);
  // --- lab seeds: diagrams of the demo workspace (lab-server helper adds one line below) ---
  await seedDemoDiagrams(db, demo);
  return demo;
}
