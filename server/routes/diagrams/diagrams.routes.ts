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
  buildTemplate, parseDiagramFile, writeObj, writeOff, writePly, writeStl,
} from '../../../geometry/index.js';
import {
  createDiagramRequestSchema, duplicateDiagramRequestSchema, editRequestSchema, exportFormatSchema,
  generatorsQuerySchema, MAX_UPLOAD_BYTES, MESH_CONTENT_TYPE, restoreRequestSchema, updateDiagramRequestSchema,
  uploadDiagramFieldsSchema,
} from '../../contract/diagrams.js';
import { requireUser, requireWorkspaceRole } from '../../auth/index.js';
import type { AppDeps } from '../../deps.js';
import { HttpError, parseOr400 } from '../../http/errors.js';
import { analysisQueueFor } from '../../jobs/analysis-queue.js';
import { combinatorialFromResult } from '../../jobs/compute-analysis.js';
import { generatorsPageFor } from '../../jobs/floer-adapter.js';
import {
  accessDiagram, analysisOf, appendRevision, createDiagram, doneResult, duplicateDiagram, getDiagram, listDiagrams,
  listRevisions, renameDiagram, restoreRevision, revisionId, revisionRow, softDelete, undelete,
} from './diagrams.service.js';
import { applyOperation, describeOperation } from './operations.js';
import { loadDiagram, wireMesh } from './storage.js';
import { problemDetails, Unprocessable, unprocessableHandler } from './unprocessable.js';

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
export function cachedWireMesh(id: string, row: Parameters<typeof wireMesh>[0]): Buffer {
  let buf = meshCache.get(id);
  if (buf) {
    meshCache.delete(id);
  } else {
    buf = wireMesh(row);
  }
  meshCache.set(id, buf);
  let bytes = 0;
  for (const b of meshCache.values()) bytes += b.length;
  while (meshCache.size > 1 && bytes > 256 * 1024 * 1024) {
    const [k, b] = meshCache.entries().next().value as [string, Buffer];
    meshCache.delete(k);
    bytes -= b.length;
  }
  return buf;
}

/** Sends an immutable mesh binary with ETag / 304 handling. */
export async function sendMesh(req: Request, res: Response, rev: Awaited<ReturnType<typeof revisionRow>>, cache: string): Promise<void> {
  const etag = `"qdm1-${rev.id}"`;
  res.set('ETag', etag);
  res.set('Cache-Control', cache);
  if (req.get('if-none-match') === etag) {
    res.status(304).end();
    return;
  }
  res.type(MESH_CONTENT_TYPE).send(cachedWireMesh(rev.id, rev));
}

const slug = (s: string) => s.normalize('NFKD').replace(/[^\w-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'diagram';

export function diagramsRouter(deps: AppDeps): Router {
  const r = Router();
  const { db } = deps;
  const queue = analysisQueueFor(deps);
  const uid = (req: Request) => req.user!.id;

  r.get('/workspaces/:workspaceId/diagrams', requireWorkspaceRole('viewer'), async (req, res) => {
    const trash = req.query.deleted === 'true' || req.query.deleted === '1';
    res.json({ diagrams: await listDiagrams(db, req.params.workspaceId as string, trash) });
  });

  r.post('/workspaces/:workspaceId/diagrams', requireWorkspaceRole('editor'), async (req, res) => {
    const input = parseOr400(createDiagramRequestSchema, req.body);
    const built = buildTemplate({ ...input.template, ...(input.resolution ? { resolution: input.resolution } : {}) });
    if (!built.ok) throw new Unprocessable('invalid_operation', `The template cannot be built: ${built.errors[0]?.message}`, problemDetails(built.errors));
    const id = await createDiagram(db, {
      workspaceId: req.params.workspaceId as string, userId: uid(req), name: input.name, description: input.description,
      diagram: built.value, operation: { type: 'template', template: input.template }, message: 'Created from a template',
    });
    queue.kick();
    res.status(201).json({ diagram: await getDiagram(db, id, req.workspaceRole!) });
  });

  r.post('/workspaces/:workspaceId/diagrams/upload', requireWorkspaceRole('editor'), async (req, res) => {
    await receiveFile(req, res);
    const fields = parseOr400(uploadDiagramFieldsSchema, req.body ?? {});
    const file = req.file;
    if (!file) throw new HttpError('validation', 'file: Attach a diagram file (OBJ, PLY, OFF or STL) in the field “file”.');
    const parsed = parseDiagramFile(file.originalname, new Uint8Array(file.buffer.buffer, file.buffer.byteOffset, file.buffer.byteLength));
    if (!parsed.ok) {
      const first = parsed.errors[0];
      const where = first?.line !== undefined ? ` (line ${first.line})` : first?.offset !== undefined ? ` (byte ${first.offset})` : '';
      throw new Unprocessable('invalid_file', `${file.originalname} cannot be used${where}: ${first?.message ?? 'unknown problem'}`, problemDetails(parsed.errors));
    }
    const id = await createDiagram(db, {
      workspaceId: req.params.workspaceId as string, userId: uid(req), name: fields.name, description: fields.description,
      diagram: parsed.value.diagram, operation: { type: 'upload', fileName: file.originalname.slice(0, 200) }, message: `Uploaded ${file.originalname.slice(0, 200)}`,
    });
    queue.kick();
    res.status(201).json({ diagram: await getDiagram(db, id, req.workspaceRole!), warnings: parsed.value.warnings.map((w) => w.message) });
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
    await sendMesh(req, res, await revisionRow(db, diagram.id, req.params.n), 'private, max-age=31536000, immutable');
  });

  r.get('/diagrams/:diagramId/revisions/:n/analysis', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, uid(req), req.params.diagramId, 'viewer');
    const a = await analysisOf(db, await revisionId(db, diagram.id, req.params.n));
    if (a.status === 'pending') queue.kick();
    res.json(a);
  });

  r.get('/diagrams/:diagramId/revisions/:n/generators', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, uid(req), req.params.diagramId, 'viewer');
    const q = parseOr400(generatorsQuerySchema, req.query);
    const rev = await revisionId(db, diagram.id, req.params.n);
    const result = await doneResult(db, rev);
    res.json(generatorsPageFor(rev.id, combinatorialFromResult(result), q.offset, q.limit));
  });

  r.get('/diagrams/:diagramId/revisions/:n/export', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, uid(req), req.params.diagramId, 'viewer');
    const format = parseOr400(exportFormatSchema, req.query.format ?? 'obj');
    const row = await revisionRow(db, diagram.id, req.params.n);
    const d = loadDiagram(row);
    const name = `${slug(diagram.name)}-r${row.number}.${format}`;
    res.set('Content-Disposition', `attachment; filename="${name}"`);
    if (format === 'obj') res.type('model/obj').send(writeObj(d, `Quadrant: ${diagram.name}, revision ${row.number}`));
    else if (format === 'off') res.type('text/plain').send(writeOff(d.mesh));
    else if (format === 'ply') res.type('application/octet-stream').send(Buffer.from(writePly(d)));
    else res.type('model/stl').send(Buffer.from(writeStl(d.mesh)));
  });

  r.post('/diagrams/:diagramId/edits', requireUser, async (req, res) => {
    const { diagram, role } = await accessDiagram(db, uid(req), req.params.diagramId, 'editor');
    const input = parseOr400(editRequestSchema, req.body);
    if (input.baseRevision !== diagram.headRevision) {
      throw new HttpError('conflict', `This diagram changed since you started (revision ${diagram.headRevision} is now current). Reload it and apply your change again.`);
    }
    const base = loadDiagram(await revisionRow(db, diagram.id, input.baseRevision));
    const next = applyOperation(base, input.operation);
    if (!next.ok) throw new Unprocessable('invalid_operation', `The ${input.operation.type} cannot be applied: ${next.errors[0]?.message ?? 'unknown problem'}`, problemDetails(next.errors));
    const number = await appendRevision(db, {
      diagramId: diagram.id, base: input.baseRevision, userId: uid(req), diagram: next.value, operation: input.operation,
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
