import { describe, expect, it } from 'vitest';
import {
  addBasepoint, addCurve, buildTemplate, dehnTwist, deleteCurve, drawCurve, fingerMove, moveBasepoint, removeBigon,
  renameCurve, smoothCurves, subdivideDiagram, type Result,
} from '../index.js';

describe('operations on malformed input', () => {
  it('answer with a Result naming the problem, never a throw (common practice: user input errors are Results)', () => {
    const built = buildTemplate({ kind: 'lens', p: 3, q: 1, resolution: 8 });
    if (!built.ok) throw new Error('template');
    const D = built.value;
    const bad = (x: unknown) => x as never;
    const calls: (() => Result<unknown>)[] = [
      () => dehnTwist(D, 0.5, 0), () => dehnTwist(D, NaN, 0), () => fingerMove(D, 1, bad(['a', 2])), () => fingerMove(D, 1, [1.5, 2]),
      () => fingerMove(D, 1, bad(null)), () => addCurve(D, 'beta', [0.5, 1, 2]), () => addCurve(D, 'beta', bad(null)), () => deleteCurve(D, 7),
      () => renameCurve(D, 0, bad('gamma'), 0), () => moveBasepoint(D, 0, -1), () => moveBasepoint(D, 0, { face: 3, bary: [0, 0, 0] }),
      () => removeBigon(D, 0.5), () => subdivideDiagram(D, bad('cubic')), () => smoothCurves(D, { iterations: 1.5 }),
      () => drawCurve(D, 'beta', bad([{ face: -1, bary: [1, 1, 1] }, 1, 2])), () => addBasepoint(D, bad('q'), 5),
      () => buildTemplate({ kind: 'grid', x: bad('abc'), o: [1] }), () => buildTemplate(bad(null)), () => buildTemplate({ kind: 'lens', p: bad('5'), q: 2 }),
      () => buildTemplate({ kind: 's3', genus: 2, resolution: 9 }), () => buildTemplate(bad({ kind: 'klein' })),
    ];
    for (const call of calls) {
      const r = call();
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.errors[0].message.length).toBeGreaterThan(10);
    }
  });
});
