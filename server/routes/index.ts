/**
 * Route registry: every resource router is mounted here under /api. Add one line per router in the
 * marked section; each router is `xxxRouter(deps: AppDeps): Router` with paths relative to /api.
 */
import type { Router } from 'express';
import type passport from 'passport';
import type { AppDeps } from '../deps.js';
import { authRouter } from './auth/auth.routes.js';
import { devRouter } from './dev/dev.routes.js';
import { healthRouter } from './health/health.routes.js';
import { invitationsRouter } from './invitations/invitations.routes.js';
import { workspacesRouter } from './workspaces/workspaces.routes.js';
import { diagramsRouter } from './diagrams/diagrams.routes.js';
import { domainsRouter } from './domains/domains.routes.js';
import { sharesRouter } from './shares/shares.routes.js';

export function registerRoutes(api: Router, deps: AppDeps, auth: passport.Authenticator): void {
  api.use(healthRouter(deps));
  api.use(authRouter(deps, auth));
  api.use(workspacesRouter(deps));
  api.use(invitationsRouter(deps));
  if (deps.env.NODE_ENV !== 'production') api.use(devRouter(deps));
  // --- lab routers (diagrams, domains, shares): one line each below ---
  api.use(diagramsRouter(deps));
  api.use(domainsRouter(deps));
  api.use(sharesRouter(deps));
}
