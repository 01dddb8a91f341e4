/**
 * The only public entry of Quadrant's geometry core. Explicit named exports only (no `export *`).
 * Each area keeps its exports in its own section below; add lines to your section, do not reorder others.
 */

// --- base ---
export type { Result, Problem } from './base/result.js';
export { ok, fail } from './base/result.js';
export { assert, InvariantError } from './base/assert.js';
export type { VertexId, FaceId, HalfEdgeId, RegionId } from './base/ids.js';
export { cornerAngle, dist2, doubleArea } from './base/vec.js';

// --- mesh ---
export type { TriMesh, ConnectivityReport } from './mesh/tri-mesh.js';
export {
  buildTriMesh, faceOf, next, prev, tailVertex, tipVertex, isBoundary, rotateCCW, outgoingHalfEdges,
  eulerCharacteristic, validateConnectivity,
} from './mesh/tri-mesh.js';

// --- io ---

// --- surfaces ---
export type { TorusGridOptions } from './surfaces/torus.js';
export { torusGrid, torusGridVertex } from './surfaces/torus.js';

// --- diagram ---
export type { CurveFamily, DiagramCurve, BasepointKind, Basepoint, HeegaardDiagram } from './diagram/types.js';
export { vertexLabel, curveName } from './diagram/types.js';

// --- curvature ---

// --- algebra ---

// --- floer ---
export type { CombinatorialPoint, CombinatorialRegion, CombinatorialDiagram } from './floer/combinatorics.js';

// --- construct ---
