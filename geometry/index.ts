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
export type { SurfaceStats } from './mesh/validate.js';
export { validateSurface, surfaceStats, isWarning, SURFACE_WARNING_CODES } from './mesh/validate.js';

// --- io ---
export type { MeshFile, CurveEdges, BasepointMark } from './io/mesh-file.js';
export { mergePositions } from './io/mesh-file.js';
export type { ParsedDiagramFile } from './io/diagram-file.js';
export { parseDiagramFile, diagramFromMeshFile, DIAGRAM_FILE_EXTENSIONS } from './io/diagram-file.js';
export { assembleCurves, assembleBasepoints } from './io/assemble-curves.js';
export { readObj, writeObj } from './io/obj.js';
export { readOff, writeOff } from './io/off.js';
export { readStl, writeStl } from './io/stl.js';

// --- surfaces ---
export type { TorusGridOptions } from './surfaces/torus.js';
export { torusGrid, torusGridVertex } from './surfaces/torus.js';
export { sphereMesh } from './surfaces/sphere.js';
export type { GenusSurfaceOptions, GeneratedSurface } from './surfaces/genus.js';
export { genusSurface, voxelSlabCage } from './surfaces/genus.js';
export type { QuadMesh } from './surfaces/catmull-clark.js';
export { catmullClark, triangulateQuads } from './surfaces/catmull-clark.js';

// --- diagram ---
export type { CurveFamily, DiagramCurve, BasepointKind, Basepoint, HeegaardDiagram } from './diagram/types.js';
export { vertexLabel, curveName } from './diagram/types.js';
export type { CurveLabels } from './diagram/curve-edges.js';
export { labelCurveEdges, findHalfEdge } from './diagram/curve-edges.js';
export type { FaceComponents } from './diagram/face-components.js';
export { faceComponents } from './diagram/face-components.js';
export type { CurveCheck } from './diagram/validate.js';
export { validateCurves, checkCurves } from './diagram/validate.js';
export type { Wedges } from './diagram/wedges.js';
export { computeWedges } from './diagram/wedges.js';
export type { IntersectionPoint } from './diagram/points.js';
export type { RegionInfo, RegionCorner } from './diagram/region-info.js';
export type { DiagramAnalysis } from './diagram/analyze.js';
export { analyzeDiagram, EULER_MEASURE_TOLERANCE } from './diagram/analyze.js';
export { toCombinatorial } from './diagram/combinatorial.js';
export type { GridPath, GridTorusDiagramSpec } from './diagram/grid-torus-diagram.js';
export { gridTorusDiagram, gridMeridian, gridParallel, gridDiagonal, lensSpaceDiagram } from './diagram/grid-torus-diagram.js';

// --- curvature ---
export type { MeshAngles } from './curvature/angles.js';
export { meshAngles, angleDefects } from './curvature/angles.js';
export type { RegionCurvature, WedgeShares } from './curvature/gauss-bonnet.js';
export { regionCurvature, wedgeShares, smoothRegionCurvature } from './curvature/gauss-bonnet.js';

// --- algebra ---

// --- floer ---
export type { CombinatorialPoint, CombinatorialRegion, CombinatorialDiagram } from './floer/combinatorics.js';

// --- construct ---
export type { EditMesh } from './mesh/edit.js';
export { toEditMesh, ensureCapacity, compactMesh, splitEdge, splitFace, setEdgeLabel } from './mesh/edit.js';
export type { TemplateSpec } from './construct/templates.js';
export { buildTemplate } from './construct/templates.js';
export { lensDiagram, torusCurveDiagram, gridDiagram, s1xs2TorusDiagram } from './construct/torus-templates.js';
export { genusS3Diagram, genusS1xS2Diagram } from './construct/genus-templates.js';
