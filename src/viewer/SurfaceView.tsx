/**
 * The 3D view of a Heegaard diagram: the triangulated surface, its curves as tubes, intersection points and
 * basepoints, DOM labels, a tooltip, face overlays, orbit/zoom with mouse and keyboard, and picking
 * (face + barycentric coordinates from the ray hit). Default export so pages can `lazy()` it: three.js,
 * react-three-fiber and drei load only with this chunk.
 */
import { useCallback, useEffect, useId, useImperativeHandle, useMemo, useRef, useState } from 'react';
import { Canvas, useThree, type ThreeEvent } from '@react-three/fiber';
import { OrbitControls } from '@react-three/drei';
import * as THREE from 'three';
import { palette } from '../lib/palette';
import { boundingSphere, faceCentroid, faceNormal, meanEdgeLength, vertexNormals } from './mesh-buffers';
import {
  CurveTube, DrawPath, FaceOverlay, LabelProjector, PointMarkers, SurfaceMesh, TAP_SLOP, facePick,
  type LabelAnchor, type SceneScale,
} from './scene-parts';
import type { SurfaceViewHandle, SurfaceViewProps, ViewerPick, Vec3 } from './types';

type ControlsLike = {
  target: THREE.Vector3;
  update(): void;
  saveState(): void;
  reset(): void;
};

interface RigProps {
  sphere: { center: Vec3; radius: number };
  surfaceRef: React.RefObject<THREE.Mesh | null>;
  positions: Float32Array;
  triangles: Uint32Array;
  handle: React.RefObject<SurfaceViewHandle | null>;
}

/** Camera placement, fit/reset/orbit/zoom and face projection; fills `handle`. */
function CameraRig({ sphere, surfaceRef, positions, triangles, handle }: RigProps) {
  const { camera, gl, invalidate, size, scene } = useThree();
  const controls = useThree((s) => s.controls) as unknown as ControlsLike | null;
  const raycaster = useMemo(() => new THREE.Raycaster(), []);
  const placed = useRef<string>('');

  const fitDistance = useCallback(() => {
    const vHalf = (((camera as THREE.PerspectiveCamera).fov ?? 40) * Math.PI) / 360;
    const hHalf = Math.atan(Math.tan(vHalf) * (size.width / Math.max(1, size.height)));
    return (sphere.radius / Math.sin(Math.min(vHalf, hHalf))) * 1.08;
  }, [camera, sphere.radius, size.width, size.height]);

  const place = useCallback((dir: THREE.Vector3) => {
    const c = new THREE.Vector3(...sphere.center);
    const d = fitDistance();
    camera.position.copy(c).addScaledVector(dir.normalize(), d);
    camera.near = d / 100;
    camera.far = d * 10;
    (camera as THREE.PerspectiveCamera).updateProjectionMatrix();
    camera.lookAt(c);
    if (controls) { controls.target.copy(c); controls.update(); }
    invalidate();
  }, [camera, controls, sphere.center, fitDistance, invalidate]);

  // First placement (and again when the mesh changes size): a three-quarter view from above.
  const key = `${sphere.center.join(',')}:${sphere.radius}`;
  useEffect(() => {
    if (placed.current === key || !controls) return;
    placed.current = key;
    place(new THREE.Vector3(0.45, -0.75, 0.9));
    controls.saveState();
  }, [key, controls, place]);

  useImperativeHandle(handle, () => ({
    fitView() {
      const c = controls?.target ?? new THREE.Vector3(...sphere.center);
      place(camera.position.clone().sub(c));
    },
    resetView() {
      if (controls) { controls.reset(); invalidate(); }
    },
    orbit(dTheta, dPhi) {
      if (!controls) return;
      const offset = camera.position.clone().sub(controls.target);
      const s = new THREE.Spherical().setFromVector3(offset.applyQuaternion(new THREE.Quaternion().setFromUnitVectors(camera.up, new THREE.Vector3(0, 1, 0))));
      s.theta += dTheta;
      s.phi = Math.min(Math.PI - 0.05, Math.max(0.05, s.phi + dPhi));
      const back = new THREE.Vector3().setFromSpherical(s).applyQuaternion(new THREE.Quaternion().setFromUnitVectors(new THREE.Vector3(0, 1, 0), camera.up));
      camera.position.copy(controls.target).add(back);
      controls.update();
      invalidate();
    },
    zoom(factor) {
      if (!controls) return;
      const offset = camera.position.clone().sub(controls.target).multiplyScalar(factor);
      camera.position.copy(controls.target).add(offset);
      controls.update();
      invalidate();
    },
    focusFace(face) {
      if (!controls || 3 * face + 2 >= triangles.length) return;
      const c = new THREE.Vector3(...faceCentroid(positions, triangles, face));
      const n = new THREE.Vector3(...faceNormal(positions, triangles, face));
      const dist = camera.position.distanceTo(controls.target);
      controls.target.copy(c);
      camera.position.copy(c).addScaledVector(n, dist);
      controls.update();
      invalidate();
    },
    projectFace(face) {
      const mesh = surfaceRef.current;
      if (!mesh || 3 * face + 2 >= triangles.length) return null;
      const c = faceCentroid(positions, triangles, face);
      const n = faceNormal(positions, triangles, face);
      const toCam = camera.position.clone().sub(new THREE.Vector3(...c));
      if (toCam.dot(new THREE.Vector3(...n)) <= 0) return null;
      const ndc = new THREE.Vector3(...c).project(camera);
      if (Math.abs(ndc.x) > 0.98 || Math.abs(ndc.y) > 0.98 || ndc.z >= 1) return null;
      raycaster.setFromCamera(new THREE.Vector2(ndc.x, ndc.y), camera);
      // The first thing the pointer would hit there must be this face (not a marker, not another fold).
      const hit = raycaster.intersectObjects(scene.children, true)[0];
      if (!hit || hit.object !== mesh || hit.faceIndex !== face) return null;
      const rect = gl.domElement.getBoundingClientRect();
      return { x: rect.left + ((ndc.x + 1) / 2) * rect.width, y: rect.top + ((1 - ndc.y) / 2) * rect.height };
    },
    snapshot(scale = 2) {
      const ratio = gl.getPixelRatio();
      gl.setPixelRatio(ratio * scale);
      gl.render(scene, camera);
      const url = gl.domElement.toDataURL('image/png');
      gl.setPixelRatio(ratio);
      invalidate();
      return url;
    },
  }), [camera, controls, gl, invalidate, place, positions, raycaster, scene, sphere.center, surfaceRef, triangles]);
  return null;
}

/** The tooltip keeps its own state so pointer moves re-render only it, not the scene. */
function Tooltip({ setter, render }: { setter: React.RefObject<(p: ViewerPick | null) => void>; render: (p: ViewerPick) => React.ReactNode }) {
  const [pick, setPick] = useState<ViewerPick | null>(null);
  useEffect(() => { setter.current = setPick; return () => { setter.current = () => {}; }; }, [setter]);
  if (!pick) return null;
  const content = render(pick);
  if (!content) return null;
  return (
    <div
      role="tooltip"
      className="pointer-events-none fixed z-20 max-w-xs rounded-md border border-line bg-surface px-3 py-2 text-xs text-ink shadow-lg"
      style={{ left: pick.clientX + 14, top: pick.clientY + 14 }}
    >
      {content}
    </div>
  );
}

const SUBTLE_TEXT_SHADOW = '0 0 3px #fff, 0 0 3px #fff, 0 0 2px #fff';

export default function SurfaceView(props: SurfaceViewProps) {
  const { positions, triangles, curves, points, onHover, onPick, renderTooltip } = props;
  const normals = useMemo(() => vertexNormals(positions, triangles), [positions, triangles]);
  const sphere = useMemo(() => boundingSphere(positions), [positions]);
  const scale: SceneScale = useMemo(() => {
    const edge = meanEdgeLength(positions, triangles);
    const tube = Math.min(edge * 0.16, sphere.radius * 0.012);
    return { tube, lift: tube * 0.9 };
  }, [positions, triangles, sphere.radius]);
  const surfaceRef = useRef<THREE.Mesh | null>(null);
  const handle = useRef<SurfaceViewHandle | null>(null);
  const labelEls = useRef(new Map<string, HTMLElement>());
  const setTooltip = useRef<(p: ViewerPick | null) => void>(() => {});
  const hoverKey = useRef('');
  const instructionsId = useId();

  useImperativeHandle(props.handleRef, () => ({
    fitView: () => handle.current?.fitView(),
    resetView: () => handle.current?.resetView(),
    orbit: (a, b) => handle.current?.orbit(a, b),
    zoom: (f) => handle.current?.zoom(f),
    focusFace: (f) => handle.current?.focusFace(f),
    projectFace: (f) => handle.current?.projectFace(f) ?? null,
    snapshot: (scale) => handle.current?.snapshot(scale) ?? null,
  }), []);

  const report = useCallback((pick: ViewerPick | null) => {
    setTooltip.current(pick);
    const k = pick ? (pick.kind === 'face' ? `f${pick.face}` : `p${pick.id}`) : '';
    if (k !== hoverKey.current) { hoverKey.current = k; onHover?.(pick); }
  }, [onHover]);

  const onMove = useCallback((e: ThreeEvent<PointerEvent>) => {
    report(facePick(e, positions, triangles, 0));
  }, [report, positions, triangles]);
  // Clicks: a press and release close together on the surface (see TAP_SLOP); button 2 is the secondary click.
  const press = useRef<{ x: number; y: number; button: number } | null>(null);
  const onDown = useCallback((e: ThreeEvent<PointerEvent>) => {
    press.current = { x: e.clientX, y: e.clientY, button: e.button };
  }, []);
  const onUp = useCallback((e: ThreeEvent<PointerEvent>) => {
    const d = press.current;
    press.current = null;
    if (!d || d.button !== e.button || Math.hypot(e.clientX - d.x, e.clientY - d.y) > TAP_SLOP) return;
    const pick = facePick(e, positions, triangles, e.button === 2 ? 2 : 0);
    if (pick) onPick?.(pick);
  }, [onPick, positions, triangles]);
  const onContext = useCallback((e: ThreeEvent<MouseEvent>) => { e.nativeEvent.preventDefault(); }, []);

  const anchors: LabelAnchor[] = useMemo(() => {
    const at = (v: number, lift: number): { position: Vec3; normal: Vec3 } => {
      const i = v * 3;
      const normal: Vec3 = [normals[i], normals[i + 1], normals[i + 2]];
      return { normal, position: [positions[i] + lift * normal[0], positions[i + 1] + lift * normal[1], positions[i + 2] + lift * normal[2]] };
    };
    const out: LabelAnchor[] = [];
    for (const p of points) out.push({ id: `p:${p.id}`, ...at(p.vertex, scale.lift * 3) });
    // Curve labels sit at the curve vertex farthest (along the cycle) from any marked point, so they do not
    // cover point labels. O(total curve length).
    const marked = new Set(points.map((p) => p.vertex));
    for (const c of curves) {
      const n = c.vertices.length;
      if (n === 0) continue;
      const dist = new Array<number>(n).fill(Infinity);
      for (let pass = 0; pass < 2; pass++) {
        let last = -Infinity;
        for (let k = 0; k < 2 * n; k++) {
          const i = pass === 0 ? k % n : (2 * n - 1 - k) % n;
          if (marked.has(c.vertices[i])) last = k;
          dist[i] = Math.min(dist[i], k - last);
        }
      }
      let best = Math.floor(n / 3);
      for (let i = 0; i < n; i++) if (dist[i] > dist[best]) best = i;
      out.push({ id: `c:${c.id}`, ...at(c.vertices[best], scale.lift * 3) });
    }
    return out;
  }, [points, curves, normals, positions, scale.lift]);

  const onKeyDown = (e: React.KeyboardEvent) => {
    const h = handle.current;
    if (!h) return;
    const step = e.shiftKey ? 0.3 : 0.1;
    const keys: Record<string, () => void> = {
      ArrowLeft: () => h.orbit(-step, 0), ArrowRight: () => h.orbit(step, 0),
      ArrowUp: () => h.orbit(0, -step), ArrowDown: () => h.orbit(0, step),
      '+': () => h.zoom(0.85), '=': () => h.zoom(0.85), '-': () => h.zoom(1 / 0.85),
      f: () => h.fitView(), r: () => h.resetView(),
    };
    const act = keys[e.key];
    if (act) { e.preventDefault(); act(); }
  };

  const showLabels = props.showLabels ?? true;
  return (
    <div
      className="group relative h-full w-full overflow-hidden focus-visible:outline-none"
      role="application"
      aria-roledescription="3D view"
      aria-label={props.ariaLabel}
      aria-describedby={instructionsId}
      tabIndex={0}
      onKeyDown={onKeyDown}
      onContextMenu={(e) => e.preventDefault()}
      data-testid="surface-view"
    >
      <p id={instructionsId} className="sr-only">
        Drag to orbit, scroll to zoom. With the keyboard: arrow keys orbit, plus and minus zoom, F fits the surface
        to the view, R resets the camera. Clicking a region selects it.
      </p>
      <Canvas
        frameloop="demand"
        dpr={[1, 1.5]}
        gl={{ antialias: true, preserveDrawingBuffer: true }}
        camera={{ fov: 40, position: [0, 0, 5] }}
        onPointerMissed={() => report(null)}
        style={{ background: palette.paper }}
      >
        <ambientLight intensity={1.1} />
        <directionalLight position={[3, -4, 6]} intensity={1.6} />
        <directionalLight position={[-4, 5, -3]} intensity={0.8} />
        <SurfaceMesh
          positions={positions}
          triangles={triangles}
          normals={normals}
          faceColors={props.faceColors}
          vertexColors={props.vertexColors}
          showEdges={props.showEdges ?? false}
          surfaceRef={surfaceRef}
          onMove={onMove}
          onOut={() => report(null)}
          onDown={onDown}
          onUp={onUp}
          onContext={onContext}
        />
        <FaceOverlay positions={positions} triangles={triangles} normals={normals} mask={props.warnFaces} lift={scale.lift * 0.3} color={palette.danger} opacity={0.35} />
        <FaceOverlay positions={positions} triangles={triangles} normals={normals} mask={props.selectedFaces} lift={scale.lift * 0.4} color={palette.accent} opacity={0.4} />
        <FaceOverlay positions={positions} triangles={triangles} normals={normals} mask={props.hoverFaces} lift={scale.lift * 0.5} color={palette.focus} opacity={0.3} />
        {curves.map((c) => (
          <CurveTube key={c.id} positions={positions} normals={normals} curve={c} scale={scale} highlighted={props.highlightCurves?.has(c.id) ?? false} />
        ))}
        <PointMarkers
          positions={positions}
          normals={normals}
          points={points}
          scale={scale}
          highlight={props.highlightPoints}
          onHover={report}
          onPick={(p) => onPick?.(p)}
        />
        {props.drawPath && props.drawPath.length > 0 && <DrawPath path={props.drawPath} family={props.drawFamily ?? 'alpha'} scale={scale} />}
        {showLabels && <LabelProjector anchors={anchors} elements={labelEls} />}
        <OrbitControls makeDefault enableDamping={false} />
        <CameraRig sphere={sphere} surfaceRef={surfaceRef} positions={positions} triangles={triangles} handle={handle} />
      </Canvas>
      {showLabels && (
        <div className="pointer-events-none absolute inset-0" aria-hidden="true">
          {points.map((p) => (
            <span
              key={p.id}
              ref={(el) => { if (el) labelEls.current.set(`p:${p.id}`, el); else labelEls.current.delete(`p:${p.id}`); }}
              className="absolute left-0 top-0 ml-2 mt-1 whitespace-nowrap rounded bg-white/75 px-1 text-[12px] font-semibold leading-4"
              style={{ visibility: 'hidden', color: p.kind === 'z' ? '#006b4f' : p.kind === 'w' ? '#9b4a7a' : palette.ink, textShadow: SUBTLE_TEXT_SHADOW }}
            >
              {p.label}
            </span>
          ))}
          {curves.map((c) => (
            <span
              key={c.id}
              ref={(el) => { if (el) labelEls.current.set(`c:${c.id}`, el); else labelEls.current.delete(`c:${c.id}`); }}
              className="absolute left-0 top-0 ml-2 whitespace-nowrap rounded bg-white/75 px-1 text-sm font-bold leading-5"
              style={{ visibility: 'hidden', color: c.family === 'alpha' ? palette.curveAlpha : '#a94700', textShadow: SUBTLE_TEXT_SHADOW }}
            >
              {c.label}
            </span>
          ))}
        </div>
      )}
      {/* Focus ring drawn above the canvas (an outline on the wrapper would be hidden by it). */}
      <div aria-hidden="true" className="pointer-events-none absolute inset-0 z-10 rounded-[inherit] group-focus-visible:shadow-[inset_0_0_0_3px_var(--color-focus)]" />
      {renderTooltip && <Tooltip setter={setTooltip} render={renderTooltip} />}
    </div>
  );
}
