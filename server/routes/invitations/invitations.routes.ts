/**
 *   POST /api/workspaces/:workspaceId/invitations   owner; mails an accept link
 *   GET  /api/workspaces/:workspaceId/invitations   owner
 *   POST /api/invitations/accept {token}            signed in; joins with the invited role
 */
import { Router } from 'express';
import { acceptInvitationRequestSchema, createInvitationRequestSchema } from '../../contract/workspaces.js';
import { requireUser, requireWorkspaceRole } from '../../auth/index.js';
import type { AppDeps } from '../../deps.js';
import { parseOr400 } from '../../http/errors.js';
import { acceptInvitation, createInvitation, listInvitations } from './invitations.service.js';

export function invitationsRouter(deps: AppDeps): Router {
  const r = Router();

  r.post('/workspaces/:workspaceId/invitations', requireWorkspaceRole('owner'), async (req, res) => {
    const input = parseOr400(createInvitationRequestSchema, req.body);
    const invitation = await createInvitation(
      { db: deps.db, mailer: deps.mailer, publicOrigin: deps.env.PUBLIC_ORIGIN },
      req.params.workspaceId as string,
      req.user!,
      input,
    );
    res.status(201).json({ invitation });
  });

  r.get('/workspaces/:workspaceId/invitations', requireWorkspaceRole('owner'), async (req, res) => {
    res.json({ invitations: await listInvitations(deps.db, req.params.workspaceId as string) });
  });

  r.post('/invitations/accept', requireUser, async (req, res) => {
    const { token } = parseOr400(acceptInvitationRequestSchema, req.body);
    res.json({ workspace: await acceptInvitation(deps.db, req.user!, token) });
  });

  return r;
}
