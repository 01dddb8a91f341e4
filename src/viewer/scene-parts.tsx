/**
 * The pieces of the 3D scene: the surface (non-indexed, so each face carries its own colour), face overlays,
 * curve tubes, point markers, the drawing path and the label projector. Only src/viewer imports three.
 */
import { useEffect, useMemo } from 'react';
import { useFrame, useThree, type ThreeEvent } from '@react-three/fiber';
import * as THREE from 'three';
import { palette, CURVE_COLORS, BASEPOINT_COLORS } from '../lib/palette';
import { hexToRgb } from './color-scale';
import { barycentric, cornerColors, faceSoup, maskedFaces, tubeAlongCycle } from './mesh-buffers';
import type { ViewerCurve, ViewerPick, ViewerPoint, Vec3 } from './types';

/** Scale of decorations, from the mesh's mean edge length and size. */
export interface SceneScale {
  tube: number;
  lift: number;
}

const NO_RAYCAST = () => null;

/**
 * A press and release within this many pixels is a click. Clicks are detected from pointerdown/up on the
 * object itself rather than the DOM click event, which the orbit controls' pointer capture can redirect.
 */
export const TAP_SLOP = 4;

interface SurfaceProps {
  positions: Float32Array;
  triangles: Uint32Array;
  normals: Float32Array;
  faceColors?: Float32Array | null;
  vertexColors?: Float32Array | null;
  showEdges: boolean;
  surfaceRef: React.RefObject<THREE.Mesh | null>;
  onMove: (e: ThreeEvent<PointerEvent>) => void;
  onOut: () => void;
  onDown: (e: ThreeEvent<PointerEvent>) => void;
  onUp: (e: ThreeEvent<PointerEvent>) => void;
  onContext: (e: ThreeEvent<MouseEvent>) => void;
}

/** The surface itself: corner positions, smooth normals, per-corner colours. */
export function SurfaceMesh(p: SurfaceProps) {
  const invalidate = useThree((s) => s.invalidate);
  const geometry = useMemo(() => {
    const soup = faceSoup(p.positions, p.triangles, p.normals);
    const g = new THREE.BufferGeometry();
    g.setAttribute('position', new THREE.BufferAttribute(soup.positions, 3));
    g.setAttribute('normal', new THREE.BufferAttribute(soup.normals, 3));
    g.computeBoundingSphere();
    return g;
  }, [p.positions, p.triangles, p.normals]);
  useEffect(() => {
    const base = hexToRgb(palette.meshBase);
    geometry.setAttribute('color', new THREE.BufferAttribute(cornerColors(p.triangles, base, p.faceColors, p.vertexColors), 3));
    invalidate();
  }, [geometry, p.triangles, p.faceColors, p.vertexColors, invalidate]);
  useEffect(() => () => geometry.dispose(), [geometry]);
  return (
    <group>
      <mesh
        ref={p.surfaceRef}
        geometry={geometry}
        onPointerMove={p.onMove}
        onPointerOut={p.onOut}
        onPointerDown={p.onDown}
        onPointerUp={p.onUp}
        onContextMenu={p.onContext}
      >
        <meshLambertMaterial vertexColors side={THREE.DoubleSide} polygonOffset polygonOffsetFactor={1} polygonOffsetUnits={1} />
      </mesh>
      {p.showEdges && (
        <mesh geometry={geometry} raycast={NO_RAYCAST}>
          <meshBasicMaterial color={palette.meshEdge} wireframe transparent opacity={0.5} />
        </mesh>
      )}
    </group>
  );
}

/** Faces of a mask drawn as a translucent layer just above the surface. */
export function FaceOverlay(p: {
  positions: Float32Array;
  triangles: Uint32Array;
  normals: Float32Array;
  mask: Uint8Array | null | undefined;
  lift: number;
  color: string;
  opacity: number;
}) {
  const geometry = useMemo(() => {
    if (!p.mask) return null;
    const g = new THREE.BufferGeometry();
    g.setAttribute('position', new THREE.BufferAttribute(maskedFaces(p.positions, p.triangles, p.normals, p.mask, p.lift), 3));
    return g;
  }, [p.positions, p.triangles, p.normals, p.mask, p.lift]);
  useEffect(() => () => geometry?.dispose(), [geometry]);
  if (!geometry) return null;
  return (
    <mesh geometry={geometry} raycast={NO_RAYCAST} renderOrder={2}>
      <meshBasicMaterial color={p.color} transparent opacity={p.opacity} depthWrite={false} side={THREE.DoubleSide} />
    </mesh>
  );
}

/** One curve as a tube slightly above the surface. */
export function CurveTube(p: { positions: Float32Array; normals: Float32Array; curve: ViewerCurve; scale: SceneScale; highlighted: boolean }) {
  const geometry = useMemo(() => {
    const radius = p.highlighted ? p.scale.tube * 1.9 : p.scale.tube;
    const t = tubeAlongCycle(p.positions, p.normals, p.curve.vertices, radius, p.scale.lift, 8);
    const g = new THREE.BufferGeometry();
    g.setAttribute('position', new THREE.BufferAttribute(t.positions, 3));
    g.setAttribute('normal', new THREE.BufferAttribute(t.normals, 3));
    g.setIndex(new THREE.BufferAttribute(t.indices, 1));
    return g;
  }, [p.positions, p.normals, p.curve, p.scale, p.highlighted]);
  useEffect(() => () => geometry.dispose(), [geometry]);
  return (
    <mesh geometry={geometry} raycast={NO_RAYCAST}>
      <meshLambertMaterial color={CURVE_COLORS[p.curve.family]} emissive={CURVE_COLORS[p.curve.family]} emissiveIntensity={0.25} />
    </mesh>
  );
}

/** Spheres on intersection points and basepoints; hovering or clicking one reports it. */
export function PointMarkers(p: {
  positions: Float32Array;
  normals: Float32Array;
  points: ViewerPoint[];
  scale: SceneScale;
  highlight?: ReadonlySet<string>;
  onHover: (pick: ViewerPick | null) => void;
  onPick: (pick: ViewerPick) => void;
}) {
  const sphere = useMemo(() => new THREE.SphereGeometry(1, 16, 12), []);
  const taps = useMemo(() => new Map<string, [number, number]>(), []);
  useEffect(() => () => sphere.dispose(), [sphere]);
  return (
    <group>
      {p.points.map((pt) => {
        const v = pt.vertex * 3;
        const lift = p.scale.lift * 1.5;
        const pos: Vec3 = [
          p.positions[v] + lift * p.normals[v],
          p.positions[v + 1] + lift * p.normals[v + 1],
          p.positions[v + 2] + lift * p.normals[v + 2],
        ];
        const isBase = pt.kind !== 'intersection';
        const lit = p.highlight?.has(pt.id) ?? false;
        const r = p.scale.tube * (isBase ? 2.6 : 1.7) * (lit ? 1.6 : 1);
        const color = pt.kind === 'intersection' ? (lit ? palette.focus : palette.ink) : BASEPOINT_COLORS[pt.kind];
        const pick = (e: ThreeEvent<MouseEvent | PointerEvent>, button: number): ViewerPick => ({
          kind: 'point', id: pt.id, clientX: e.clientX, clientY: e.clientY, shiftKey: e.shiftKey, button,
        });
        return (
          <mesh
            key={pt.id}
            geometry={sphere}
            position={pos}
            scale={r}
            onPointerMove={(e) => { e.stopPropagation(); p.onHover(pick(e, 0)); }}
            onPointerOut={() => p.onHover(null)}
            onPointerDown={(e) => { e.stopPropagation(); taps.set(pt.id, [e.clientX, e.clientY]); }}
            onPointerUp={(e) => {
              e.stopPropagation();
              const d = taps.get(pt.id);
              taps.delete(pt.id);
              if (d && Math.hypot(e.clientX - d[0], e.clientY - d[1]) <= TAP_SLOP) p.onPick(pick(e, e.button));
            }}
          >
            <meshLambertMaterial color={color} emissive={color} emissiveIntensity={lit ? 0.6 : 0.2} />
          </mesh>
        );
      })}
    </group>
  );
}

/** The points picked so far while drawing, joined by a line. */
export function DrawPath(p: { path: Vec3[]; family: 'alpha' | 'beta'; scale: SceneScale }) {
  const color = CURVE_COLORS[p.family];
  const line = useMemo(() => {
    const g = new THREE.BufferGeometry();
    g.setAttribute('position', new THREE.BufferAttribute(new Float32Array(p.path.flat()), 3));
    const l = new THREE.Line(g, new THREE.LineBasicMaterial({ color }));
    l.raycast = () => {};
    return l;
  }, [p.path, color]);
  useEffect(() => () => { line.geometry.dispose(); (line.material as THREE.Material).dispose(); }, [line]);
  return (
    <group>
      {p.path.map((q, i) => (
        <mesh key={i} position={q} scale={p.scale.tube * 2} raycast={NO_RAYCAST}>
          <sphereGeometry args={[1, 10, 8]} />
          <meshBasicMaterial color={i === 0 ? palette.ink : color} />
        </mesh>
      ))}
      {p.path.length > 1 && <primitive object={line} />}
    </group>
  );
}

/** A label anchored at a world point; hidden when its surface normal faces away from the camera. */
export interface LabelAnchor {
  id: string;
  position: Vec3;
  normal: Vec3;
}

/**
 * Moves DOM labels (rendered over the canvas by SurfaceView) to their projected positions every frame.
 * O(labels) per frame.
 */
export function LabelProjector(p: { anchors: LabelAnchor[]; elements: React.RefObject<Map<string, HTMLElement>> }) {
  const invalidate = useThree((s) => s.invalidate);
  useEffect(() => invalidate(), [p.anchors, invalidate]);
  const tmp = useMemo(() => new THREE.Vector3(), []);
  useFrame(({ camera, size }) => {
    const els = p.elements.current;
    if (!els) return;
    for (const a of p.anchors) {
      const el = els.get(a.id);
      if (!el) continue;
      const dx = camera.position.x - a.position[0], dy = camera.position.y - a.position[1], dz = camera.position.z - a.position[2];
      const facing = dx * a.normal[0] + dy * a.normal[1] + dz * a.normal[2] > 0;
      tmp.set(a.position[0], a.position[1], a.position[2]).project(camera);
      const inside = tmp.z < 1 && Math.abs(tmp.x) <= 1 && Math.abs(tmp.y) <= 1;
      if (!facing || !inside) { el.style.visibility = 'hidden'; continue; }
      const x = ((tmp.x + 1) / 2) * size.width, y = ((1 - tmp.y) / 2) * size.height;
      el.style.visibility = 'visible';
      el.style.transform = `translate(${x.toFixed(1)}px, ${y.toFixed(1)}px)`;
    }
  });
  return null;
}

/** Pointer event → face pick with barycentric coordinates from the hit point. */
export function facePick(e: ThreeEvent<MouseEvent | PointerEvent>, positions: Float32Array, triangles: Uint32Array, button: number): ViewerPick | null {
  const f = e.faceIndex;
  if (f === undefined || f === null || 3 * f + 2 >= triangles.length) return null;
  const corner = (k: number): Vec3 => {
    const v = triangles[3 * f + k] * 3;
    return [positions[v], positions[v + 1], positions[v + 2]];
  };
  const point: Vec3 = [e.point.x, e.point.y, e.point.z];
  return {
    kind: 'face', face: f, point, barycentric: barycentric(point, corner(0), corner(1), corner(2)),
    clientX: e.clientX, clientY: e.clientY, shiftKey: e.shiftKey, button,
  };
}
