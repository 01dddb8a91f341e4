/**
 * `npm run bench [-- NAME...]`: runs every scripts/bench/*.bench.ts (or those whose name contains one of
 * the given words), one after another in this process. Each file default-exports a BenchSuite.
 */
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import type { BenchSuite } from './bench/harness.js';

const dir = join(dirname(fileURLToPath(import.meta.url)), 'bench');
const filters = process.argv.slice(2).filter((a) => !a.startsWith('-'));
const files = readdirSync(dir).filter((f) => f.endsWith('.bench.ts') && (filters.length === 0 || filters.some((w) => f.includes(w)))).sort();
if (files.length === 0) {
  console.error(`No benchmark matches ${filters.join(', ')}.`);
  process.exitCode = 1;
}
for (const f of files) {
  const suite = (await import(pathToFileURL(join(dir, f)).href)).default as BenchSuite;
  console.log(`\n== ${suite.name} (${f})`);
  const t0 = Date.now();
  await suite.run();
  console.log(`   (${((Date.now() - t0) / 1000).toFixed(1)} s)`);
}
