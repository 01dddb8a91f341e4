/**
 * Domain checks and saved domains (paths relative to /api). Anonymous 401, non-member 404, too low 403.
 *   POST   /diagrams/:diagramId/revisions/:n/domain-check   viewer   synchronous, nothing stored
 *   GET    /diagrams/:diagramId/domains                     viewer
 *   POST   /diagrams/:diagramId/domains                     editor
 *   DELETE /diagrams/:diagramId/domains/:domainId           editor
 */
import { Router } from 'express';
import { createDomainRequestSchema, domainCheckRequestSchema } from '../../contract/diagrams.js';
import { requireUser } from '../../auth/index.js';
import type { AppDeps } from '../../deps.js';
import { parseOr400 } from '../../http/errors.js';
import { accessDiagram, doneResult, revisionId } from '../diagrams/diagrams.service.js';
import { deleteDomain, listDomains, runDomainCheck, saveDomain } from './domains.service.js';

export function domainsRouter(deps: AppDeps): Router {
  const r = Router();
  const { db } = deps;

  r.post('/diagrams/:diagramId/revisions/:n/domain-check', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, req.user!.id, req.params.diagramId, 'viewer');
    const input = parseOr400(domainCheckRequestSchema, req.body);
    const result = await doneResult(db, await revisionId(db, diagram.id, req.params.n));
    res.json(runDomainCheck(result, input));
  });

  r.get('/diagrams/:diagramId/domains', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, req.user!.id, req.params.diagramId, 'viewer');
    res.json({ domains: await listDomains(db, diagram.id) });
  });

  r.post('/diagrams/:diagramId/domains', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, req.user!.id, req.params.diagramId, 'editor');
    const input = parseOr400(createDomainRequestSchema, req.body);
    const result = await doneResult(db, await revisionId(db, diagram.id, input.revision));
    const domain = await saveDomain(db, diagram.id, req.user!.id, input, result.regions.length, result.intersections.length);
    res.status(201).json({ domain });
  });

  r.delete('/diagrams/:diagramId/domains/:domainId', requireUser, async (req, res) => {
    const { diagram } = await accessDiagram(db, req.user!.id, req.params.diagramId, 'editor');
    await deleteDomain(db, diagram.id, req.params.domainId);
    res.status(204).end();
  });

  return r;
}
