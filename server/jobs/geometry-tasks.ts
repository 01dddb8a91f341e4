/**
 * Every geometry computation the server runs, as plain data in and out, so it can run in a worker thread
 * (geometry-worker.ts) and keep the HTTP event loop free: analyses, templates, uploads, edits, exports and
 * the QDM1 wire mesh. Buffers cross the thread boundary as Uint8Arrays; `asBuffer` turns them back.
 */
import {
  buildTemplate, parseDiagramFile, writeObj, writeOff, writePly, writeStl, type Problem,
} from '../../geometry/index.js';
import type { AnalysisResult, EditOperation, ExportFormat, GeneratorsPageResponse, TemplateSpec } from '../contract/diagrams.js';
import { applyOperation } from '../routes/diagrams/operations.js';
import { loadDiagram, storeDiagram, wireMesh, type StoredDiagram, type StoredRow } from '../routes/diagrams/storage.js';
import { analyzeStored, combinatorialFromResult, type AnalysisOutcome, type ProgressFn } from './compute-analysis.js';
import { generatorsPageFor } from './floer-adapter.js';

/** Stored revision columns as they cross a thread boundary. */
export interface WireRow {
  mesh: Uint8Array;
  curves: unknown;
  basepoints: unknown;
  vertexLabels: Uint8Array | null;
}

export type GeometryTask =
  | { type: 'analyze'; row: WireRow }
  | { type: 'template'; template: TemplateSpec; resolution?: number }
  | { type: 'upload'; fileName: string; bytes: Uint8Array }
  | { type: 'edit'; row: WireRow; operation: EditOperation }
  | { type: 'export'; row: WireRow; format: ExportFormat; title: string }
  | { type: 'wire-mesh'; row: WireRow }
  /** A generator page; `cacheKey` (the revision id) keys the worker's cache of classified generators. */
  | { type: 'generators'; cacheKey: string; result: Pick<AnalysisResult, 'stats' | 'curves' | 'basepoints' | 'intersections' | 'regions'>; offset: number; limit: number };

/** A new diagram ready for the database, or the geometry's problems. */
export type BuildOutcome = { ok: true; stored: StoredDiagram; warnings: string[] } | { ok: false; problems: Problem[] };
export type BytesOutcome = { ok: true; bytes: Uint8Array | string };

export type TaskOutcome<T extends GeometryTask> =
  T extends { type: 'analyze' } ? AnalysisOutcome
    : T extends { type: 'template' | 'upload' | 'edit' } ? BuildOutcome
      : T extends { type: 'generators' } ? GeneratorsPageResponse
        : BytesOutcome;

export const asBuffer = (u: Uint8Array): Buffer => (Buffer.isBuffer(u) ? u : Buffer.from(u.buffer, u.byteOffset, u.byteLength));

export const fromWire = (r: WireRow): StoredRow => ({
  mesh: asBuffer(r.mesh), curves: r.curves, basepoints: r.basepoints, vertexLabels: r.vertexLabels ? asBuffer(r.vertexLabels) : null,
});

/** Buffers of a stored diagram after a thread boundary. */
export function storedFromWire(s: StoredDiagram): StoredDiagram {
  return { ...s, mesh: asBuffer(s.mesh), vertexLabels: s.vertexLabels ? asBuffer(s.vertexLabels) : null };
}

/** Runs one task on the calling thread. Never throws for user data. */
export function runGeometryTask(task: GeometryTask, progress: ProgressFn = () => undefined): AnalysisOutcome | BuildOutcome | BytesOutcome | GeneratorsPageResponse {
  switch (task.type) {
    case 'analyze':
      return analyzeStored(fromWire(task.row), progress);
    case 'template': {
      const built = buildTemplate({ ...task.template, ...(task.resolution ? { resolution: task.resolution } : {}) });
      return built.ok ? { ok: true, stored: storeDiagram(built.value), warnings: [] } : { ok: false, problems: built.errors };
    }
    case 'upload': {
      const parsed = parseDiagramFile(task.fileName, task.bytes);
      if (!parsed.ok) return { ok: false, problems: parsed.errors };
      return { ok: true, stored: storeDiagram(parsed.value.diagram), warnings: parsed.value.warnings.map((w) => w.message) };
    }
    case 'edit': {
      const next = applyOperation(loadDiagram(fromWire(task.row)), task.operation);
      return next.ok ? { ok: true, stored: storeDiagram(next.value), warnings: [] } : { ok: false, problems: next.errors };
    }
    case 'export': {
      const d = loadDiagram(fromWire(task.row));
      switch (task.format) {
        case 'obj': return { ok: true, bytes: writeObj(d, task.title) };
        case 'off': return { ok: true, bytes: writeOff(d.mesh) };
        case 'ply': return { ok: true, bytes: writePly(d) };
        case 'stl': return { ok: true, bytes: writeStl(d.mesh) };
      }
      return { ok: true, bytes: '' };
    }
    case 'generators':
      return generatorsPageFor(task.cacheKey, combinatorialFromResult(task.result as AnalysisResult), task.offset, task.limit);
    case 'wire-mesh':
      return { ok: true, bytes: wireMesh(fromWire(task.row)) };
  }
}
