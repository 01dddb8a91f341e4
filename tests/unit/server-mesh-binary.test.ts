import { describe, expect, it } from 'vitest';
import {
  decodeFloat32Base64, decodeInt32Base64, decodeMeshBinary, encodeFloat32Base64, encodeInt32Base64,
  encodeMeshBinary, MeshBinaryError, type MeshBinary,
} from '../../server/contract/mesh-binary.js';

/** A regular tetrahedron, faces counter-clockwise from outside (common practice), with one curve. */
function tetrahedron(withLabels: boolean): MeshBinary {
  const positions = Float32Array.from([1, 1, 1, 1, -1, -1, -1, 1, -1, -1, -1, 1]);
  const triangles = Uint32Array.from([0, 1, 2, 0, 3, 1, 0, 2, 3, 1, 3, 2]);
  return {
    positions,
    triangles,
    curves: [{ family: 'alpha', index: 0, vertices: Uint32Array.from([0, 1, 2]) }],
    basepoints: [{ kind: 'z', index: 0, vertex: 3 }],
    ...(withLabels ? { vertexLabels: Int32Array.from([10, 20, 30, 40]) } : {}),
  };
}

describe('QDM1 mesh binary', () => {
  it('round-trips positions, triangles, curves, basepoints and vertex labels', () => {
    const m = tetrahedron(true);
    const back = decodeMeshBinary(encodeMeshBinary(m));
    expect(back).toEqual(m);
  });

  it('round-trips a mesh without labels and starts with the magic QDM1', () => {
    const buf = encodeMeshBinary(tetrahedron(false));
    expect(new TextDecoder().decode(new Uint8Array(buf, 0, 4))).toBe('QDM1');
    const back = decodeMeshBinary(buf);
    expect(back.vertexLabels).toBeUndefined();
    expect(back.triangles).toEqual(tetrahedron(false).triangles);
  });

  it('reads from a view with a byte offset (as a Node Buffer slice is)', () => {
    const buf = encodeMeshBinary(tetrahedron(true));
    const padded = new Uint8Array(buf.byteLength + 3);
    padded.set(new Uint8Array(buf), 3);
    expect(decodeMeshBinary(padded.subarray(3))).toEqual(tetrahedron(true));
  });

  it('refuses truncated and foreign data with a MeshBinaryError', () => {
    const buf = encodeMeshBinary(tetrahedron(true));
    expect(() => decodeMeshBinary(buf.slice(0, buf.byteLength - 2))).toThrow(MeshBinaryError);
    expect(() => decodeMeshBinary(new TextEncoder().encode('not a mesh at all, really'))).toThrow(MeshBinaryError);
  });

  it('round-trips per-face Int32 and per-vertex Float32 arrays through base64', () => {
    const ints = Int32Array.from({ length: 40_000 }, (_, i) => (i * 7919) % 1000 - 500);
    expect(decodeInt32Base64(encodeInt32Base64(ints))).toEqual(ints);
    const floats = Float32Array.from([0, Math.PI, -1.5, 1e-7]);
    expect(decodeFloat32Base64(encodeFloat32Base64(floats))).toEqual(floats);
  });
});
