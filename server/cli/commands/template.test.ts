import { describe, expect, it } from 'vitest';
import { main } from '../main.js';
import type { CliIO } from '../command.js';
import { analyzeDiagram, buildTemplate, parseDiagramFile, type HeegaardDiagram } from '../../../geometry/index.js';

/** In-memory files so commands run in-process. */
function memoryIO() {
  const files = new Map<string, string | Uint8Array>();
  const out: string[] = [], err: string[] = [];
  const io: CliIO = {
    out: (t) => { out.push(t); }, err: (t) => { err.push(t); },
    readFile: (p) => {
      const f = files.get(p);
      if (f === undefined) throw Object.assign(new Error('missing'), { code: 'ENOENT' });
      return typeof f === 'string' ? new TextEncoder().encode(f) : f;
    },
    writeFile: (p, t) => { files.set(p, t); },
  };
  return { io, files, out, err };
}
const read = (files: Map<string, string | Uint8Array>, name: string): HeegaardDiagram => {
  const r = parseDiagramFile(name, files.get(name) as string);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.value.diagram;
};
/** Curves as rotation-normalised vertex lists, for comparing diagrams. */
const curveKey = (d: HeegaardDiagram) => d.curves.map((c) => {
  const v = Array.from(c.vertices), k = v.indexOf(Math.min(...v));
  return `${c.family}_${c.index}:${[...v.slice(k), ...v.slice(0, k)].join(',')}`;
}).sort();

describe('quadrant template / twist / subdivide', () => {
  it('writes an L(5,2) OBJ that reads back into the same diagram (common practice: lossless round trip)', async () => {
    const { io, files } = memoryIO();
    expect(await main(['template', 'lens', '--p', '5', '--q', '2', '--out', 'l.obj'], io)).toBe(0);
    const back = read(files, 'l.obj');
    const built = buildTemplate({ kind: 'lens', p: 5, q: 2 });
    if (!built.ok) throw new Error('template failed');
    expect(back.mesh.nV).toBe(built.value.mesh.nV);
    expect(back.mesh.nF).toBe(built.value.mesh.nF);
    expect(curveKey(back)).toEqual(curveKey(built.value));
    expect(back.basepoints.map((b) => [b.kind, b.vertex])).toEqual(built.value.basepoints.map((b) => [b.kind, b.vertex]));
  });

  it('builds S^3, S^1 x S^2 and grid files that analyse cleanly', async () => {
    const { io, files } = memoryIO();
    expect(await main(['template', 's3', '--genus', '2', '--out', 'a.obj'], io)).toBe(0);
    expect(await main(['template', 's1xs2', '--genus', '1', '--out', 'b.obj'], io)).toBe(0);
    expect(await main(['template', 'grid', '--x', '1,2,0', '--o', '0,1,2', '--out', 'c.obj'], io)).toBe(0);
    for (const f of ['a.obj', 'b.obj', 'c.obj']) expect(analyzeDiagram(read(files, f)).ok).toBe(true);
    expect(read(files, 'c.obj').basepoints.filter((b) => b.kind === 'w').length).toBe(3);
  });

  it('twists and subdivides a file, keeping 5 intersection points of L(5,2) (Ozsváth–Szabó 2004)', async () => {
    const { io, files } = memoryIO();
    await main(['template', 'lens', '--p', '5', '--q', '2', '--resolution', '12', '--out', 'l.obj'], io);
    expect(await main(['twist', 'l.obj', '--curve', 'beta_1', '--along', 'alpha_1', '--negative', '--out', 't.obj'], io)).toBe(0);
    expect(await main(['subdivide', 't.obj', '--loop', '--out', 's.obj'], io)).toBe(0);
    const a = analyzeDiagram(read(files, 's.obj'));
    expect(a.ok && a.value.points.length).toBe(5);
  });

  it('answers bad input with a sentence and exit code 1, and bad usage with exit code 2', async () => {
    const { io, err } = memoryIO();
    expect(await main(['template', 'lens', '--p', '6', '--q', '4', '--out', 'x.obj'], io)).toBe(1);
    expect(err.join('\n')).toMatch(/gcd/);
    expect(await main(['template', 'grid', '--x', '0,1', '--o', '0,1', '--out', 'x.obj'], io)).toBe(1);
    expect(await main(['template', 'lens', '--p', '5', '--out', 'x.obj'], io)).toBe(2);
    expect(await main(['template', 'lens', '--p', '5', '--q', '2', '--out', 'x.txt'], io)).toBe(1);
    expect(await main(['twist', 'missing.obj', '--curve', 'beta_1', '--along', 'alpha_1', '--out', 'x.obj'], io)).toBe(1);
    expect(await main(['subdivide', '--out', 'x.obj'], io)).toBe(2);
  });
});
