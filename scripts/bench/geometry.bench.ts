/**
 * Geometry core at one million triangles: a 1250 x 400 grid torus carrying the meridian (alpha) and the
 * (8, 25) diagonal (beta; GEOMETRY.md "Generated surfaces": N_u = qM, N_v = pM with M = 50), which meet
 * 8 times. Baseline: one bare pass over the same typed arrays computing every corner angle. Measured:
 * connectivity, curve validation, regions, wedges, curvature and Euler measures (analyzeDiagram).
 * Target: whole analysis ≤ 5x the baseline.
 */
import {
  analyzeDiagram, buildTriMesh, checkCurves, cornerAngle, meshAngles, gridDiagonal, gridMeridian, torusGrid, torusGridVertex, type HeegaardDiagram,
} from '../../geometry/index.js';
import { memoryMB, row, timeIt, type BenchSuite } from './harness.js';

const grid = { R: 2, r: 0.8, nu: 1250, nv: 400 };

/** The bare baseline: every corner angle of every face, into one Float64Array. O(F). */
function allCornerAngles(pos: Float64Array, tris: Int32Array, out: Float64Array): number {
  for (let h = 0; h < tris.length; h += 3) {
    const a = tris[h], b = tris[h + 1], c = tris[h + 2];
    out[h] = cornerAngle(pos, c, a, b);
    out[h + 1] = cornerAngle(pos, a, b, c);
    out[h + 2] = cornerAngle(pos, b, c, a);
  }
  return out[0];
}

function diagramOn(pos: Float64Array, tris: Int32Array): HeegaardDiagram {
  const { mesh } = buildTriMesh(pos, tris);
  const vert = ([i, j]: [number, number]) => torusGridVertex(grid, i, j);
  return {
    mesh,
    curves: [
      { family: 'alpha', index: 0, vertices: Int32Array.from(gridMeridian(grid, 0), vert) },
      { family: 'beta', index: 0, vertices: Int32Array.from(gridDiagonal(grid), vert) },
    ],
    basepoints: [{ kind: 'z', index: 0, vertex: vert([1, 0]) }],
  };
}

const suite: BenchSuite = {
  name: 'geometry: diagram analysis on a 1M-triangle torus',
  run() {
    const { pos, tris } = torusGrid(grid);
    const nF = tris.length / 3;
    console.log(`  torus ${grid.nu} x ${grid.nv}: ${pos.length / 3} vertices, ${nF} triangles; alpha = meridian, beta = (8,25) diagonal`);
    const angles = new Float64Array(tris.length);
    // Interleaved rounds, best of each: the machine may be shared, and the minimum is the least disturbed.
    const rounds = 5;
    const base = { best: Infinity, median: 0 }, build = { best: Infinity }, analyse = { best: Infinity, result: null as unknown as ReturnType<typeof analyzeDiagram> };
    const baseTimes: number[] = [];
    for (let i = 0; i < rounds; i++) {
      const b = timeIt(() => allCornerAngles(pos, tris, angles), 1);
      baseTimes.push(b.best);
      base.best = Math.min(base.best, b.best);
      build.best = Math.min(build.best, timeIt(() => buildTriMesh(pos, tris), 1).best);
      const w = timeIt(() => analyzeDiagram(diagramOn(pos, tris)), 1); // includes connectivity
      if (w.best < analyse.best) { analyse.best = w.best; analyse.result = w.result; }
    }
    base.median = baseTimes.sort((x, y) => x - y)[rounds >> 1];
    const r = analyse.result;
    if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('; '));
    const a = r.value;
    const analysisOnly = analyse.best - build.best;
    console.log(row('baseline: all corner angles', base.best, `median ${(base.median * 1000).toFixed(1)} ms`));
    console.log(row('connectivity (buildTriMesh)', build.best, `${(build.best / base.best).toFixed(2)}x baseline`));
    console.log(row('analysis after connectivity', analysisOnly, `${(analysisOnly / base.best).toFixed(2)}x baseline`));
    const d = diagramOn(pos, tris);
    const check = timeIt(() => checkCurves(d), 3);
    const ang = timeIt(() => meshAngles(d.mesh), 3);
    console.log(row('  of which curve labels, validation, regions', check.best, `${(check.best / base.best).toFixed(2)}x baseline`));
    console.log(row('  of which corner angles and angle sums', ang.best, `${(ang.best / base.best).toFixed(2)}x baseline`));
    console.log(row('whole analysis (connectivity + all)', analyse.best, `${(analyse.best / base.best).toFixed(2)}x baseline (target <= 5x)`));
    console.log(`  result: ${a.points.length} intersection points, ${a.regions.length} regions, Σe = ${a.eulerMeasureTotal}, defects ${a.defects.length}`);
    const worst = Math.max(...a.regions.map((g) => Math.abs(g.geometricEulerMeasure - g.eulerMeasure)));
    console.log(`  largest |geometric e − corner e| over regions: ${worst.toExponential(2)}`);
    const m = memoryMB();
    console.log(`  memory: rss ${m.rss} MB, heap used ${m.heapUsed} MB, array buffers ${m.arrayBuffers} MB, peak rss ${m.peakRss} MB`);
    console.log(`  ratio ${(analyse.best / base.best).toFixed(2)}x ${analyse.best / base.best <= 5 ? 'meets' : 'MISSES'} the 5x target`);
  },
};

export default suite;
