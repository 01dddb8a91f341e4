import { describe, expect, it } from 'vitest';
import { analyzeDiagram, s1xs2TorusDiagram, vertexLabel, writeObj, type HeegaardDiagram } from '../../geometry/index.js';
import { main } from '../../server/cli/main.js';

/** One vertex off the curves inside each region of the S^1 x S^2 template, and the two crossings. */
function fixture(): { obj: string; inRegion: number[]; crossings: number[]; bigons: number[] } {
  const r = s1xs2TorusDiagram();
  if (!r.ok) throw new Error('template failed');
  const d: HeegaardDiagram = r.value;
  const a = analyzeDiagram(d);
  if (!a.ok) throw new Error('analysis failed');
  const on = new Set<number>();
  for (const c of d.curves) for (const v of c.vertices) on.add(v);
  const inRegion = a.value.regions.map((g) => {
    for (let f = 0; f < a.value.faces; f++) {
      if (a.value.faceRegion[f] !== g.id) continue;
      const v = [0, 1, 2].map((k) => d.mesh.heVert[3 * f + k]).find((x) => !on.has(x));
      if (v !== undefined) return vertexLabel(d, v);
    }
    throw new Error('no interior vertex');
  });
  const bigons = a.value.regions.filter((g) => g.corners.length === 2).map((g) => g.id);
  return { obj: writeObj(d), inRegion, crossings: a.value.points.map((p) => p.label), bigons };
}

async function run(args: string[], obj: string) {
  const out: string[] = [], err: string[] = [];
  const io = { out: (t: string) => out.push(t), err: (t: string) => err.push(t), readFile: () => new TextEncoder().encode(obj), writeFile: () => {} };
  const code = await main(['domain', 'diagram.obj', ...args], io);
  return { code, out: out.join(''), err: err.join('') };
}

describe('quadrant domain (command line)', () => {
  const f = fixture();

  it('reads a bigon of S^1 x S^2 as a domain with e = 1/2, n_x = n_y = 1/4 and μ = 1 (Lipshitz 2006)', async () => {
    const r = await run(['--coef', `${f.inRegion[f.bigons[0]]}=1`, '--json'], f.obj);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.out);
    expect(j).toMatchObject({ isDomain: true, eulerMeasure: '1/2', nx: '1/4', ny: '1/4', maslovIndex: '1', positive: true, nz: { z_1: 0 } });
    expect(Math.abs(j.geometricEulerMeasure - 0.5)).toBeLessThan(1e-9);
    expect([...j.from, ...j.to].sort()).toEqual([...f.crossings].sort());
  });

  it('prints readable text with every field', async () => {
    const r = await run([`--coef=${f.inRegion[f.bigons[0]]}=1`], f.obj);
    for (const k of ['from:', 'to:', 'isDomain: true', 'reason:', 'eulerMeasure: 1/2', 'geometricEulerMeasure:', 'nx: 1/4', 'ny: 1/4', 'nz: z_1 0', 'maslovIndex: 1', 'positive: true']) expect(r.out).toContain(k);
  });

  it('explains why a chain is not a domain from a given x', async () => {
    const bigon = f.bigons[0];
    const first = await run(['--coef', `${f.inRegion[bigon]}=1`, '--json'], f.obj);
    const to = JSON.parse(first.out).to as number[];
    const r = await run(['--coef', `${f.inRegion[bigon]}=1`, '--from', to.join(','), '--json'], f.obj);
    expect(JSON.parse(r.out)).toMatchObject({ isDomain: false });
    expect(JSON.parse(r.out).reason).toContain('not in x');
  });

  it('rejects a vertex on a curve (exit 1) and a missing --coef (exit 2)', async () => {
    const onCurve = await run(['--coef', `${f.crossings[0]}=1`], f.obj);
    expect(onCurve.code).toBe(1);
    expect(onCurve.err).toContain('lies on');
    const usage = await run([], f.obj);
    expect(usage.code).toBe(2);
  });
});
