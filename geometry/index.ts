/**
 * The only public entry of Quadrant's geometry core. Explicit named exports only (no `export *`).
 * Each area keeps its exports in its own section below; add lines to your section, do not reorder others.
 */

// --- base ---
export type { Result, Problem } from './base/result.js';
export { ok, fail, unwrap } from './base/result.js';
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

export { taubinSmooth } from './mesh/taubin.js';

// --- io ---
export type { MeshFile, CurveEdges, BasepointMark } from './io/mesh-file.js';
export { mergePositions } from './io/mesh-file.js';
export type { ParsedDiagramFile } from './io/diagram-file.js';
export { parseDiagramFile, diagramFromMeshFile, DIAGRAM_FILE_EXTENSIONS } from './io/diagram-file.js';
export { assembleCurves, assembleBasepoints } from './io/assemble-curves.js';
export { readObj, writeObj } from './io/obj.js';
export { readOff, writeOff } from './io/off.js';
export { readPly, writePly } from './io/ply.js';
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
export type { IntMatrix, SmithForm, HermiteForm } from './algebra/integer-matrix.js';
export { smithNormalForm, hermiteNormalForm, integerKernel, toIntMatrix, matMul } from './algebra/integer-matrix.js';
export type { SparseF2 } from './algebra/f2.js';
export { rankF2, rankF2Dense, sparseF2FromPairs } from './algebra/f2.js';

// --- floer ---
export type { CombinatorialPoint, CombinatorialRegion, CombinatorialDiagram } from './floer/combinatorics.js';
export type { GeneratorEntry, GeneratorPage, CurveIncidence } from './floer/generators.js';
export { countGenerators, permanent, forEachGenerator, generators, generatorsPage, generatorSign, curveIncidence } from './floer/generators.js';
export { cornerMap, pointQuarters, eulerQuarters as domainEulerQuarters, maslovQuarters, quartersText, pointName } from './floer/domains.js';
export type { DomainCheck, DomainEnds } from './floer/check-domain.js';
export { checkDomain } from './floer/check-domain.js';
export type { DomainLattice, BlockedBasepoints } from './floer/lattice.js';
export { domainLattice, domainBetween, classInvariant } from './floer/lattice.js';
export { nonNegativePeriodic } from './floer/admissibility-lp.js';
export { nonNegativePeriodicFM } from './floer/admissibility.js';
export type { H1Summary } from './floer/homology-h1.js';
export { firstHomology, cokernel, formatH1 } from './floer/homology-h1.js';
export type { NotNiceRegion } from './floer/nice-moves.js';
export { isNice } from './floer/nice-moves.js';
export type { SpincHomology, HfHatResult, HfHatOptions } from './floer/hf-hat.js';
export type { GeneratorTable } from './floer/hf-hat.js';
export { hfHatNice, generatorTable } from './floer/hf-hat.js';
export type { ClassesAndGradings } from './floer/spinc-grading.js';
export { classesAndGradings } from './floer/spinc-grading.js';
export type { FloerSummary, FloerSummaryOptions, GeneratorGradings, SignedCountCheck } from './floer/summary.js';
export { floerSummary, floerReportFields, generatorGradings, findDomain } from './floer/summary.js';
export type { GridMarking } from './floer/model-diagrams.js';
export {
  combinatorialGrid, combinatorialGridS3, combinatorialKnotGrid, combinatorialLensSpace, combinatorialS1xS2,
  combinatorialDisjointCircles,
} from './floer/model-diagrams.js';

// --- construct ---
export type { EditMesh } from './mesh/edit.js';
export { toEditMesh, ensureCapacity, compactMesh, splitEdge, splitFace, setEdgeLabel } from './mesh/edit.js';
export type { TemplateSpec } from './construct/templates.js';
export { buildTemplate } from './construct/templates.js';
export { lensDiagram, torusCurveDiagram, gridDiagram, s1xs2TorusDiagram } from './construct/torus-templates.js';
export { genusS3Diagram, genusS1xS2Diagram } from './construct/genus-templates.js';
export type { SubdivisionScheme } from './construct/subdivide.js';
export { subdivideDiagram } from './construct/subdivide.js';
export type { TwistOptions } from './construct/twist.js';
export { dehnTwist, curveIndexByName } from './construct/twist.js';
export { fingerMove } from './construct/finger.js';
export type { SurfacePoint } from './construct/draw.js';
export { shortestPath, addCurve, drawCurve, nearestCorner } from './construct/draw.js';
export type { BasepointPlace } from './construct/curve-ops.js';
export { deleteCurve, renameCurve, addBasepoint, moveBasepoint, removeBasepoint } from './construct/curve-ops.js';
export { removeBigon } from './construct/bigon.js';
export type { SmoothOptions } from './construct/smooth.js';
export { smoothCurves } from './construct/smooth.js';
