import { describe, expect, it } from 'vitest';
import { buildTriMesh } from '../mesh/tri-mesh.js';
import type { HeegaardDiagram } from '../diagram/types.js';
import { genusSurface } from '../surfaces/genus.js';
import { sphereMesh } from '../surfaces/sphere.js';
import { parseDiagramFile } from './diagram-file.js';
import { readObj, writeObj } from './obj.js';
import { readOff, writeOff } from './off.js';
import { readPly, writePly } from './ply.js';
import { readStl, writeStl } from './stl.js';
import { asBytes } from './text.js';

/** The standard genus-2 diagram of S^3 built by code (alpha_i ∩ beta_j = δ_ij), with z_1 and w_1. */
function genus2Diagram(): HeegaardDiagram {
  const s = genusSurface({ genus: 2, level: 1 });
  const { mesh } = buildTriMesh(s.pos, s.tris);
  const curves = [
    ...s.alphas.map((vertices, index) => ({ family: 'alpha' as const, index, vertices })),
    ...s.betas.map((vertices, index) => ({ family: 'beta' as const, index, vertices })),
  ];
  const onCurve = new Set(curves.flatMap((c) => Array.from(c.vertices)));
  const w = [...Array(mesh.nV).keys()].reverse().find((v) => !onCurve.has(v))!;
  return { mesh, curves, basepoints: [{ kind: 'z', index: 0, vertex: s.basepoint }, { kind: 'w', index: 0, vertex: w }] };
}

const same = (a: HeegaardDiagram, b: HeegaardDiagram) => {
  expect(b.mesh.nV).toBe(a.mesh.nV);
  expect(Array.from(b.mesh.heVert.subarray(0, 3 * b.mesh.nF))).toEqual(Array.from(a.mesh.heVert.subarray(0, 3 * a.mesh.nF)));
  expect(Array.from(b.mesh.pos.subarray(0, 3 * b.mesh.nV))).toEqual(Array.from(a.mesh.pos.subarray(0, 3 * a.mesh.nV)));
  expect(b.curves.map((c) => [c.family, c.index, Array.from(c.vertices)])).toEqual(a.curves.map((c) => [c.family, c.index, Array.from(c.vertices)]));
  expect(b.basepoints).toEqual(a.basepoints);
};

const parsed = (name: string, bytes: Uint8Array | string) => {
  const r = parseDiagramFile(name, bytes);
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('\n'));
  return r.value;
};

describe('round trips of every writer through its reader (common practice)', () => {
  const d = genus2Diagram();

  it('OBJ keeps vertices, triangles, curves and both basepoint kinds', () => {
    same(d, parsed('g2.obj', writeObj(d)).diagram);
  });

  it('ASCII and binary PLY keep the diagram, with genus 2 (χ = −2, common practice)', () => {
    for (const binary of [false, true]) {
      const r = parsed('g2.PLY', writePly(d, { binary }));
      same(d, r.diagram);
      expect(r.stats.genus).toBe(2);
    }
  });

  it('OFF keeps the surface', () => {
    const r = parsed('g2.off', writeOff(d.mesh));
    same({ ...d, curves: [], basepoints: [] }, r.diagram);
  });

  it('ASCII STL keeps the surface exactly; binary STL keeps it to float32 (vertices renumbered by first use)', () => {
    for (const binary of [false, true]) {
      const r = parsed('g2.stl', writeStl(d.mesh, { binary }));
      const m = r.diagram.mesh, round = binary ? Math.fround : (x: number) => x;
      expect([m.nV, m.nF, r.stats.eulerCharacteristic]).toEqual([d.mesh.nV, d.mesh.nF, -2]);
      for (let h = 0; h < 3 * m.nF; h++) {
        for (let k = 0; k < 3; k++) expect(m.pos[3 * m.heVert[h] + k]).toBe(round(d.mesh.pos[3 * d.mesh.heVert[h] + k]));
      }
    }
  });

  it('labels STL vertices by the first corner that uses them', () => {
    const { pos, tris } = sphereMesh(0);
    const r = readStl(writeStl(buildTriMesh(pos, tris).mesh, { binary: true }));
    expect(r.ok && r.value.vertexLabels.length).toBe(12);
    expect(r.ok && Array.from(r.value.vertexLabels.subarray(0, 4))).toEqual([1, 2, 3, 6]); // corners 0, 11, 5 | 0, 5, 1: the fourth new vertex is corner 6
  });
});

describe('binary and text errors', () => {
  const d = genus2Diagram();

  it('gives the byte offset where a truncated binary PLY ends', () => {
    const bytes = writePly(d, { binary: true });
    const cut = bytes.subarray(0, bytes.length - 100);
    const r = readPly(cut);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors[0]).toMatchObject({ code: 'truncated', offset: cut.length });
  });

  it('gives the byte offset where a truncated binary STL ends', () => {
    const bytes = writeStl(d.mesh, { binary: true });
    const cut = bytes.subarray(0, 84 + 50 * 3 + 7);
    const r = readStl(cut);
    expect(r.ok ? null : r.errors[0]).toMatchObject({ code: 'truncated', offset: cut.length });
    expect(r.ok ? '' : r.errors[0].message).toContain('inside triangle 4, which starts at byte 234');
    expect(readStl(bytes.subarray(0, 40)).ok).toBe(false);
  });

  it('gives line numbers for bad ASCII PLY and OFF', () => {
    const ply = 'ply\nformat ascii 1.0\nelement vertex 3\nproperty float x\nproperty float y\nproperty float z\nelement face 1\nproperty list uchar int vertex_indices\nend_header\n0 0 0\n1 0 0\n0 1 0\n3 0 1 7\n';
    const r = readPly(ply);
    expect(r.ok ? null : r.errors[0]).toMatchObject({ code: 'bad-index', line: 13 });
    const badNum = readPly(ply.replace('1 0 0', '1 x 0'));
    expect(badNum.ok ? null : badNum.errors[0]).toMatchObject({ code: 'bad-number', line: 11 });
    expect(readPly('plx\n').ok).toBe(false);
    const off = readOff('OFF\n3 1 0\n0 0 0\n1 0 0\n0 1 0\n3 0 1 3\n');
    expect(off.ok ? null : off.errors[0]).toMatchObject({ code: 'bad-index', line: 6 });
    const short = readOff('OFF 3 1 0\n0 0 0\n1 0 0\n');
    expect(short.ok ? null : short.errors[0]).toMatchObject({ code: 'truncated' });
  });

  it('reads PLY curve codes: +i is alpha_i, −i is beta_i; basepoint kind +i is z_i, −i is w_i', () => {
    const text = new TextDecoder().decode(writePly(d, { binary: false }));
    expect(text).toContain('element edge');
    const r = readPly(text);
    expect(r.ok && r.value.curves.map((c) => `${c.family}_${c.index + 1}`).sort()).toEqual(['alpha_1', 'alpha_2', 'beta_1', 'beta_2']);
    expect(r.ok && r.value.basepoints.map((b) => b.kind)).toEqual(['z', 'w']);
  });

  it('reads OFF with counts on the header line and polygons', () => {
    const r = readOff('OFF 4 1 0\n# a square\n0 0 0\n1 0 0\n1 1 0\n0 1 0\n4 0 1 2 3\n');
    expect(r.ok && Array.from(r.value.tris)).toEqual([0, 1, 2, 0, 2, 3]);
  });

  it('reads text given as bytes the same as text given as a string', () => {
    const text = writeObj(d);
    const a = readObj(text), b = readObj(asBytes(text));
    expect(a.ok && b.ok && Array.from(a.value.tris)).toEqual(b.ok && Array.from(b.value.tris));
  });
});
