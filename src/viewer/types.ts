/**
 * Plain-data props of the 3D surface view. Nothing here imports three.js, so feature code can build these
 * objects in the main chunk while the renderer itself stays in the lazily loaded 3D chunk.
 */

export type Vec3 = [number, number, number];

/** One attaching curve drawn as a tube along its cycle of mesh vertices (0-based indices). */
export interface ViewerCurve {
  id: string;
  family: 'alpha' | 'beta';
  /** Shown beside the curve, e.g. α₁. */
  label: string;
  vertices: ArrayLike<number>;
}

/** A marked mesh vertex: an intersection point or a basepoint. */
export interface ViewerPoint {
  id: string;
  vertex: number;
  label: string;
  kind: 'intersection' | 'z' | 'w';
}

/** What the pointer is over (hover) or what was clicked (pick). */
export type ViewerPick =
  | {
      kind: 'face';
      face: number;
      point: Vec3;
      /** Barycentric coordinates of the hit point in the face's corner order. */
      barycentric: Vec3;
      clientX: number;
      clientY: number;
      shiftKey: boolean;
      /** 0 main button, 2 secondary (context menu). */
      button: number;
    }
  | { kind: 'point'; id: string; clientX: number; clientY: number; shiftKey: boolean; button: number };

/** Imperative controls of a mounted view. */
export interface SurfaceViewHandle {
  /** Keeps the viewing direction, centres the surface and fits it to the canvas. */
  fitView(): void;
  /** Back to the initial camera. */
  resetView(): void;
  /** Rotates the camera about the target by the given angles (radians); for keyboard orbiting. */
  orbit(dTheta: number, dPhi: number): void;
  /** Multiplies the camera distance by `factor` (< 1 zooms in). */
  zoom(factor: number): void;
  /** Turns the camera to look at face f from outside (along its normal), keeping the distance. */
  focusFace(face: number): void;
  /**
   * Client coordinates of face f's centroid when that face is what the pointer would hit there
   * (visible, unoccluded, inside the canvas); otherwise null.
   */
  projectFace(face: number): { x: number; y: number } | null;
  /**
   * The current view (surface, curves, points; not the text labels) as a PNG data URL at `scale` times the
   * screen resolution (default 2), for figures; null before the view is ready.
   */
  snapshot(scale?: number): string | null;
}

export interface SurfaceViewProps {
  /** xyz per vertex. */
  positions: Float32Array;
  /** Three 0-based vertex indices per face, counter-clockwise from outside. */
  triangles: Uint32Array;
  /** rgb (0..1) per face; regions coloured by a quantity. */
  faceColors?: Float32Array | null;
  /** rgb (0..1) per vertex; a heat map. Wins over faceColors. */
  vertexColors?: Float32Array | null;
  curves: ViewerCurve[];
  points: ViewerPoint[];
  /** Faces drawn with the selection overlay (1 = selected). */
  selectedFaces?: Uint8Array | null;
  /** Faces drawn with the hover overlay. */
  hoverFaces?: Uint8Array | null;
  /** Faces drawn with the warning overlay (offending periodic domain, bad regions). */
  warnFaces?: Uint8Array | null;
  highlightPoints?: ReadonlySet<string>;
  highlightCurves?: ReadonlySet<string>;
  showLabels?: boolean;
  showEdges?: boolean;
  /** Points picked while drawing a curve, joined by a polyline. */
  drawPath?: Vec3[];
  drawFamily?: 'alpha' | 'beta';
  /** Called when what is under the pointer changes (null when it leaves the surface). */
  onHover?: (pick: ViewerPick | null) => void;
  /** Main click (button 0, maybe with shift) or secondary click (button 2). */
  onPick?: (pick: ViewerPick) => void;
  /** Tooltip content for the current hover; rendered beside the pointer. */
  renderTooltip?: (pick: ViewerPick) => React.ReactNode;
  /** Accessible name of the canvas region. */
  ariaLabel: string;
  handleRef?: React.Ref<SurfaceViewHandle>;
}
