import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { gridMeridian, gridTorusDiagram, lensSpaceDiagram, writeObj, type GridPath } from '../../geometry/index.js';
import { main } from './main.js';

const BIN = resolve(__dirname, '../../bin/quadrant.mjs');
const dir = mkdtempSync(join(tmpdir(), 'quadrant-cli-'));
const file = (name: string, text: string) => {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
};
const runBin = (...args: string[]) => spawnSync(process.execPath, [BIN, ...args], { encoding: 'utf8', timeout: 60_000 });

/** A tangency: beta touches the meridian alpha from one side at grid point (0, 5) (DESIGN.md: rejected). */
function tangentDiagramObj(): string {
  const grid = { R: 2, r: 0.8, nu: 8, nv: 12 };
  const col = (i: number, a: number, b: number): GridPath => Array.from({ length: b - a + 1 }, (_, k) => [i, a + k]);
  const beta: GridPath = [...col(2, 0, 4), [1, 4], [1, 5], [0, 5], [1, 6], ...col(2, 6, 11)];
  return writeObj(gridTorusDiagram({ grid, alpha: [gridMeridian(grid, 0)], beta: [beta], z: [[5, 5]] }));
}

describe('quadrant analyze (command line)', () => {
  it('prints one JSON object for L(3,1): 3 points, 3 rectangles, Euler measures summing to χ(T²) = 0 (Ozsváth–Szabó 2004; Lipshitz 2006)', () => {
    const p = file('lens-3-1.obj', writeObj(lensSpaceDiagram(3, 1, 3)));
    const r = runBin('analyze', p, '--json');
    expect(r.status).toBe(0);
    const json = JSON.parse(r.stdout);
    expect(json.surface).toMatchObject({ vertices: 27, faces: 54, eulerCharacteristic: 0, genus: 1 });
    expect(Math.abs(json.surface.totalCurvature)).toBeLessThan(1e-9);
    expect([json.alpha, json.beta]).toEqual([1, 1]);
    expect(json.basepoints.map((b: { name: string }) => b.name)).toEqual(['z_1']);
    expect(json.intersections).toHaveLength(3);
    for (const x of json.intersections) expect([x.alpha, x.beta, Math.abs(x.sign)]).toEqual([1, 1, 1]);
    expect(json.regions).toHaveLength(3);
    for (const g of json.regions) {
      expect([g.eulerCharacteristic, g.convexCorners, g.reflexCorners, g.eulerMeasure]).toEqual([1, 4, 0, 0]); // rectangles: e = 0
      expect(Math.abs(g.geometricEulerMeasure)).toBeLessThan(1e-9);
      expect(Object.keys(g.curvature).sort()).toEqual(['boundary', 'corners', 'interior']);
    }
    expect(json.eulerMeasureTotal).toBe(0);
  });

  it('prints readable text by default', () => {
    const p = file('lens-2-1.obj', writeObj(lensSpaceDiagram(2, 1, 3)));
    const r = runBin('analyze', p);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('intersection points (2):');
    expect(r.stdout).toContain('alpha_1 ∩ beta_1');
    expect(r.stdout).toContain('sum of Euler measures: 0');
  });

  it('ends the text report with H_1 = Z/3 and HF-hat of rank 3 for L(3,1), one generator per spin^c class (Ozsváth–Szabó 2004)', () => {
    const p = file('lens-3-1-text.obj', writeObj(lensSpaceDiagram(3, 1, 3)));
    const r = runBin('analyze', p);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('H_1(Y) = Z/3');
    expect(r.stdout).toContain('HF-hat: rank 3');
    expect(r.stdout).toMatch(/signed count of generators: -?3 \(det M = -?3, ±\|H_1\| = ±3\) — agrees/);
    expect(r.stdout.match(/spin\^c .*: 1 generator, rank 1/g)).toHaveLength(3);
  });

  it('exits non-zero with the validation message and no stack trace on a tangency', () => {
    const p = file('tangent.obj', tangentDiagramObj());
    const r = runBin('analyze', p, '--json');
    expect(r.status).toBe(1);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain('alpha_1 and beta_1 touch at vertex');
    expect(r.stderr).not.toMatch(/\n\s+at /);
  });

  it('exits non-zero on a file that is not a surface, and on a missing file', () => {
    const p = file('broken.obj', 'v 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 3\n');
    const r = runBin('analyze', p);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('is not a valid Heegaard diagram');
    expect(r.stderr).not.toMatch(/\n\s+at /);
    const missing = runBin('analyze', join(dir, 'nowhere.obj'));
    expect(missing.status).toBe(1);
    expect(missing.stderr).toContain('no such file');
  });

  it('dispatches through the registry in-process: --help lists analyze, unknown commands exit 2', async () => {
    const out: string[] = [], err: string[] = [];
    const io = { out: (t: string) => out.push(t), err: (t: string) => err.push(t), readFile: () => new Uint8Array(), writeFile: () => {} };
    expect(await main(['--help'], io)).toBe(0);
    expect(out.join('')).toContain('analyze FILE [--json]');
    expect(await main(['frobnicate'], io)).toBe(2);
    expect(err.join('')).toContain("unknown command 'frobnicate'");
  });
});
