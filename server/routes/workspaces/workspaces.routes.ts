/**
 * Workspaces and members. Non-members get 404 (existence is not revealed), anonymous 401, too-low role 403.
 *   GET    /api/workspaces                                  signed in
 *   POST   /api/workspaces                                  signed in (creator becomes owner)
 *   GET    /api/workspaces/:workspaceId                     viewer+
 *   PATCH  /api/workspaces/:workspaceId                     owner
 *   GET    /api/workspaces/:workspaceId/members             viewer+
 *   PATCH  /api/workspaces/:workspaceId/members/:userId     owner
 *   DELETE /api/workspaces/:workspaceId/members/:userId     owner, or the member themself
 */
import { Router } from 'express';
import {
  createWorkspaceRequestSchema,
  updateMemberRequestSchema,
  updateWorkspaceRequestSchema,
} from '../../contract/workspaces.js';
import { isUuid, requireUser, requireWorkspaceRole } from '../../auth/index.js';
import type { AppDeps } from '../../deps.js';
import { HttpError, parseOr400 } from '../../http/errors.js';
import {
  createWorkspace,
  getWorkspace,
  listMembers,
  listWorkspaces,
  removeMember,
  setMemberRole,
  updateWorkspace,
} from './workspaces.service.js';

function userIdParam(value: unknown): string {
  if (!isUuid(value)) throw new HttpError('not_found', 'Member not found.');
  return value;
}

export function workspacesRouter(deps: AppDeps): Router {
  const r = Router();
  const { db } = deps;

  r.get('/workspaces', requireUser, async (req, res) => {
    res.json({ workspaces: await listWorkspaces(db, req.user!.id) });
  });

  r.post('/workspaces', requireUser, async (req, res) => {
    const input = parseOr400(createWorkspaceRequestSchema, req.body);
    res.status(201).json({ workspace: await createWorkspace(db, req.user!.id, input) });
  });

  r.get('/workspaces/:workspaceId', requireWorkspaceRole('viewer'), async (req, res) => {
    res.json({ workspace: await getWorkspace(db, req.params.workspaceId as string, req.workspaceRole!) });
  });

  r.patch('/workspaces/:workspaceId', requireWorkspaceRole('owner'), async (req, res) => {
    const input = parseOr400(updateWorkspaceRequestSchema, req.body);
    res.json({ workspace: await updateWorkspace(db, req.params.workspaceId as string, req.workspaceRole!, input) });
  });

  r.get('/workspaces/:workspaceId/members', requireWorkspaceRole('viewer'), async (req, res) => {
    res.json({ members: await listMembers(db, req.params.workspaceId as string) });
  });

  r.patch('/workspaces/:workspaceId/members/:userId', requireWorkspaceRole('owner'), async (req, res) => {
    const { role } = parseOr400(updateMemberRequestSchema, req.body);
    const member = await setMemberRole(db, req.params.workspaceId as string, userIdParam(req.params.userId), role);
    res.json({ member });
  });

  r.delete('/workspaces/:workspaceId/members/:userId', requireWorkspaceRole('viewer'), async (req, res) => {
    const target = userIdParam(req.params.userId);
    if (target !== req.user!.id && req.workspaceRole !== 'owner') {
      throw new HttpError('forbidden', 'Only an owner can remove other members.');
    }
    await removeMember(db, req.params.workspaceId as string, target);
    res.status(204).end();
  });

  return r;
}
