/**
 * HF-hat of the n x n grid diagram of S^3 (one z in each row and column; Manolescu–Ozsváth–Sarkar 2009),
 * n = 5..9, i.e. n! generators, with the Sarkar–Wang complex (Sarkar–Wang 2010). Baseline in the same run:
 * enumerating the same generators and doing nothing else. Reported: wall time, generators per second, and
 * user CPU time (the machine may be shared), and the peak of heap + array buffers sampled during the run above the level before it.
 * Target: n = 9 under 20 s on one core, memory linear in the number of generators.
 */
import { combinatorialGridS3, floerSummary, forEachGenerator } from '../../geometry/index.js';
import { memoryMB, row, timeIt, type BenchSuite } from './harness.js';

const used = () => { const m = process.memoryUsage(); return m.heapUsed + m.arrayBuffers; };

const suite: BenchSuite = {
  name: 'floer: HF-hat of n x n grid diagrams (n! generators)',
  run() {
    for (let n = 5; n <= 9; n++) {
      const c = combinatorialGridS3(n);
      const count = [1, 1, 2, 6, 24, 120, 720, 5040, 40320, 362880][n];
      const repeats = n <= 7 ? 3 : 1;
      const base = timeIt(() => { let k = 0; forEachGenerator(c, () => { k++; }); return k; }, repeats);
      const before = used();
      let peak = before;
      const sample = () => { const u = used(); if (u > peak) peak = u; };
      const cpu0 = process.cpuUsage().user;
      const hf = timeIt(() => floerSummary(c, { generatorLimit: 1e7, onProgress: sample }), repeats);
      const cpu = (process.cpuUsage().user - cpu0) / 1e6 / repeats;
      sample();
      const s = hf.result;
      const mb = (peak - before) / 1048576;
      console.log(`  n = ${n}: ${count} generators, raw rank ${s.hfHat?.rawRank} (expected ${2 ** (n - 1)}), HF-hat rank ${s.hfHat?.rank}`);
      console.log(row(`  baseline: enumerate ${count} generators`, base.best, `${(count / base.best / 1e6).toFixed(2)} M generators/s`));
      console.log(row(`  HF-hat (complex + homology)`, hf.best, `${(count / hf.best / 1e3).toFixed(1)} k generators/s, ${(hf.best / base.best).toFixed(0)}x baseline, CPU ${cpu.toFixed(2)} s, peak +${mb.toFixed(0)} MB (${((peak - before) / count).toFixed(0)} B/generator)`));
    }
    const m = memoryMB();
    console.log(`  process peak RSS ${m.peakRss} MB`);
  },
};

export default suite;
