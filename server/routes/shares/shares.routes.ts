/**
 * Share links: read-only public access to a diagram's head revision by an unguessable token. The token is
 * shown once (201 body); the database keeps its SHA-256. Paths relative to /api.
 *   GET    /diagrams/:diagramId/shares              editor
 *   POST   /diagrams/:diagramId/shares              editor   201 { share, token, url }
 *   DELETE /diagrams/:diagramId/shares/:shareId     editor   revoke (204)
 *   GET    /share/:token                            public   diagram, head analysis, mesh path
 *   GET    /share/:token/mesh                       public   QDM1 of the head revision
 * Unknown, revoked or trashed: 404.
 */
import { createHash, randomBytes } from 'node:crypto';
import { Router } from 'express';
import { and, eq, isNull, sql } from 'drizzle-orm';
import { DIAGRAM_PATHS, SHARE_CLIENT_PATH, type ShareLink } from '../../contract/diagrams.js';
import { isUuid, requireUser } from '../../auth/index.js';
import type { AppDeps } from '../../deps.js';
import type { Db } from '../../db/client.js';
import { diagrams, shareLinks } from '../../db/schema.js';
import { HttpError } from '../../http/errors.js';
import { analysisQueueFor } from '../../jobs/analysis-queue.js';
import { accessDiagram, analysisOf, revisionId, revisionRow } from '../diagrams/diagrams.service.js';
import { sendMesh } from '../diagrams/diagrams.routes.js';

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

type ShareRow = { id: string; created_at: Date; created_by: string | null; created_by_name: string | null; revoked_at: Date | null };
const iso = (d: Date | string) => (d instanceof Date ? d : new Date(d)).toISOString();
const toShare = (r: ShareRow): ShareLink => ({
  id: r.id,
  createdAt: iso(r.created_at),
  createdBy: r.created_by ? { id: r.created_by, name: r.created_by_name ?? '' } : { id: '00000000-0000-4000-8000-000000000000', name: 'Former member' },
  revokedAt: r.revoked_at ? iso(r.revoked_at) : null,
});

async function selectShares(db: Db, where: ReturnType<typeof sql>): Promise<ShareLink[]> {
  const res = await db.execute<ShareRow>(sql`
    SELECT s.id, s.created_at, s.created_by, u.name AS created_by_name, s.revoked_at
    FROM share_links s LEFT JOIN users u ON u.id = s.created_by WHERE ${where} ORDER BY s.created_at DESC`);
  return res.rows.map(toShare);
}

/** The live (not revoked, not trashed) diagram behind a token, or 404. */
async function sharedDiagram(db: Db, token: unknown) {
  if (typeof token !== 'string' || !/^[A-Za-z0-9_-]{20,100}$/.test(token)) throw new HttpError('not_found', 'This link does not exist or was revoked.');
  const rows = await db
    .select({ id: diagrams.id, name: diagrams.name, description: diagrams.description, headRevision: diagrams.headRevision, updatedAt: diagrams.updatedAt })
    .from(shareLinks).innerJoin(diagrams, eq(diagrams.id, shareLinks.diagramId))
    .where(and(eq(shareLinks.tokenHash, hashToken(token)), isNull(shareLinks.revokedAt), isNull(diagrams.deletedAt)))
    .limit(1);
  if (!rows[0]) throw new HttpError('not_found', 'This link does not exist or was revoked.');
  return rows[0];
}

export function sharesRouter(deps: AppDeps): Router {
  const r = Router();
  const { db, env } = deps;
  const queue = analysisQueueFor(deps);

  r.get('/diagrams/:diagramId/shares', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, req.user!.id, req.params.diagramId, 'editor');
    res.json({ shares: await selectShares(db, sql`s.diagram_id = ${diagram.id}`) });
  });

  r.post('/diagrams/:diagramId/shares', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, req.user!.id, req.params.diagramId, 'editor');
    const token = randomBytes(24).toString('base64url');
    const [row] = await db.insert(shareLinks).values({ diagramId: diagram.id, tokenHash: hashToken(token), createdBy: req.user!.id })
      .returning({ id: shareLinks.id });
    const [share] = await selectShares(db, sql`s.id = ${row.id}`);
    res.status(201).json({ share, token, url: `${env.PUBLIC_ORIGIN}${SHARE_CLIENT_PATH}/${token}` });
  });

  r.delete('/diagrams/:diagramId/shares/:shareId', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, req.user!.id, req.params.diagramId, 'editor');
    const shareId = req.params.shareId;
    if (!isUuid(shareId)) throw new HttpError('not_found', 'Share link not found.');
    const done = await db.update(shareLinks).set({ revokedAt: new Date() })
      .where(and(eq(shareLinks.id, shareId), eq(shareLinks.diagramId, diagram.id), isNull(shareLinks.revokedAt)))
      .returning({ id: shareLinks.id });
    if (!done.length) throw new HttpError('not_found', 'Share link not found or already revoked.');
    res.status(204).end();
  });

  r.get('/share/:token', async (req, res) => {
    const d = await sharedDiagram(db, req.params.token);
    const analysis = await analysisOf(db, await revisionId(db, d.id, d.headRevision));
    if (analysis.status === 'pending') queue.kick();
    res.json({
      diagram: { name: d.name, description: d.description, headRevision: d.headRevision, updatedAt: d.updatedAt.toISOString() },
      analysis,
      meshPath: DIAGRAM_PATHS.publicShareMesh(req.params.token as string),
    });
  });

  r.get('/share/:token/mesh', async (req, res) => {
    const d = await sharedDiagram(db, req.params.token);
    // The head may move on, so the client revalidates (cheap 304 by ETag) instead of caching for a year.
    await sendMesh(deps, req, res, await revisionRow(db, d.id, d.headRevision), 'private, no-cache');
  });

  return r;
}
