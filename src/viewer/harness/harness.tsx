/**
 * Development harness: mounts SurfaceView on a generated torus with a meridian, a longitude, two
 * basepoints and region colours, outside the app. Served by `npx vite` at /src/viewer/harness/index.html;
 * never part of the production build.
 */
import { createRoot } from 'react-dom/client';
import { torusGrid, torusGridVertex } from '../../../geometry/surfaces/torus';
import '../../styles.css';
import SurfaceView from '../SurfaceView';
import { faceColorsFromRegions } from '../color-scale';
import type { SurfaceViewHandle } from '../types';

const o = { R: 2, r: 0.8, nu: 24, nv: 12 };
const { pos, tris } = torusGrid(o);
const positions = new Float32Array(pos);
const triangles = new Uint32Array(tris);
const meridian = Array.from({ length: o.nv }, (_, j) => torusGridVertex(o, 0, j));
const longitude = Array.from({ length: o.nu }, (_, i) => torusGridVertex(o, i, 0));
const faceRegion = Array.from({ length: triangles.length / 3 }, (_, f) => ((f / (2 * o.nv)) | 0) < o.nu / 2 ? 0 : 1);
const faceColors = faceColorsFromRegions(faceRegion, [0.5, -0.5], 1, [0.9, 0.9, 0.9]);
const selected = new Uint8Array(faceRegion.length).map((_, f) => (faceRegion[f] === 1 && f % 7 === 0 ? 1 : 0));
const handle: { current: SurfaceViewHandle | null } = { current: null };
(window as unknown as { __harness: unknown }).__harness = handle;

createRoot(document.getElementById('root')!).render(
  <SurfaceView
    positions={positions}
    triangles={triangles}
    faceColors={faceColors}
    curves={[
      { id: 'a0', family: 'alpha', label: 'α₁', vertices: meridian },
      { id: 'b0', family: 'beta', label: 'β₁', vertices: longitude },
    ]}
    points={[
      { id: 'x0', vertex: meridian[0], label: 'x₁', kind: 'intersection' },
      { id: 'z0', vertex: torusGridVertex(o, 6, 3), label: 'z', kind: 'z' },
      { id: 'w0', vertex: torusGridVertex(o, 15, 3), label: 'w', kind: 'w' },
    ]}
    selectedFaces={selected}
    ariaLabel="Test torus"
    handleRef={handle}
    renderTooltip={(p) => (p.kind === 'face' ? `face ${p.face}` : `point ${p.id}`)}
    onPick={(p) => console.log('pick', JSON.stringify(p))}
  />,
);
