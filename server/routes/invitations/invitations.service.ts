/**
 * Invitations: an owner invites an email address with a role; the invitee gets a one-time link by email.
 * Only the SHA-256 of the token is stored. Links expire after 7 days and work once, for the invited
 * email address only.
 */
import { createHash, randomBytes } from 'node:crypto';
import { and, desc, eq, gt, isNull } from 'drizzle-orm';
import {
  INVITATION_ACCEPT_CLIENT_PATH,
  roleAtLeast,
  type CreateInvitationRequest,
  type Invitation,
  type Workspace,
} from '../../contract/workspaces.js';
import type { Db } from '../../db/client.js';
import { invitations, memberships, users, workspaces } from '../../db/schema.js';
import type { Mailer } from '../../mail/mailer.js';
import { HttpError } from '../../http/errors.js';
import { addMembership } from '../workspaces/workspaces.service.js';

export const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000;

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

type Row = typeof invitations.$inferSelect & { inviterName: string | null };

function toInvitation(r: Row): Invitation {
  return {
    id: r.id,
    email: r.email,
    role: r.role,
    invitedBy: r.inviterName ?? '',
    createdAt: r.createdAt.toISOString(),
    expiresAt: r.expiresAt.toISOString(),
    acceptedAt: r.acceptedAt ? r.acceptedAt.toISOString() : null,
  };
}

/** Create an invitation and mail the accept link. Already a member → 409 conflict. */
export async function createInvitation(
  deps: { db: Db; mailer: Mailer; publicOrigin: string },
  workspaceId: string,
  inviter: Express.User,
  input: CreateInvitationRequest,
): Promise<Invitation> {
  const { db } = deps;
  const existing = await db
    .select({ userId: memberships.userId })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.workspaceId, workspaceId), eq(users.email, input.email)))
    .limit(1);
  if (existing.length) throw new HttpError('conflict', `${input.email} is already a member of this workspace.`);
  const [ws] = await db.select({ name: workspaces.name }).from(workspaces).where(eq(workspaces.id, workspaceId));
  if (!ws) throw new HttpError('not_found', 'Workspace not found.');

  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(Date.now() + INVITATION_TTL_MS);
  const [row] = await db
    .insert(invitations)
    .values({ workspaceId, email: input.email, role: input.role, tokenHash: hashToken(token), invitedBy: inviter.id, expiresAt })
    .returning();

  const link = `${deps.publicOrigin}${INVITATION_ACCEPT_CLIENT_PATH}?token=${encodeURIComponent(token)}`;
  await deps.mailer.send({
    to: input.email,
    subject: `${inviter.name} invited you to "${ws.name}" on Quadrant`,
    text: [
      `${inviter.name} (${inviter.email}) invited you to join the workspace "${ws.name}" on Quadrant as ${input.role}.`,
      '',
      'Open this link to accept (sign in or create an account with this email address first):',
      link,
      '',
      `The link works once and expires on ${expiresAt.toUTCString()}.`,
    ].join('\n'),
  });
  return toInvitation({ ...row, inviterName: inviter.name });
}

/** All invitations of a workspace, newest first. */
export async function listInvitations(db: Db, workspaceId: string): Promise<Invitation[]> {
  const rows = await db
    .select({ inv: invitations, inviterName: users.name })
    .from(invitations)
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.workspaceId, workspaceId))
    .orderBy(desc(invitations.createdAt));
  return rows.map((r) => toInvitation({ ...r.inv, inviterName: r.inviterName }));
}

/**
 * Accept an invitation for the signed-in `user`. Unknown, used or expired token → 404; token for another
 * email → 403. An existing member keeps the higher of their role and the invited role.
 */
export async function acceptInvitation(db: Db, user: Express.User, token: string): Promise<Workspace> {
  return db.transaction(async (tx) => {
    const [inv] = await tx
      .select()
      .from(invitations)
      .where(and(eq(invitations.tokenHash, hashToken(token)), isNull(invitations.acceptedAt), gt(invitations.expiresAt, new Date())))
      .for('update');
    if (!inv) throw new HttpError('not_found', 'This invitation is not valid any more (used, expired or unknown).');
    if (inv.email !== user.email) {
      throw new HttpError('forbidden', `This invitation was sent to ${inv.email}; sign in with that address to accept it.`);
    }
    const [current] = await tx
      .select({ role: memberships.role })
      .from(memberships)
      .where(and(eq(memberships.workspaceId, inv.workspaceId), eq(memberships.userId, user.id)));
    const role = current && roleAtLeast(current.role, inv.role) ? current.role : inv.role;
    await addMembership(tx, inv.workspaceId, user.id, role);
    await tx.update(invitations).set({ acceptedAt: new Date(), acceptedBy: user.id }).where(eq(invitations.id, inv.id));
    const [ws] = await tx.select().from(workspaces).where(eq(workspaces.id, inv.workspaceId));
    return { id: ws.id, name: ws.name, description: ws.description, role };
  });
}
