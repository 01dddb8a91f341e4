/**
 * Sign-in and workspace role checks. Roles: viewer reads, editor writes content, owner manages the
 * workspace and its members. A signed-in non-member gets 404 (existence is not revealed); anonymous 401.
 */
import { and, eq } from 'drizzle-orm';
import type { RequestHandler } from 'express';
import { roleAtLeast, type Role } from '../contract/workspaces.js';
import type { Db } from '../db/client.js';
import { memberships } from '../db/schema.js';
import { depsOf } from '../deps.js';
import { HttpError } from '../http/errors.js';
import './types.js';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** True when `value` is a syntactically valid uuid (ids in paths are checked before querying). */
export function isUuid(value: unknown): value is string {
  return typeof value === 'string' && UUID.test(value);
}

/** The user's role in the workspace, or null when not a member (or the id is malformed). O(1) query. */
export async function workspaceRoleOf(db: Db, userId: string, workspaceId: string): Promise<Role | null> {
  if (!isUuid(userId) || !isUuid(workspaceId)) return null;
  const rows = await db
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)))
    .limit(1);
  return rows[0]?.role ?? null;
}

/**
 * Throw the right HttpError unless `role` (null = not a member) reaches `min`:
 * null → 404 not_found, too low → 403 forbidden. For routes that look up the workspace themselves.
 */
export function assertRole(role: Role | null, min: Role, what = 'Workspace'): asserts role is Role {
  if (!role) throw new HttpError('not_found', `${what} not found.`);
  if (!roleAtLeast(role, min)) throw new HttpError('forbidden', `This needs the ${min} role or higher; you are ${role}.`);
}

/** 401 unauthenticated unless signed in. */
export const requireUser: RequestHandler = (req, _res, next) => {
  if (req.user) next();
  else next(new HttpError('unauthenticated', 'Sign in first.'));
};

/** Signed in and at least `min` in req.params.workspaceId; sets req.workspaceRole. */
export function requireWorkspaceRole(min: Role): RequestHandler {
  return async (req, _res, next) => {
    if (!req.user) throw new HttpError('unauthenticated', 'Sign in first.');
    const workspaceId = req.params.workspaceId;
    const role = await workspaceRoleOf(depsOf(req).db, req.user.id, typeof workspaceId === 'string' ? workspaceId : '');
    assertRole(role, min);
    req.workspaceRole = role;
    next();
  };
}
