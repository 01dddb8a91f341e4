/** Small timing helpers shared by the scripts/bench/*.bench.ts files. Benchmarks only: tests never time. */

/** One benchmark file's default export. */
export interface BenchSuite {
  name: string;
  run(): Promise<void> | void;
}

/** Best and median wall time in seconds over `repeats` runs, and the last result. */
export function timeIt<T>(fn: () => T, repeats = 3): { best: number; median: number; result: T } {
  const times: number[] = [];
  let result!: T;
  for (let i = 0; i < repeats; i++) {
    const t0 = process.hrtime.bigint();
    result = fn();
    times.push(Number(process.hrtime.bigint() - t0) / 1e9);
  }
  times.sort((a, b) => a - b);
  return { best: times[0], median: times[times.length >> 1], result };
}

/** Current and peak memory in MB (peak resident set from the OS). */
export function memoryMB(): { rss: number; heapUsed: number; arrayBuffers: number; peakRss: number } {
  const m = process.memoryUsage();
  const mb = (x: number) => Math.round(x / 1048576);
  return { rss: mb(m.rss), heapUsed: mb(m.heapUsed), arrayBuffers: mb(m.arrayBuffers), peakRss: Math.round(process.resourceUsage().maxRSS / 1024) };
}

/** Aligned table row: label, seconds, note. */
export const row = (label: string, seconds: number, note = ''): string =>
  `  ${label.padEnd(46)} ${(seconds * 1000).toFixed(1).padStart(9)} ms  ${note}`;
