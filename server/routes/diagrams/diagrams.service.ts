/**
 * Diagrams and their revisions in PostgreSQL. Revisions are immutable; every change appends one (edit,
 * restore) under a row lock on the diagram, refusing a stale base revision with 409 conflict. Each new
 * revision gets a pending analysis row for the queue; a revision whose content repeats an older one
 * (restore, duplicate) copies that analysis when it is done, so nothing is computed twice.
 */
import { and, desc, eq, isNull, isNotNull, sql } from 'drizzle-orm';
import type { Role } from '../../contract/workspaces.js';
import type {
  AnalysisResponse, AnalysisResult, AnalysisStatus, Diagram, DiagramSummary, Revision, RevisionOperation,
} from '../../contract/diagrams.js';
import { assertRole, isUuid, workspaceRoleOf } from '../../auth/index.js';
import type { Db } from '../../db/client.js';
import { analyses, diagramRevisions, diagrams } from '../../db/schema.js';
import { HttpError } from '../../http/errors.js';
import type { StoredDiagram } from './storage.js';

/** Shown for authors whose account is gone. */
const FORMER = { id: '00000000-0000-4000-8000-000000000000', name: 'Former member' };

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

export interface DiagramRow {
  id: string;
  workspaceId: string;
  name: string;
  headRevision: number;
  deletedAt: Date | null;
}

/**
 * The diagram and the caller's role in its workspace, or 404 (unknown, not a member, in the trash unless
 * `deleted` is 'allow'/'only') / 403 (role below `min`).
 */
export async function accessDiagram(
  db: Db, userId: string, diagramId: unknown, min: Role, deleted: 'hide' | 'only' = 'hide',
): Promise<{ diagram: DiagramRow; role: Role }> {
  if (!isUuid(diagramId)) throw new HttpError('not_found', 'Diagram not found.');
  const rows = await db
    .select({ id: diagrams.id, workspaceId: diagrams.workspaceId, name: diagrams.name, headRevision: diagrams.headRevision, deletedAt: diagrams.deletedAt })
    .from(diagrams).where(eq(diagrams.id, diagramId)).limit(1);
  const d = rows[0];
  const role = d ? await workspaceRoleOf(db, userId, d.workspaceId) : null;
  if (!d || !role) throw new HttpError('not_found', 'Diagram not found.');
  if ((deleted === 'hide') !== (d.deletedAt === null)) {
    throw new HttpError('not_found', deleted === 'hide' ? 'This diagram is in the trash.' : 'This diagram is not in the trash.');
  }
  assertRole(role, min, 'Diagram');
  return { diagram: d, role };
}

interface SummaryRow extends Record<string, unknown> {
  id: string; workspace_id: string; name: string; description: string; head_revision: number;
  created_at: Date; updated_at: Date; deleted_at: Date | null;
  created_by_id: string | null; created_by_name: string | null; updated_by_id: string | null; updated_by_name: string | null;
  stats: { genus?: number; curveCount?: number } | null; analysis_status: string | null;
  intersection_count: number | null; generator_count: string | null; nice: boolean | null;
  weakly_admissible: boolean | null; h1: string | null;
}

const iso = (d: Date | string) => (d instanceof Date ? d : new Date(d)).toISOString();

function toSummary(r: SummaryRow): DiagramSummary {
  return {
    id: r.id,
    workspaceId: r.workspace_id,
    name: r.name,
    description: r.description,
    genus: r.stats?.genus ?? null,
    curveCount: r.stats?.curveCount ?? 0,
    intersectionCount: r.intersection_count,
    generatorCount: r.generator_count,
    nice: r.nice,
    weaklyAdmissible: r.weakly_admissible,
    h1: r.h1,
    analysisStatus: (r.analysis_status ?? 'pending') as AnalysisStatus,
    headRevision: r.head_revision,
    createdAt: iso(r.created_at),
    createdBy: r.created_by_id ? { id: r.created_by_id, name: r.created_by_name ?? '' } : FORMER,
    updatedAt: iso(r.updated_at),
    updatedBy: r.updated_by_id ? { id: r.updated_by_id, name: r.updated_by_name ?? '' } : FORMER,
    deletedAt: r.deleted_at ? iso(r.deleted_at) : null,
  };
}

/** Summary rows; analysis facts come from analysis_summaries (the large result JSON is never read here). */
async function summaries(db: Db, where: ReturnType<typeof sql>): Promise<DiagramSummary[]> {
  const res = await db.execute<SummaryRow>(sql`
    SELECT d.id, d.workspace_id, d.name, d.description, d.head_revision, d.created_at, d.updated_at, d.deleted_at,
      cu.id AS created_by_id, cu.name AS created_by_name, uu.id AS updated_by_id, uu.name AS updated_by_name,
      r.stats, a.status AS analysis_status,
      s.intersection_count, s.generator_count, s.nice, s.weakly_admissible, s.h1
    FROM diagrams d
    LEFT JOIN diagram_revisions r ON r.diagram_id = d.id AND r.number = d.head_revision
    LEFT JOIN analyses a ON a.revision_id = r.id
    LEFT JOIN analysis_summaries s ON s.revision_id = r.id AND a.status = 'done'
    LEFT JOIN users cu ON cu.id = d.created_by
    LEFT JOIN users uu ON uu.id = d.updated_by
    WHERE ${where}
    ORDER BY d.updated_at DESC, d.name`);
  return res.rows.map(toSummary);
}

/** Diagrams of a workspace (or its trash). */
export function listDiagrams(db: Db, workspaceId: string, trash: boolean): Promise<DiagramSummary[]> {
  return summaries(db, trash
    ? sql`d.workspace_id = ${workspaceId} AND d.deleted_at IS NOT NULL`
    : sql`d.workspace_id = ${workspaceId} AND d.deleted_at IS NULL`);
}

/** One diagram with the caller's role. */
export async function getDiagram(db: Db, diagramId: string, role: Role): Promise<Diagram> {
  const [s] = await summaries(db, sql`d.id = ${diagramId}`);
  if (!s) throw new HttpError('not_found', 'Diagram not found.');
  return { ...s, role };
}

/** Inserts revision `number` of a diagram with its pending analysis. Returns the revision id. */
async function insertRevision(tx: Tx, diagramId: string, number: number, parent: number | null, userId: string,
  stored: StoredDiagram, operation: RevisionOperation, message: string): Promise<string> {
  const [rev] = await tx.insert(diagramRevisions).values({
    diagramId, number, parentNumber: parent, authorId: userId, message, operation,
    mesh: stored.mesh, curves: stored.curves, basepoints: stored.basepoints, vertexLabels: stored.vertexLabels, stats: stored.stats,
  }).returning({ id: diagramRevisions.id });
  await tx.insert(analyses).values({ revisionId: rev.id, status: 'pending', progress: 0 });
  return rev.id;
}

/** A new diagram with revision 1. */
export async function createDiagram(db: Db, input: {
  workspaceId: string; userId: string; name: string; description?: string; stored: StoredDiagram;
  operation: RevisionOperation; message: string;
}): Promise<string> {
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(diagrams).values({
      workspaceId: input.workspaceId, name: input.name, description: input.description ?? '',
      createdBy: input.userId, updatedBy: input.userId, headRevision: 1,
    }).returning({ id: diagrams.id });
    await insertRevision(tx, row.id, 1, null, input.userId, input.stored, input.operation, input.message);
    return row.id;
  });
}

/** Locks the diagram row and checks that `base` is still the head; 409 otherwise. */
async function lockHead(tx: Tx, diagramId: string, base: number): Promise<number> {
  const res = await tx.execute<{ head_revision: number }>(sql`SELECT head_revision FROM diagrams WHERE id = ${diagramId} FOR UPDATE`);
  const head = res.rows[0]?.head_revision;
  if (head === undefined) throw new HttpError('not_found', 'Diagram not found.');
  if (head !== base) {
    throw new HttpError('conflict', `This diagram changed since you started (revision ${head} is now current). Reload it and apply your change again.`);
  }
  return head;
}

async function bumpHead(tx: Tx, diagramId: string, number: number, userId: string): Promise<void> {
  await tx.update(diagrams).set({ headRevision: number, updatedAt: new Date(), updatedBy: userId }).where(eq(diagrams.id, diagramId));
}

/** Appends a revision computed from `base`; 409 when base is no longer the head. */
export async function appendRevision(db: Db, input: {
  diagramId: string; base: number; userId: string; stored: StoredDiagram; operation: RevisionOperation; message: string;
}): Promise<number> {
  return db.transaction(async (tx) => {
    const head = await lockHead(tx, input.diagramId, input.base);
    await insertRevision(tx, input.diagramId, head + 1, head, input.userId, input.stored, input.operation, input.message);
    await bumpHead(tx, input.diagramId, head + 1, input.userId);
    return head + 1;
  });
}

/**
 * Copies revision `fromNumber` of `fromDiagram` as revision `number` of `toDiagram` (columns copied inside
 * PostgreSQL; a done analysis is copied too, else a pending one is queued). Returns the new revision id.
 */
async function copyRevision(tx: Tx, fromDiagram: string, fromNumber: number, toDiagram: string, number: number,
  parent: number | null, userId: string, operation: RevisionOperation, message: string): Promise<string> {
  const res = await tx.execute<{ id: string; source: string }>(sql`
    INSERT INTO diagram_revisions (diagram_id, number, parent_number, author_id, message, operation, mesh, curves, basepoints, vertex_labels, stats)
    SELECT ${toDiagram}, ${number}, ${parent}, ${userId}, ${message}, ${JSON.stringify(operation)}::jsonb, mesh, curves, basepoints, vertex_labels, stats
    FROM diagram_revisions WHERE diagram_id = ${fromDiagram} AND number = ${fromNumber}
    RETURNING id, (SELECT id FROM diagram_revisions WHERE diagram_id = ${fromDiagram} AND number = ${fromNumber}) AS source`);
  const row = res.rows[0];
  if (!row) throw new HttpError('not_found', `Revision ${fromNumber} does not exist.`);
  await tx.execute(sql`
    INSERT INTO analyses (revision_id, status, progress, result, error, started_at, finished_at)
    SELECT ${row.id}, 'done', 1, result, NULL, started_at, finished_at FROM analyses WHERE revision_id = ${row.source} AND status = 'done'`);
  await tx.execute(sql`
    INSERT INTO analysis_summaries (revision_id, intersection_count, generator_count, nice, weakly_admissible, h1)
    SELECT ${row.id}, s.intersection_count, s.generator_count, s.nice, s.weakly_admissible, s.h1
    FROM analysis_summaries s JOIN analyses a ON a.revision_id = s.revision_id AND a.status = 'done'
    WHERE s.revision_id = ${row.source}`);
  await tx.insert(analyses).values({ revisionId: row.id, status: 'pending', progress: 0 }).onConflictDoNothing();
  return row.id;
}

/** New head revision with the content of an old one. 409 when base is stale; 404 when revision is unknown. */
export async function restoreRevision(db: Db, input: { diagramId: string; revision: number; base: number; userId: string; message?: string }): Promise<number> {
  return db.transaction(async (tx) => {
    const head = await lockHead(tx, input.diagramId, input.base);
    await copyRevision(tx, input.diagramId, input.revision, input.diagramId, head + 1, head, input.userId,
      { type: 'restore', revision: input.revision }, input.message ?? `Restored revision ${input.revision}`);
    await bumpHead(tx, input.diagramId, head + 1, input.userId);
    return head + 1;
  });
}

/** A new diagram in the same workspace whose revision 1 copies the source's head. */
export async function duplicateDiagram(db: Db, source: DiagramRow, userId: string, name: string): Promise<string> {
  return db.transaction(async (tx) => {
    const full = await tx.select({ description: diagrams.description }).from(diagrams).where(eq(diagrams.id, source.id));
    const [row] = await tx.insert(diagrams).values({
      workspaceId: source.workspaceId, name, description: full[0]?.description ?? '', createdBy: userId, updatedBy: userId, headRevision: 1,
    }).returning({ id: diagrams.id });
    await copyRevision(tx, source.id, source.headRevision, row.id, 1, null, userId,
      { type: 'duplicate', diagramId: source.id, revision: source.headRevision }, `Copy of “${source.name}” revision ${source.headRevision}`);
    return row.id;
  });
}

export async function renameDiagram(db: Db, diagramId: string, userId: string, patch: { name?: string; description?: string }): Promise<void> {
  await db.update(diagrams).set({ ...patch, updatedAt: new Date(), updatedBy: userId }).where(eq(diagrams.id, diagramId));
}

export async function softDelete(db: Db, diagramId: string, userId: string): Promise<void> {
  await db.update(diagrams).set({ deletedAt: new Date(), deletedBy: userId }).where(and(eq(diagrams.id, diagramId), isNull(diagrams.deletedAt)));
}

export async function undelete(db: Db, diagramId: string): Promise<void> {
  await db.update(diagrams).set({ deletedAt: null, deletedBy: null }).where(and(eq(diagrams.id, diagramId), isNotNull(diagrams.deletedAt)));
}

/** Revision history, newest first. */
export async function listRevisions(db: Db, diagramId: string): Promise<Revision[]> {
  const res = await db.execute<{
    number: number; parent_number: number | null; author_id: string | null; author_name: string | null;
    created_at: Date; message: string; operation: RevisionOperation; status: string | null;
  }>(sql`
    SELECT r.number, r.parent_number, r.author_id, u.name AS author_name, r.created_at, r.message, r.operation, a.status
    FROM diagram_revisions r LEFT JOIN users u ON u.id = r.author_id LEFT JOIN analyses a ON a.revision_id = r.id
    WHERE r.diagram_id = ${diagramId} ORDER BY r.number DESC`);
  return res.rows.map((r) => ({
    number: r.number,
    parentNumber: r.parent_number,
    authorId: r.author_id ?? FORMER.id,
    authorName: r.author_id ? (r.author_name ?? '') : FORMER.name,
    createdAt: iso(r.created_at),
    message: r.message,
    operation: r.operation,
    analysisStatus: (r.status ?? 'pending') as AnalysisStatus,
  }));
}

/** The stored columns of one revision, or 404. */
export async function revisionRow(db: Db, diagramId: string, number: unknown) {
  const n = typeof number === 'string' && /^\d{1,9}$/.test(number) ? Number(number) : typeof number === 'number' ? number : NaN;
  if (!Number.isInteger(n)) throw new HttpError('not_found', 'Revision not found.');
  const rows = await db.select({
    id: diagramRevisions.id, number: diagramRevisions.number, mesh: diagramRevisions.mesh, curves: diagramRevisions.curves,
    basepoints: diagramRevisions.basepoints, vertexLabels: diagramRevisions.vertexLabels,
  }).from(diagramRevisions).where(and(eq(diagramRevisions.diagramId, diagramId), eq(diagramRevisions.number, n))).limit(1);
  if (!rows[0]) throw new HttpError('not_found', `Revision ${n} does not exist.`);
  return rows[0];
}

/** Revision id by number (no columns), or 404. */
export async function revisionId(db: Db, diagramId: string, number: unknown): Promise<{ id: string; number: number }> {
  const n = typeof number === 'string' && /^\d{1,9}$/.test(number) ? Number(number) : typeof number === 'number' ? number : NaN;
  if (!Number.isInteger(n)) throw new HttpError('not_found', 'Revision not found.');
  const rows = await db.select({ id: diagramRevisions.id, number: diagramRevisions.number }).from(diagramRevisions)
    .where(and(eq(diagramRevisions.diagramId, diagramId), eq(diagramRevisions.number, n))).limit(1);
  if (!rows[0]) throw new HttpError('not_found', `Revision ${n} does not exist.`);
  return rows[0];
}

/** The analysis of a revision as the API answers it. */
export async function analysisOf(db: Db, rev: { id: string; number: number }): Promise<AnalysisResponse> {
  const rows = await db.select().from(analyses).where(eq(analyses.revisionId, rev.id)).limit(1);
  const a = rows[0];
  if (!a) return { revision: rev.number, status: 'pending', progress: 0, error: null, result: null };
  const err = a.error as { message?: string; problems?: string[] } | null;
  return {
    revision: rev.number,
    status: a.status as AnalysisStatus,
    progress: a.progress,
    error: err ? { message: err.message ?? 'The analysis failed.', ...(err.problems?.length ? { problems: err.problems } : {}) } : null,
    result: a.status === 'done' ? (a.result as AnalysisResult) : null,
  };
}

/** The cached result of a done analysis, or 409 while it is pending/running, 422-like conflict if failed. */
export async function doneResult(db: Db, rev: { id: string; number: number }): Promise<AnalysisResult> {
  const a = await analysisOf(db, rev);
  if (a.status === 'done' && a.result) return a.result;
  if (a.status === 'failed') throw new HttpError('conflict', `The analysis of revision ${rev.number} failed: ${a.error?.message ?? 'unknown reason'}`);
  throw new HttpError('conflict', `The analysis of revision ${rev.number} is not finished yet (${a.status}); try again in a moment.`);
}

/** Revision ids with a pending analysis (used to nudge the queue). */
export async function newestRevisionId(db: Db, diagramId: string): Promise<string | null> {
  const rows = await db.select({ id: diagramRevisions.id }).from(diagramRevisions)
    .where(eq(diagramRevisions.diagramId, diagramId)).orderBy(desc(diagramRevisions.number)).limit(1);
  return rows[0]?.id ?? null;
}
