import { describe, expect, it } from 'vitest';
import { readObj, writeObj } from './obj.js';
import { parseDiagramFile } from './diagram-file.js';
import { torusGrid, torusGridVertex } from '../surfaces/torus.js';

const o = { R: 3, r: 1, nu: 8, nv: 6 };

/** A genus-1 diagram as OBJ text: alpha_1 a meridian (column 0), beta_1 a longitude (row 0), z_1 off both. */
function torusObj(style: { negative?: boolean; slashes?: boolean; segments?: boolean } = {}): string {
  const { pos, tris } = torusGrid(o);
  const lines: string[] = ['# genus-1 test diagram, Lattice Harbor Topology Group'];
  const n = pos.length / 3;
  for (let v = 0; v < n; v++) lines.push(`v ${pos[3 * v]} ${pos[3 * v + 1]} ${pos[3 * v + 2]}${v === 0 ? ' 1.0' : ''}`);
  lines.push('vt 0 0', 'vn 0 0 1');
  const ref = (v: number) => {
    const i = style.negative ? String(v - n) : String(v + 1);
    return style.slashes ? (v % 2 ? `${i}/1/1` : `${i}//1`) : i;
  };
  for (let f = 0; f < tris.length / 3; f++) lines.push(`f ${ref(tris[3 * f])} ${ref(tris[3 * f + 1])} ${ref(tris[3 * f + 2])}`);
  const alpha = Array.from({ length: o.nv }, (_, j) => torusGridVertex(o, 0, j));
  const beta = Array.from({ length: o.nu }, (_, i) => torusGridVertex(o, i, 0));
  const curve = (name: string, cyc: number[]) => {
    lines.push(`g ${name}`);
    if (style.segments) cyc.forEach((v, k) => lines.push(`l ${ref(v)} ${ref(cyc[(k + 1) % cyc.length])}`));
    else lines.push(`l ${[...cyc, cyc[0]].map(ref).join(' ')}`);
  };
  curve('alpha_1', alpha);
  lines.push('o beta_1');
  lines.pop();
  curve('beta_1', beta);
  lines.push('g z_1', `p ${ref(torusGridVertex(o, 4, 3))}`);
  return lines.join('\n');
}

describe('OBJ reader', () => {
  it('reads a torus diagram with closed polylines, giving chi = 0 (do Carmo 1976)', () => {
    const r = parseDiagramFile('torus.obj', torusObj());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.stats.eulerCharacteristic).toBe(0);
    expect(r.value.diagram.curves.map((c) => `${c.family}_${c.index + 1}:${c.vertices.length}`)).toEqual(['alpha_1:6', 'beta_1:8']);
    expect(r.value.diagram.basepoints).toEqual([{ kind: 'z', index: 0, vertex: torusGridVertex(o, 4, 3) }]);
    expect(r.value.warnings).toEqual([]);
  });

  it('reads negative indices and v/vt/vn and v//vn references the same way (OBJ specification, "Referencing vertex data")', () => {
    const plain = readObj(torusObj());
    const fancy = readObj(torusObj({ negative: true, slashes: true, segments: true }));
    expect(plain.ok && fancy.ok).toBe(true);
    if (!plain.ok || !fancy.ok) return;
    expect(Array.from(fancy.value.tris)).toEqual(Array.from(plain.value.tris));
    const a = parseDiagramFile('x.OBJ', torusObj({ negative: true, slashes: true, segments: true }));
    expect(a.ok && a.value.diagram.curves[1].vertices.length).toBe(8);
  });

  it('fan-triangulates polygons and merges duplicate positions, keeping first file numbers as labels', () => {
    const text = ['v 0 0 0', 'v 1 0 0', 'v 1 1 0', 'v 0 1 0', 'v 1 0 0', 'f 1 5 3 4'].join('\n');
    const r = readObj(text);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(Array.from(r.value.tris)).toEqual([0, 1, 2, 0, 2, 3]);
    expect(Array.from(r.value.vertexLabels)).toEqual([1, 2, 3, 4]);
  });

  it('gives line numbers for bad input and never throws', () => {
    const bad = (text: string) => {
      const r = readObj(text);
      expect(r.ok).toBe(false);
      return r.ok ? null : r.errors[0];
    };
    expect(bad('v 0 0 0\nv 1 zero 0')).toMatchObject({ code: 'bad-number', line: 2 });
    expect(bad('v 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 4')).toMatchObject({ code: 'bad-index', line: 4 });
    expect(bad('v 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 0')).toMatchObject({ code: 'bad-index', line: 4 });
    expect(bad('v 0 0 0\nv 1 0 0\nf 1 2')).toMatchObject({ code: 'short-face', line: 3 });
    expect(bad('v 0 0 0\ng alpha_0\nl 1 1')).toMatchObject({ code: 'bad-name', line: 2 });
    expect(bad('v 0 0 0\nv 1 0 0\ng z_1\np 1\np 2')!.message).toContain('z_1 is given 2 points');
  });

  it('ignores a UTF-8 byte-order mark before the first line (Unicode 15, §23.8)', () => {
    const bytes = Uint8Array.from([0xef, 0xbb, 0xbf, ...'v 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 3\n'].map((c) => (typeof c === 'number' ? c : c.charCodeAt(0))));
    const r = readObj(bytes);
    expect(r.ok && Array.from(r.value.tris)).toEqual([0, 1, 2]);
    expect(readObj('\ufeffv 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 3').ok).toBe(true);
  });

  it('warns about polylines outside curve groups', () => {
    const r = readObj('v 0 0 0\nv 1 0 0\ng wires\nl 1 2\nl 2 1');
    expect(r.ok && r.value.warnings.map((w) => w.code)).toEqual(['ignored-polyline']);
  });
});

describe('assembling curves from a file', () => {
  const withCurve = (extra: string[]) => {
    const base = torusObj().split('\n').filter((l) => !/^(g|l|p)\b/.test(l));
    return parseDiagramFile('t.obj', [...base, ...extra].join('\n'));
  };
  const messages = (r: ReturnType<typeof withCurve>) => (r.ok ? [] : r.errors.map((e) => e.message));
  const v = (i: number, j: number) => torusGridVertex(o, i, j) + 1;

  it('says where a curve stops when it is not closed', () => {
    expect(messages(withCurve(['g alpha_1', `l ${v(0, 0)} ${v(0, 1)} ${v(0, 2)}`]))).toEqual([
      `alpha_1 is not closed: it ends at vertex ${v(0, 0)}.`, `alpha_1 is not closed: it ends at vertex ${v(0, 2)}.`,
    ]);
  });

  it('says where a curve branches', () => {
    const col = Array.from({ length: 7 }, (_, j) => v(0, j % 6)).join(' ');
    const m = messages(withCurve(['g beta_1', `l ${col}`, `l ${v(0, 0)} ${v(1, 0)} ${v(2, 1)} ${v(2, 2)} ${v(1, 2)} ${v(0, 2)}`]));
    expect(m).toContain(`beta_1 branches at vertex ${v(0, 0)} (3 of its edges meet there).`);
  });

  it('names an edge that is not on the surface', () => {
    const m = messages(withCurve(['g alpha_1', `l ${v(0, 0)} ${v(3, 3)} ${v(0, 1)} ${v(0, 0)}`]));
    expect(m).toContain(`alpha_1 uses an edge ${v(0, 0)}–${v(3, 3)} that is not an edge of the surface.`);
  });

  it('reports a missing curve number and a curve made of two loops', () => {
    const m = messages(withCurve(['g alpha_2', `l ${Array.from({ length: 7 }, (_, j) => v(0, j % 6)).join(' ')}`]));
    expect(m[0]).toMatch(/^alpha_1 is missing/);
    const two = messages(withCurve(['g alpha_1', `l ${Array.from({ length: 7 }, (_, j) => v(0, j % 6)).join(' ')}`, `l ${Array.from({ length: 7 }, (_, j) => v(4, j % 6)).join(' ')}`]));
    expect(two[0]).toMatch(/^alpha_1 is made of several separate loops/);
  });

  it('rejects a basepoint on a curve', () => {
    const m = messages(withCurve(['g alpha_1', `l ${Array.from({ length: 7 }, (_, j) => v(0, j % 6)).join(' ')}`, 'g z_1', `p ${v(0, 3)}`]));
    expect(m).toEqual([`z_1 sits at vertex ${v(0, 3)}, which lies on alpha_1; a basepoint must be off every curve.`]);
  });

  it('returns surface problems as the errors of parseDiagramFile', () => {
    const r = parseDiagramFile('open.obj', 'v 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 3');
    expect(r.ok ? [] : r.errors.map((e) => e.code)).toEqual(['open-boundary', 'open-boundary', 'open-boundary']);
    const unknown = parseDiagramFile('mesh.dae', 'x');
    expect(unknown.ok ? '' : unknown.errors[0].code).toBe('unknown-format');
  });
});

describe('OBJ writer', () => {
  it('writes a diagram that reads back into the same vertices, triangles, curves and basepoints (common practice: round trip)', () => {
    const first = parseDiagramFile('t.obj', torusObj({ segments: true }));
    expect(first.ok).toBe(true);
    if (!first.ok) return;
    const d = first.value.diagram;
    const again = parseDiagramFile('t.obj', writeObj(d));
    expect(again.ok).toBe(true);
    if (!again.ok) return;
    const e = again.value.diagram;
    expect(e.mesh.nV).toBe(d.mesh.nV);
    expect(Array.from(e.mesh.heVert.subarray(0, 3 * e.mesh.nF))).toEqual(Array.from(d.mesh.heVert.subarray(0, 3 * d.mesh.nF)));
    expect(Array.from(e.mesh.pos)).toEqual(Array.from(d.mesh.pos));
    expect(e.curves.map((c) => [c.family, c.index, Array.from(c.vertices)])).toEqual(d.curves.map((c) => [c.family, c.index, Array.from(c.vertices)]));
    expect(e.basepoints).toEqual(d.basepoints);
  });
});
