/**
 * The lab API: diagrams, revisions, mesh binaries, analyses, generators, domains, edits, exports and
 * share links. Client-safe (zod only). Errors use the shared envelope `{ error: { code, message } }`.
 *
 * Visibility follows the diagram's workspace (see workspaces.ts): anonymous 401 unauthenticated,
 * non-member 404 not_found, member below the needed role 403 forbidden. Viewers read; editors (and owners)
 * write content (create, upload, rename, duplicate, delete, undelete, edit, restore, save/delete domains,
 * create/revoke share links).
 *
 * Indices: curve indices, intersection ids and region ids are 0-based in the API; users see alpha_1,
 * x_1, R_1 (index + 1). Vertex indices are 0-based mesh vertices; `label` fields carry the number the
 * user's file gave the vertex (1-based).
 */
import { z } from 'zod';
import { ERROR_STATUS } from './errors.js';
import { roleSchema } from './workspaces.js';

// ---------------------------------------------------------------------------------------------------------
// Paths
// ---------------------------------------------------------------------------------------------------------

/** Route paths. Functions build concrete URLs; the server mounts the same shapes with `:params`. */
export const DIAGRAM_PATHS = {
  /** GET (viewer): ?deleted=true lists the trash instead. POST (editor): create from a template. */
  list: (workspaceId: string) => `/api/workspaces/${workspaceId}/diagrams`,
  create: (workspaceId: string) => `/api/workspaces/${workspaceId}/diagrams`,
  /** POST multipart (editor): fields `file` (OBJ/PLY/OFF, at most MAX_UPLOAD_BYTES) and `name`. */
  upload: (workspaceId: string) => `/api/workspaces/${workspaceId}/diagrams/upload`,
  /** GET (viewer), PATCH rename/describe (editor), DELETE soft delete (editor). */
  one: (diagramId: string) => `/api/diagrams/${diagramId}`,
  /** POST (editor): copy of the head revision as a new diagram in the same workspace. */
  duplicate: (diagramId: string) => `/api/diagrams/${diagramId}/duplicate`,
  /** POST (editor): take a soft-deleted diagram out of the trash. */
  undelete: (diagramId: string) => `/api/diagrams/${diagramId}/undelete`,
  /** GET (viewer): revision history, newest first. */
  revisions: (diagramId: string) => `/api/diagrams/${diagramId}/revisions`,
  /** GET (viewer): binary mesh (QDM1, see mesh-binary.ts); immutable, ETag + Cache-Control immutable. */
  mesh: (diagramId: string, revision: number) => `/api/diagrams/${diagramId}/revisions/${revision}/mesh`,
  /** GET (viewer): analysis status and, once done, the result. */
  analysis: (diagramId: string, revision: number) => `/api/diagrams/${diagramId}/revisions/${revision}/analysis`,
  /** GET (viewer): ?offset&limit page of generators. */
  generators: (diagramId: string, revision: number) =>
    `/api/diagrams/${diagramId}/revisions/${revision}/generators`,
  /** POST (viewer): synchronous domain check, nothing stored. */
  domainCheck: (diagramId: string, revision: number) =>
    `/api/diagrams/${diagramId}/revisions/${revision}/domain-check`,
  /** GET (viewer): ?format=obj|ply|off|stl, answered as a file download. */
  export: (diagramId: string, revision: number, format: ExportFormat) =>
    `/api/diagrams/${diagramId}/revisions/${revision}/export?format=${format}`,
  /** GET (viewer) list, POST (editor) save a named domain. */
  domains: (diagramId: string) => `/api/diagrams/${diagramId}/domains`,
  /** DELETE (editor). */
  domain: (diagramId: string, domainId: string) => `/api/diagrams/${diagramId}/domains/${domainId}`,
  /** POST (editor): apply an operation to baseRevision; 201 new revision or 409 conflict. */
  edits: (diagramId: string) => `/api/diagrams/${diagramId}/edits`,
  /** POST (editor): new head revision copying an old one (history is never rewritten). */
  restore: (diagramId: string) => `/api/diagrams/${diagramId}/restore`,
  /** GET (editor) list, POST (editor) create: the token is shown once, in the 201 body. */
  shares: (diagramId: string) => `/api/diagrams/${diagramId}/shares`,
  /** DELETE (editor): revoke. */
  share: (diagramId: string, shareId: string) => `/api/diagrams/${diagramId}/shares/${shareId}`,
  /** GET, no sign-in: read-only view of the diagram's head revision. 404 when unknown or revoked. */
  publicShare: (token: string) => `/api/share/${token}`,
  /** GET, no sign-in: mesh binary of the shared diagram's head revision. */
  publicShareMesh: (token: string) => `/api/share/${token}/mesh`,
} as const;

/** Client route of a share link: `${origin}${SHARE_CLIENT_PATH}/${token}`. */
export const SHARE_CLIENT_PATH = '/s';

export const MAX_UPLOAD_BYTES = 50 * 1024 * 1024;
/** Largest generator page. */
export const MAX_GENERATOR_PAGE = 200;
/** Largest generator offset (pages are enumerated in order; beyond this the list is not browsable). */
export const MAX_GENERATOR_OFFSET = 1_000_000;
/** Content type of the mesh binary. */
export const MESH_CONTENT_TYPE = 'application/octet-stream';

// ---------------------------------------------------------------------------------------------------------
// Shared pieces
// ---------------------------------------------------------------------------------------------------------

export const curveFamilySchema = z.enum(['alpha', 'beta']);
export type CurveFamilyName = z.infer<typeof curveFamilySchema>;
export const basepointKindSchema = z.enum(['z', 'w']);

const index0 = z.number().int().min(0).max(1_000_000);

/** A curve by family and 0-based index (alpha_1 is {family:'alpha', index:0}). */
export const curveRefSchema = z.object({ family: curveFamilySchema, index: index0 });
export type CurveRef = z.infer<typeof curveRefSchema>;

export const basepointRefSchema = z.object({ kind: basepointKindSchema, index: index0 });
export type BasepointRef = z.infer<typeof basepointRefSchema>;

/** A point on the surface picked in the viewer: a face and barycentric coordinates (sum 1). */
export const surfacePointSchema = z.object({
  face: z.number().int().min(0),
  bary: z.tuple([z.number().min(-1e-6), z.number().min(-1e-6), z.number().min(-1e-6)]),
});
export type SurfacePoint = z.infer<typeof surfacePointSchema>;

export const personSchema = z.object({ id: z.uuid(), name: z.string() });
export type Person = z.infer<typeof personSchema>;

export const analysisStatusSchema = z.enum(['pending', 'running', 'done', 'failed']);
export type AnalysisStatus = z.infer<typeof analysisStatusSchema>;

export const exportFormatSchema = z.enum(['obj', 'ply', 'off', 'stl']);
export type ExportFormat = z.infer<typeof exportFormatSchema>;

// ---------------------------------------------------------------------------------------------------------
// Templates and operations
// ---------------------------------------------------------------------------------------------------------

const small = (min: number, max: number) => z.number().int().min(min).max(max);

/**
 * Generated diagrams. lens: genus-1 diagram of L(p,q) (alpha a meridian, beta a (p,q) curve);
 * torus-curve: the same surface with a (p,q) curve as beta; grid: n×n grid diagram on the torus with X and
 * O markings (x[c], o[c] = row of column c's marking); s3 / s1xs2: standard genus-g diagrams of S^3 and of
 * S^1×S^2 # (genus−1) S^3 (one pair isotopic meeting twice).
 */
export const templateSpecSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('lens'), p: small(1, 60), q: small(0, 60) }),
  z.object({ kind: z.literal('torus-curve'), p: small(0, 60), q: small(0, 60) }),
  z.object({ kind: z.literal('grid'), x: z.array(small(0, 15)).min(2).max(16), o: z.array(small(0, 15)).min(2).max(16) }),
  z.object({ kind: z.literal('s3'), genus: small(1, 6) }),
  z.object({ kind: z.literal('s1xs2'), genus: small(1, 6) }),
]);
export type TemplateSpec = z.infer<typeof templateSpecSchema>;
export type TemplateKind = TemplateSpec['kind'];

/** Edits of a revision. Each one yields a new revision (never changes an old one). */
export const editOperationSchema = z.discriminatedUnion('type', [
  /** Dehn twist of `curve` along `along` (right-handed unless negative; Farb–Margalit 2012, ch. 3). */
  z.object({ type: z.literal('twist'), curve: curveRefSchema, along: curveRefSchema, negative: z.boolean().default(false) }),
  z.object({ type: z.literal('subdivide'), method: z.enum(['midpoint', 'loop']) }),
  /** Draw a new closed curve through at least 3 picked points (straight walks across faces, else shortest
   *  edge paths). `closed: false` is refused: attaching curves are closed. */
  z.object({
    type: z.literal('draw-curve'),
    family: curveFamilySchema,
    points: z.array(surfacePointSchema).min(3).max(2000),
    closed: z.boolean().default(true),
  }),
  /** Push a finger of `curve` along the picked path: it starts on `curve` (points snap to their nearest
   *  vertex, consecutive ones are joined by shortest edge paths), crosses curves of the other family, ends off all curves. */
  z.object({ type: z.literal('finger-move'), curve: curveRefSchema, path: z.array(surfacePointSchema).min(2).max(2000) }),
  z.object({ type: z.literal('delete-curve'), curve: curveRefSchema }),
  /** Give a curve another name: a new index, and optionally the other family; refused if the name is taken. */
  z.object({ type: z.literal('rename-curve'), curve: curveRefSchema, index: index0, family: curveFamilySchema.optional() }),
  z.object({ type: z.literal('add-basepoint'), kind: basepointKindSchema, at: surfacePointSchema }),
  z.object({ type: z.literal('move-basepoint'), basepoint: basepointRefSchema, at: surfacePointSchema }),
  z.object({ type: z.literal('remove-basepoint'), basepoint: basepointRefSchema }),
  /** Laplacian smoothing of positions (topology and curves unchanged). */
  z.object({ type: z.literal('smooth'), iterations: small(1, 50).default(5) }),
  /** Curve smoothing within the surface: curve vertices move for nicer pictures, topology unchanged. */
  z.object({ type: z.literal('smooth-curves'), iterations: small(1, 100).default(10) }),
  /** Isotopy clean-up: push the beta arc of an empty bigon region (0-based region id) across its alpha arc. */
  z.object({ type: z.literal('remove-bigon'), region: index0 }),
]);
export type EditOperation = z.infer<typeof editOperationSchema>;
export type EditOperationType = EditOperation['type'];

/** What produced a revision (stored with it, shown in the history). */
export const revisionOperationSchema = z.union([
  editOperationSchema,
  z.object({ type: z.literal('template'), template: templateSpecSchema }),
  z.object({ type: z.literal('upload'), fileName: z.string() }),
  z.object({ type: z.literal('restore'), revision: z.number().int() }),
  z.object({ type: z.literal('duplicate'), diagramId: z.uuid(), revision: z.number().int() }),
]);
export type RevisionOperation = z.infer<typeof revisionOperationSchema>;

// ---------------------------------------------------------------------------------------------------------
// Diagrams
// ---------------------------------------------------------------------------------------------------------

/**
 * One row of the library. Fields from the analysis are null until it is done (or when it failed or
 * the Floer summary was refused). generatorCount is a decimal string (it may exceed 2^53).
 */
export const diagramSummarySchema = z.object({
  id: z.uuid(),
  workspaceId: z.uuid(),
  name: z.string(),
  description: z.string(),
  genus: z.number().int().nullable(),
  curveCount: z.number().int(),
  intersectionCount: z.number().int().nullable(),
  generatorCount: z.string().nullable(),
  nice: z.boolean().nullable(),
  weaklyAdmissible: z.boolean().nullable(),
  /** "0", "Z/5", "Z^2 ⊕ Z/3" */
  h1: z.string().nullable(),
  analysisStatus: analysisStatusSchema,
  headRevision: z.number().int(),
  createdAt: z.string(),
  createdBy: personSchema,
  updatedAt: z.string(),
  updatedBy: personSchema,
  /** Set for diagrams in the trash. */
  deletedAt: z.string().nullable(),
});
export type DiagramSummary = z.infer<typeof diagramSummarySchema>;

export const diagramListResponseSchema = z.object({ diagrams: z.array(diagramSummarySchema) });
export type DiagramListResponse = z.infer<typeof diagramListResponseSchema>;

/** GET one diagram: the summary plus the caller's role (for showing or hiding edit controls). */
export const diagramSchema = diagramSummarySchema.extend({ role: roleSchema });
export type Diagram = z.infer<typeof diagramSchema>;
export const diagramResponseSchema = z.object({ diagram: diagramSchema });
export type DiagramResponse = z.infer<typeof diagramResponseSchema>;

const diagramName = z.string().trim().min(1, { message: 'Enter a name.' }).max(160);
const diagramDescription = z.string().trim().max(4000);

/** POST create from a template; 201 { diagram }. resolution scales the generated mesh (1 coarse … 8 fine). */
export const createDiagramRequestSchema = z.object({
  name: diagramName,
  description: diagramDescription.optional(),
  template: templateSpecSchema,
  resolution: small(1, 8).optional(),
});
export type CreateDiagramRequest = z.infer<typeof createDiagramRequestSchema>;

/** Multipart text fields of the upload (the file travels in field `file`). 201 { diagram, warnings }. */
export const uploadDiagramFieldsSchema = z.object({ name: diagramName, description: diagramDescription.optional() });
export type UploadDiagramFields = z.infer<typeof uploadDiagramFieldsSchema>;
export const uploadDiagramResponseSchema = z.object({ diagram: diagramSchema, warnings: z.array(z.string()) });
export type UploadDiagramResponse = z.infer<typeof uploadDiagramResponseSchema>;

/** A problem found in an uploaded file; line (1-based) for text formats, offset (bytes) for binary ones. */
export const fileProblemSchema = z.object({
  message: z.string(),
  line: z.number().int().optional(),
  offset: z.number().int().optional(),
});
export type FileProblem = z.infer<typeof fileProblemSchema>;
/**
 * Error codes of the lab routes beyond the shared ERROR_STATUS, all answered with HTTP 422:
 * invalid_file (upload rejected, details with line/offset), invalid_operation (template or edit refused by
 * the geometry, details), computation_failed (the geometry worker crashed or timed out, e.g. a mesh too
 * large for this server).
 */
/** 422 body of a rejected upload. */
export const INVALID_FILE_STATUS = ERROR_STATUS.invalid_file;
export const invalidFileErrorSchema = z.object({
  error: z.object({ code: z.literal('invalid_file'), message: z.string(), details: z.array(fileProblemSchema) }),
});
export type InvalidFileError = z.infer<typeof invalidFileErrorSchema>;

/** PATCH; 200 { diagram }. */
export const updateDiagramRequestSchema = z
  .object({ name: diagramName.optional(), description: diagramDescription.optional() })
  .refine((v) => v.name !== undefined || v.description !== undefined, { message: 'Nothing to change.' });
export type UpdateDiagramRequest = z.infer<typeof updateDiagramRequestSchema>;

/** POST duplicate; 201 { diagram }. Name defaults to "<name> (copy)". */
export const duplicateDiagramRequestSchema = z.object({ name: diagramName.optional() });
export type DuplicateDiagramRequest = z.infer<typeof duplicateDiagramRequestSchema>;
/** DELETE answers 204; POST undelete answers 200 { diagram }. */

// ---------------------------------------------------------------------------------------------------------
// Revisions, edits, restore
// ---------------------------------------------------------------------------------------------------------

export const revisionSchema = z.object({
  number: z.number().int(),
  parentNumber: z.number().int().nullable(),
  authorId: z.uuid(),
  authorName: z.string(),
  createdAt: z.string(),
  message: z.string(),
  operation: revisionOperationSchema,
  analysisStatus: analysisStatusSchema,
});
export type Revision = z.infer<typeof revisionSchema>;
export const revisionListResponseSchema = z.object({ revisions: z.array(revisionSchema) });
export type RevisionListResponse = z.infer<typeof revisionListResponseSchema>;

/** POST edits. 201 { revision, diagram }; 409 conflict when baseRevision is not the head; 422 invalid_operation. */
export const editRequestSchema = z.object({
  baseRevision: z.number().int().min(1),
  operation: editOperationSchema,
  message: z.string().trim().max(500).optional(),
});
export type EditRequest = z.infer<typeof editRequestSchema>;
export const revisionResponseSchema = z.object({ revision: revisionSchema, diagram: diagramSchema });
export type RevisionResponse = z.infer<typeof revisionResponseSchema>;
/** 422 body of an operation the geometry refused (e.g. a drawn curve that is tangent to another). */
export const invalidOperationErrorSchema = z.object({
  error: z.object({ code: z.literal('invalid_operation'), message: z.string(), details: z.array(z.object({ message: z.string() })) }),
});

/** POST restore; 201 { revision, diagram }; 409 conflict when baseRevision is not the head. */
export const restoreRequestSchema = z.object({
  revision: z.number().int().min(1),
  baseRevision: z.number().int().min(1),
  message: z.string().trim().max(500).optional(),
});
export type RestoreRequest = z.infer<typeof restoreRequestSchema>;

// ---------------------------------------------------------------------------------------------------------
// Analysis
// ---------------------------------------------------------------------------------------------------------

export const surfaceStatsSchema = z.object({
  vertices: z.number().int(),
  edges: z.number().int(),
  faces: z.number().int(),
  eulerCharacteristic: z.number().int(),
  genus: z.number().int(),
  area: z.number(),
  bbox: z.object({ min: z.tuple([z.number(), z.number(), z.number()]), max: z.tuple([z.number(), z.number(), z.number()]) }),
});
export type SurfaceStats = z.infer<typeof surfaceStatsSchema>;

export const analysisCurveSchema = z.object({
  name: z.string(),
  family: curveFamilySchema,
  index: z.number().int(),
  /** 0-based mesh vertices of the cycle, in orientation order. */
  vertices: z.array(z.number().int()),
  length: z.number(),
});
export const analysisBasepointSchema = z.object({
  name: z.string(),
  kind: basepointKindSchema,
  index: z.number().int(),
  vertex: z.number().int(),
  /** Region holding the basepoint. */
  region: z.number().int(),
});
export const intersectionSchema = z.object({
  /** 0-based; users see x_{id+1}. */
  id: z.number().int(),
  vertex: z.number().int(),
  /** The vertex number as the user's file gave it. */
  label: z.number().int(),
  alpha: z.number().int(),
  beta: z.number().int(),
  sign: z.union([z.literal(1), z.literal(-1)]),
  /** Region ids in the quadrants NE, NW, SW, SE (see geometry/floer/combinatorics.ts). */
  quadrants: z.tuple([z.number().int(), z.number().int(), z.number().int(), z.number().int()]),
});
export type Intersection = z.infer<typeof intersectionSchema>;

/** Euler measures (Lipshitz 2006): combinatorial χ − convex/4 + reflex/4 and geometric (1/2π)·∫K. */
export const regionSchema = z.object({
  id: z.number().int(),
  /** Number of faces. */
  faces: z.number().int(),
  area: z.number(),
  chi: z.number().int(),
  convexCorners: z.number().int(),
  reflexCorners: z.number().int(),
  eulerMeasure: z.number(),
  geometricEulerMeasure: z.number(),
  /** Gauss–Bonnet parts divided by 2π: interior defects, smooth boundary turning, corner terms (they sum to geometricEulerMeasure). */
  curvature: z.object({ interior: z.number(), boundary: z.number(), corners: z.number() }),
  /** geometricEulerMeasure − eulerMeasure; nonzero beyond rounding means a topology error. */
  difference: z.number(),
  /** Basepoint names inside (z_1, w_1, ...). */
  basepoints: z.array(z.string()),
  /** 2n-gon size: number of corners (bigon 2, square 4). */
  corners: z.number().int(),
});
export type Region = z.infer<typeof regionSchema>;

export const periodicDomainSchema = z.object({
  /** Multiplicity per region id (dense, index = region id). */
  coefficients: z.array(z.number().int()),
});
export type PeriodicDomain = z.infer<typeof periodicDomainSchema>;

export const gradingRankSchema = z.object({ grading: z.number().int(), rank: z.number().int() });
export const spincHomologySchema = z.object({
  /** Name of the spin^c class: ε(first generator of the class, generator 0), e.g. "0", "(2 mod 5)". */
  spinc: z.string(),
  generators: z.number().int(),
  /** Rank of HF-hat in this class; null when the multi-pointed factor does not divide (knot grids). */
  rank: z.number().int().nullable(),
  /** Rank of the complex's homology (HF-hat ⊗ V^{k−g} when multi-pointed; Manolescu–Ozsváth–Sarkar 2009). */
  rawRank: z.number().int(),
  /** 0: integer relative grading; otherwise gradings are mod this number. */
  gradingModulus: z.number().int(),
  /** Raw ranks by relative grading (lowest generator grading 0), non-zero entries, ascending. */
  byGrading: z.array(gradingRankSchema),
});
export type SpincHomologyRow = z.infer<typeof spincHomologySchema>;
export const notNiceRegionSchema = z.object({ region: z.number().int(), corners: z.number().int(), chi: z.number().int() });
export const floerSummarySchema = z.object({
  /** perm N of the intersection counts (decimal string); null when too many curves to count. */
  generatorCount: z.string().nullable(),
  /** "0", "Z/5", "Z^2 ⊕ Z/3" (Ozsváth–Szabó 2004: H_1(Y) = coker of the intersection matrix). */
  h1: z.string(),
  b1: z.number().int(),
  /** Torsion coefficients d_i > 1 of H_1. */
  torsion: z.array(z.number().int()),
  /** |H_1| when finite, decimal string. */
  h1Order: z.string().nullable(),
  /** A basis of the periodic domains (avoiding the z basepoints). */
  periodicDomains: z.array(periodicDomainSchema),
  /** Null when undecided (too many periodic domains). */
  weaklyAdmissible: z.boolean().nullable(),
  /** A nonzero periodic domain with all coefficients of one sign, when not admissible. */
  admissibilityWitness: periodicDomainSchema.nullable(),
  nice: z.boolean(),
  /** Regions without a basepoint that are neither bigons nor squares (Sarkar–Wang 2010). */
  notNiceRegions: z.array(notNiceRegionSchema),
  /** HF-hat by spin^c class, or null with homologyUnavailable giving the reason. */
  homology: z.object({ rank: z.number().int(), rawRank: z.number().int(), bySpinc: z.array(spincHomologySchema) }).nullable(),
  homologyUnavailable: z.string().nullable(),
  /** Whether the generators endpoint gives spin^c classes and gradings (false past the limit). */
  generatorsClassified: z.boolean(),
  /**
   * Σ sign(x) over the generators beside det M and, for rational homology spheres with k = g, |H_1(Y)|
   * (Ozsváth–Szabó 2004: χ(HF-hat) = ±|H_1|). Absent past the generator limit and in older analyses.
   */
  signedCount: z.object({ value: z.string(), determinant: z.string(), h1Order: z.string().nullable(), agrees: z.boolean() }).nullish(),
});
export type FloerSummary = z.infer<typeof floerSummarySchema>;

export const analysisResultSchema = z.object({
  stats: surfaceStatsSchema,
  curves: z.array(analysisCurveSchema),
  basepoints: z.array(analysisBasepointSchema),
  intersections: z.array(intersectionSchema),
  regions: z.array(regionSchema),
  /** Region id per face: little-endian Int32 array, base64 (decodeInt32Base64 in mesh-binary.ts). */
  faceRegion: z.string(),
  /** Angle defect 2π − Σθ per vertex: little-endian Float32 array, base64 (decodeFloat32Base64). */
  vertexDefect: z.string(),
  /** Validation warnings that did not stop the analysis. */
  warnings: z.array(z.string()),
  /** Null when the Floer computations were refused or failed; floerUnavailable says why. */
  floer: floerSummarySchema.nullable(),
  floerUnavailable: z.string().nullable(),
});
export type AnalysisResult = z.infer<typeof analysisResultSchema>;

/** GET analysis. Poll while status is pending or running (progress 0..1). */
export const analysisResponseSchema = z.object({
  revision: z.number().int(),
  status: analysisStatusSchema,
  progress: z.number(),
  /** Why the analysis failed; problems lists every validation problem (e.g. a bare surface without curves). */
  error: z.object({ message: z.string(), problems: z.array(z.string()).optional() }).nullable(),
  result: analysisResultSchema.nullable(),
});
export type AnalysisResponse = z.infer<typeof analysisResponseSchema>;

// ---------------------------------------------------------------------------------------------------------
// Generators and domains
// ---------------------------------------------------------------------------------------------------------

export const generatorsQuerySchema = z.object({
  offset: z.coerce.number().int().min(0).max(MAX_GENERATOR_OFFSET).default(0),
  limit: z.coerce.number().int().min(1).max(MAX_GENERATOR_PAGE).default(50),
});
export type GeneratorsQuery = z.infer<typeof generatorsQuerySchema>;

export const generatorSchema = z.object({
  /** Position in the enumeration order (0-based). */
  index: z.number().int(),
  /** Intersection ids, one per alpha curve (alpha_1 first). */
  points: z.array(z.number().int()),
  /** sign(σ) · Π local signs (its contribution to χ). */
  sign: z.union([z.literal(1), z.literal(-1)]),
  /** Name of its spin^c class; null when not computed. */
  spinc: z.string().nullable(),
  /** Relative grading within its spin^c class; null when not defined (e.g. no domain connects). */
  grading: z.number().int().nullable(),
});
export type Generator = z.infer<typeof generatorSchema>;
/** GET generators; 409 conflict while the analysis is not done (or when it failed). Classes and gradings are null past the classification limit. */
export const generatorsPageResponseSchema = z.object({
  total: z.string(),
  offset: z.number().int(),
  limit: z.number().int(),
  generators: z.array(generatorSchema),
});
export type GeneratorsPageResponse = z.infer<typeof generatorsPageResponseSchema>;

/** Region id → multiplicity; missing regions are 0. */
export const domainCoefficientsSchema = z.record(z.string().regex(/^\d+$/), z.number().int().min(-1_000_000).max(1_000_000));
export type DomainCoefficients = z.infer<typeof domainCoefficientsSchema>;

/** POST domain-check; from/to are generators as intersection ids, one per alpha curve. */
export const domainCheckRequestSchema = z.object({
  coefficients: domainCoefficientsSchema,
  from: z.array(z.number().int().min(0)).optional(),
  to: z.array(z.number().int().min(0)).optional(),
});
export type DomainCheckRequest = z.infer<typeof domainCheckRequestSchema>;

/** The report of a domain check (Ozsváth–Szabó 2004 §2.4; Lipshitz 2006 §4). Rationals are exact text ("1/2"). */
export const domainCheckResponseSchema = z.object({
  /** True when ∂D fits generators x → y (the given from/to, or ones its corners determine). */
  isDomain: z.boolean(),
  /** Why not, or why x and y are not determined; null when all is well. */
  reason: z.string().nullable(),
  /** Generators as intersection ids by alpha, when known. */
  from: z.array(z.number().int()).nullable(),
  to: z.array(z.number().int()).nullable(),
  /** Curves whose generator points the boundary does not determine (give from/to). */
  undetermined: z.object({ alphas: z.array(z.number().int()), betas: z.array(z.number().int()) }).nullable(),
  /** Corner multiplicity J(D) per intersection id. */
  corners: z.array(z.number().int()),
  /** Periodic: no corners, ∂D is a combination of whole curves. */
  periodic: z.boolean(),
  eulerMeasure: z.string(),
  /** Σ a_R · (Gauss–Bonnet Euler measure of R), when available. */
  geometricEulerMeasure: z.number().nullable(),
  nx: z.string().nullable(),
  ny: z.string().nullable(),
  /** n at each basepoint, in basepoint order. */
  nBasepoints: z.array(z.object({ name: z.string(), n: z.number().int() })),
  /** Maslov index μ = e + n_x + n_y (Lipshitz 2006), when x and y are known. */
  maslovIndex: z.string().nullable(),
  /** All coefficients ≥ 0. */
  positive: z.boolean(),
});
export type DomainCheckResponse = z.infer<typeof domainCheckResponseSchema>;

export const savedDomainSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  revision: z.number().int(),
  coefficients: domainCoefficientsSchema,
  from: z.array(z.number().int()).nullable(),
  to: z.array(z.number().int()).nullable(),
  createdBy: personSchema,
  createdAt: z.string(),
});
export type SavedDomain = z.infer<typeof savedDomainSchema>;
export const savedDomainListResponseSchema = z.object({ domains: z.array(savedDomainSchema) });
export type SavedDomainListResponse = z.infer<typeof savedDomainListResponseSchema>;
/** POST domains (editor); 201 { domain }. DELETE answers 204. */
export const createDomainRequestSchema = z.object({
  name: z.string().trim().min(1, { message: 'Enter a name.' }).max(160),
  revision: z.number().int().min(1),
  coefficients: domainCoefficientsSchema,
  from: z.array(z.number().int().min(0)).optional(),
  to: z.array(z.number().int().min(0)).optional(),
});
export type CreateDomainRequest = z.infer<typeof createDomainRequestSchema>;
export const savedDomainResponseSchema = z.object({ domain: savedDomainSchema });
export type SavedDomainResponse = z.infer<typeof savedDomainResponseSchema>;

// ---------------------------------------------------------------------------------------------------------
// Share links
// ---------------------------------------------------------------------------------------------------------

export const shareLinkSchema = z.object({
  id: z.uuid(),
  createdAt: z.string(),
  createdBy: personSchema,
  revokedAt: z.string().nullable(),
});
export type ShareLink = z.infer<typeof shareLinkSchema>;
export const shareLinkListResponseSchema = z.object({ shares: z.array(shareLinkSchema) });
export type ShareLinkListResponse = z.infer<typeof shareLinkListResponseSchema>;
/** 201 body of POST shares: the token and url appear here only (the server keeps a hash). */
export const createShareLinkResponseSchema = z.object({ share: shareLinkSchema, token: z.string(), url: z.string() });
export type CreateShareLinkResponse = z.infer<typeof createShareLinkResponseSchema>;

/** GET /api/share/:token: the diagram (no workspace details), its head revision's analysis, mesh path. */
export const publicShareResponseSchema = z.object({
  diagram: z.object({
    name: z.string(),
    description: z.string(),
    headRevision: z.number().int(),
    updatedAt: z.string(),
  }),
  analysis: analysisResponseSchema,
  meshPath: z.string(),
});
export type PublicShareResponse = z.infer<typeof publicShareResponseSchema>;

/** Request shapes as the client writes them (fields with defaults may be omitted). */
export type EditRequestInput = z.input<typeof editRequestSchema>;
export type EditOperationInput = z.input<typeof editOperationSchema>;
