import { afterAll, describe, expect, it } from 'vitest';
import { buildTemplate } from '../../geometry/index.js';
import { storeDiagram } from '../routes/diagrams/storage.js';
import { GeometryTaskError, GeometryWorker } from './geometry-pool.js';
import { runGeometryTask, type WireRow } from './geometry-tasks.js';
import type { AnalysisOutcome } from './compute-analysis.js';

const worker = new GeometryWorker();
afterAll(() => worker.close());

function lensRow(p: number, q: number): WireRow {
  const d = buildTemplate({ kind: 'lens', p, q });
  if (!d.ok) throw new Error(d.errors[0].message);
  const s = storeDiagram(d.value);
  return { mesh: s.mesh, curves: s.curves, basepoints: s.basepoints, vertexLabels: s.vertexLabels };
}

describe('geometry worker', () => {
  it('analyses L(5,2) in a worker thread exactly as on the calling thread (H_1 = Z/5, Ozsváth–Szabó 2004)', async () => {
    const row = lensRow(5, 2);
    const fractions: number[] = [];
    const inWorker = await worker.run({ type: 'analyze', row }, (f) => fractions.push(f));
    const inline = runGeometryTask({ type: 'analyze', row }) as AnalysisOutcome;
    expect(inWorker).toEqual(inline);
    expect(inWorker.ok && inWorker.result.floer?.h1).toBe('Z/5');
    expect(fractions.length).toBeGreaterThan(0);
  });

  it('fails a task on corrupt data with a worded error and keeps serving the next one', async () => {
    const bad = { ...lensRow(3, 1), mesh: new Uint8Array(64) };
    await expect(worker.run({ type: 'wire-mesh', row: bad })).rejects.toBeInstanceOf(GeometryTaskError);
    const ok = await worker.run({ type: 'template', template: { kind: 's3', genus: 1 } });
    expect(ok.ok).toBe(true);
  });

  it('answers an edit the geometry refuses with its problems, not an exception', async () => {
    const out = await worker.run({ type: 'edit', row: lensRow(3, 1), operation: { type: 'delete-curve', curve: { family: 'beta', index: 7 } } });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.problems[0].message).toContain('beta_8');
  });
});
