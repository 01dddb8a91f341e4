/**
 * Diagrams, revisions, mesh binaries, analyses, generators, edits, restore, export (paths relative to /api;
 * DIAGRAM_PATHS in the contract builds them). Anonymous 401, non-member 404, role too low 403.
 *   GET    /workspaces/:workspaceId/diagrams[?deleted=true]      viewer
 *   POST   /workspaces/:workspaceId/diagrams                     editor   create from a template
 *   POST   /workspaces/:workspaceId/diagrams/upload              editor   multipart file + name
 *   GET    /diagrams/:diagramId                                  viewer
 *   PATCH  /diagrams/:diagramId                                  editor
 *   DELETE /diagrams/:diagramId                                  editor   soft delete
 *   POST   /diagrams/:diagramId/duplicate | /undelete            editor
 *   GET    /diagrams/:diagramId/revisions                        viewer
 *   GET    /diagrams/:diagramId/revisions/:n/mesh                viewer   QDM1, immutable
 *   GET    /diagrams/:diagramId/revisions/:n/analysis            viewer
 *   GET    /diagrams/:diagramId/revisions/:n/generators          viewer
 *   GET    /diagrams/:diagramId/revisions/:n/export?format=      viewer
 *   POST   /diagrams/:diagramId/edits | /restore                 editor
 */
import { Router, type Request, type Response } from 'express';
import multer from 'multer';
import {
  createDiagramRequestSchema, duplicateDiagramRequestSchema, editRequestSchema, exportFormatSchema,
  generatorsQuerySchema, MAX_UPLOAD_BYTES, MESH_CONTENT_TYPE, restoreRequestSchema, updateDiagramRequestSchema,
  uploadDiagramFieldsSchema,
} from '../../contract/diagrams.js';
import { requireUser, requireWorkspaceRole } from '../../auth/index.js';
import type { AppDeps } from '../../deps.js';
import { HttpError, parseOr400 } from '../../http/errors.js';
import { analysisQueueFor, geometryWorkerFor } from '../../jobs/analysis-queue.js';
import { storedFromWire, type BuildOutcome } from '../../jobs/geometry-tasks.js';
import {
  accessDiagram, analysisOf, appendRevision, createDiagram, doneResult, duplicateDiagram, getDiagram, listDiagrams,
  listRevisions, renameDiagram, restoreRevision, revisionId, revisionRow, softDelete, undelete,
} from './diagrams.service.js';
import { describeOperation } from './operations.js';
import type { StoredDiagram, StoredRow } from './storage.js';
import { problemDetails, unprocessableHandler } from './unprocessable.js';

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_UPLOAD_BYTES, files: 1, fields: 10 } });

/** multer as a promise, with its errors mapped to the API envelope. */
function receiveFile(req: Request, res: Response): Promise<void> {
  return new Promise((resolve, reject) => {
    upload.single('file')(req, res, (err: unknown) => {
      if (!err) return resolve();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return reject(new HttpError('payload_too_large', `The file is larger than ${MAX_UPLOAD_BYTES / (1024 * 1024)} MB.`));
        return reject(new HttpError('validation', `Upload problem: ${err.message}. Send one file in the field “file”.`));
      }
      reject(err instanceof Error ? new HttpError('validation', `Upload problem: ${err.message}`) : err);
    });
  });
}

/** Small LRU of encoded meshes (revisions are immutable, so entries never go stale). */
const meshCache = new Map<string, Buffer>();
const MESH_CACHE_BYTES = 256 * 1024 * 1024;

async function cachedWireMesh(deps: AppDeps, id: string, row: StoredRow): Promise<Buffer> {
  const hit = meshCache.get(id);
  if (hit) {
    meshCache.delete(id);
    meshCache.set(id, hit);
    return hit;
  }
  const out = await geometryWorkerFor(deps).run({ type: 'wire-mesh', row });
  const buf = Buffer.from(out.bytes as Uint8Array);
  meshCache.set(id, buf);
  let bytes = 0;
  for (const b of meshCache.values()) bytes += b.length;
  while (meshCache.size > 1 && bytes > MESH_CACHE_BYTES) {
    const [k, b] = meshCache.entries().next().value as [string, Buffer];
    meshCache.delete(k);
    bytes -= b.length;
  }
  return buf;
}

/** Sends a revision's mesh binary with ETag / 304 handling (the bytes are made in the geometry worker). */
export async function sendMesh(deps: AppDeps, req: Request, res: Response, rev: Awaited<ReturnType<typeof revisionRow>>, cache: string): Promise<void> {
  const etag = `"qdm1-${rev.id}"`;
  res.set('ETag', etag);
  res.set('Cache-Control', cache);
  if (req.get('if-none-match') === etag) {
    res.status(304).end();
    return;
  }
  res.type(MESH_CONTENT_TYPE).send(await cachedWireMesh(deps, rev.id, rev));
}

/** The stored diagram of a build task, or 422 invalid_operation / invalid_file with the geometry's words. */
function builtOr422(out: BuildOutcome, code: 'invalid_file' | 'invalid_operation', what: string): { stored: StoredDiagram; warnings: string[] } {
  if (out.ok) return { stored: storedFromWire(out.stored), warnings: out.warnings };
  const first = out.problems[0];
  const where = first?.line !== undefined ? ` (line ${first.line})` : first?.offset !== undefined ? ` (byte ${first.offset})` : '';
  throw new HttpError(code, `${what}${where}: ${first?.message ?? 'unknown problem'}`, problemDetails(out.problems));
}

const EXPORT_TYPES = { obj: 'model/obj', off: 'text/plain', ply: 'application/octet-stream', stl: 'model/stl' } as const;

const slug = (s: string) => s.normalize('NFKD').replace(/[^\w-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'diagram';

export function diagramsRouter(deps: AppDeps): Router {
  const r = Router();
  const { db } = deps;
  const queue = analysisQueueFor(deps);
  const geo = geometryWorkerFor(deps);
  const uid = (req: Request) => req.user!.id;

  r.get('/workspaces/:workspaceId/diagrams', requireWorkspaceRole('viewer'), async (req, res) => {
    const trash = req.query.deleted === 'true' || req.query.deleted === '1';
    res.json({ diagrams: await listDiagrams(db, req.params.workspaceId as string, trash) });
  });

  r.post('/workspaces/:workspaceId/diagrams', requireWorkspaceRole('editor'), async (req, res) => {
    const input = parseOr400(createDiagramRequestSchema, req.body);
    const built = builtOr422(await geo.run({ type: 'template', template: input.template, resolution: input.resolution }), 'invalid_operation', 'The template cannot be built');
    const id = await createDiagram(db, {
      workspaceId: req.params.workspaceId as string, userId: uid(req), name: input.name, description: input.description,
      stored: built.stored, operation: { type: 'template', template: input.template }, message: 'Created from a template',
    });
    queue.kick();
    res.status(201).json({ diagram: await getDiagram(db, id, req.workspaceRole!) });
  });

  r.post('/workspaces/:workspaceId/diagrams/upload', requireWorkspaceRole('editor'), async (req, res) => {
    await receiveFile(req, res);
    const fields = parseOr400(uploadDiagramFieldsSchema, req.body ?? {});
    const file = req.file;
    if (!file) throw new HttpError('validation', 'file: Attach a diagram file (OBJ, PLY, OFF or STL) in the field “file”.');
    const bytes = new Uint8Array(file.buffer.buffer, file.buffer.byteOffset, file.buffer.byteLength);
    const parsed = builtOr422(await geo.run({ type: 'upload', fileName: file.originalname, bytes }), 'invalid_file', `${file.originalname} cannot be used`);
    const id = await createDiagram(db, {
      workspaceId: req.params.workspaceId as string, userId: uid(req), name: fields.name, description: fields.description,
      stored: parsed.stored, operation: { type: 'upload', fileName: file.originalname.slice(0, 200) }, message: `Uploaded ${file.originalname.slice(0, 200)}`,
    });
    queue.kick();
    res.status(201).json({ diagram: await getDiagram(db, id, req.workspaceRole!), warnings: parsed.warnings });
  });

  r.get('/diagrams/:diagramId', requireUser, async (req, res) => {
    const { diagram, role } = await accessDiagram(db, uid(req), req.params.diagramId, 'viewer');
    res.json({ diagram: await getDiagram(db, diagram.id, role) });
  });

  r.patch('/diagrams/:diagramId', requireUser, async (req, res) => {
    const { diagram, role } = await accessDiagram(db, uid(req), req.params.diagramId, 'editor');
    const input = parseOr400(updateDiagramRequestSchema, req.body);
    await renameDiagram(db, diagram.id, uid(req), input);
    res.json({ diagram: await getDiagram(db, diagram.id, role) });
  });

  r.delete('/diagrams/:diagramId', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, uid(req), req.params.diagramId, 'editor');
    await softDelete(db, diagram.id, uid(req));
    res.status(204).end();
  });

  r.post('/diagrams/:diagramId/undelete', requireUser, async (req, res) => {
    const { diagram, role } = await accessDiagram(db, uid(req), req.params.diagramId, 'editor', 'only');
    await undelete(db, diagram.id);
    res.json({ diagram: await getDiagram(db, diagram.id, role) });
  });

  r.post('/diagrams/:diagramId/duplicate', requireUser, async (req, res) => {
    const { diagram, role } = await accessDiagram(db, uid(req), req.params.diagramId, 'editor');
    const input = parseOr400(duplicateDiagramRequestSchema, req.body ?? {});
    const id = await duplicateDiagram(db, diagram, uid(req), input.name ?? `${diagram.name} (copy)`.slice(0, 160));
    queue.kick();
    res.status(201).json({ diagram: await getDiagram(db, id, role) });
  });

  r.get('/diagrams/:diagramId/revisions', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, uid(req), req.params.diagramId, 'viewer');
    res.json({ revisions: await listRevisions(db, diagram.id) });
  });

  r.get('/diagrams/:diagramId/revisions/:n/mesh', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, uid(req), req.params.diagramId, 'viewer');
    await sendMesh(deps, req, res, await revisionRow(db, diagram.id, req.params.n), 'private, max-age=31536000, immutable');
  });

  r.get('/diagrams/:diagramId/revisions/:n/analysis', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, uid(req), req.params.diagramId, 'viewer');
    const a = await analysisOf(db, await revisionId(db, diagram.id, req.params.n));
    if (a.status === 'pending') queue.kick();
    // A done analysis never changes: let the client revalidate by ETag (Express answers 304 itself).
    if (a.status === 'done') res.set('Cache-Control', 'private, no-cache');
    res.json(a);
  });

  r.get('/diagrams/:diagramId/revisions/:n/generators', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, uid(req), req.params.diagramId, 'viewer');
    const q = parseOr400(generatorsQuerySchema, req.query);
    const rev = await revisionId(db, diagram.id, req.params.n);
    const { stats, curves, basepoints, intersections, regions } = await doneResult(db, rev);
    const light = { stats, curves: curves.map((c) => ({ ...c, vertices: [] })), basepoints, intersections, regions };
    res.json(await geo.run({ type: 'generators', cacheKey: rev.id, result: light, offset: q.offset, limit: q.limit }));
  });

  r.get('/diagrams/:diagramId/revisions/:n/export', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, uid(req), req.params.diagramId, 'viewer');
    const format = parseOr400(exportFormatSchema, req.query.format ?? 'obj');
    const row = await revisionRow(db, diagram.id, req.params.n);
    const out = await geo.run({ type: 'export', row, format, title: `Quadrant: ${diagram.name}, revision ${row.number}` });
    const name = `${slug(diagram.name)}-r${row.number}.${format}`;
    res.set('Content-Disposition', `attachment; filename="${name}"`);
    res.type(EXPORT_TYPES[format]).send(typeof out.bytes === 'string' ? out.bytes : Buffer.from(out.bytes.buffer, out.bytes.byteOffset, out.bytes.byteLength));
  });

  r.post('/diagrams/:diagramId/edits', requireUser, async (req, res) => {
    const { diagram, role } = await accessDiagram(db, uid(req), req.params.diagramId, 'editor');
    const input = parseOr400(editRequestSchema, req.body);
    if (input.baseRevision !== diagram.headRevision) {
      throw new HttpError('conflict', `This diagram changed since you started (revision ${diagram.headRevision} is now current). Reload it and apply your change again.`);
    }
    const row = await revisionRow(db, diagram.id, input.baseRevision);
    const next = builtOr422(await geo.run({ type: 'edit', row, operation: input.operation }), 'invalid_operation', `The ${input.operation.type} cannot be applied`);
    const number = await appendRevision(db, {
      diagramId: diagram.id, base: input.baseRevision, userId: uid(req), stored: next.stored, operation: input.operation,
      message: input.message || describeOperation(input.operation),
    });
    queue.kick();
    const revision = (await listRevisions(db, diagram.id)).find((x) => x.number === number)!;
    res.status(201).json({ revision, diagram: await getDiagram(db, diagram.id, role) });
  });

  r.post('/diagrams/:diagramId/restore', requireUser, async (req, res) => {
    const { diagram, role } = await accessDiagram(db, uid(req), req.params.diagramId, 'editor');
    const input = parseOr400(restoreRequestSchema, req.body);
    const number = await restoreRevision(db, { diagramId: diagram.id, revision: input.revision, base: input.baseRevision, userId: uid(req), message: input.message });
    queue.kick();
    const revision = (await listRevisions(db, diagram.id)).find((x) => x.number === number)!;
    res.status(201).json({ revision, diagram: await getDiagram(db, diagram.id, role) });
  });

  r.use(unprocessableHandler);
  return r;
}
