/** Workspaces and memberships. Callers have already checked the caller's role. */
import { and, asc, eq, sql } from 'drizzle-orm';
import type { Member, Role, Workspace, WorkspaceSummary } from '../../contract/workspaces.js';
import type { Db } from '../../db/client.js';
import { memberships, users, workspaces } from '../../db/schema.js';
import { HttpError } from '../../http/errors.js';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/** Workspaces the user belongs to, with their role and member count, by name. */
export async function listWorkspaces(db: Db, userId: string): Promise<WorkspaceSummary[]> {
  const rows = await db
    .select({
      id: workspaces.id,
      name: workspaces.name,
      description: workspaces.description,
      role: memberships.role,
      memberCount: sql<number>`(select count(*)::int from memberships m where m.workspace_id = ${workspaces.id})`,
    })
    .from(memberships)
    .innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(workspaces.name), asc(workspaces.createdAt));
  return rows.map((r) => ({ ...r, memberCount: Number(r.memberCount) }));
}

/** Create a workspace; the creator becomes its owner. */
export async function createWorkspace(
  db: Db | Tx,
  userId: string,
  input: { name: string; description?: string },
): Promise<Workspace> {
  const run = async (tx: Db | Tx) => {
    const [ws] = await tx
      .insert(workspaces)
      .values({ name: input.name, description: input.description ?? '', createdBy: userId })
      .returning();
    await tx.insert(memberships).values({ workspaceId: ws.id, userId, role: 'owner' });
    return { id: ws.id, name: ws.name, description: ws.description, role: 'owner' as const };
  };
  return 'transaction' in db ? (db as Db).transaction(run) : run(db);
}

/** One workspace as seen by a member with `role`. */
export async function getWorkspace(db: Db, workspaceId: string, role: Role): Promise<Workspace> {
  const [ws] = await db.select().from(workspaces).where(eq(workspaces.id, workspaceId)).limit(1);
  if (!ws) throw new HttpError('not_found', 'Workspace not found.');
  return { id: ws.id, name: ws.name, description: ws.description, role };
}

export async function updateWorkspace(
  db: Db,
  workspaceId: string,
  role: Role,
  input: { name?: string; description?: string },
): Promise<Workspace> {
  const [ws] = await db
    .update(workspaces)
    .set({ ...input, updatedAt: new Date() })
    .where(eq(workspaces.id, workspaceId))
    .returning();
  if (!ws) throw new HttpError('not_found', 'Workspace not found.');
  return { id: ws.id, name: ws.name, description: ws.description, role };
}

const memberColumns = {
  userId: memberships.userId,
  name: users.name,
  email: users.email,
  role: memberships.role,
  joinedAt: memberships.createdAt,
};

function toMember(r: { userId: string; name: string; email: string; role: Role; joinedAt: Date }): Member {
  return { ...r, joinedAt: r.joinedAt.toISOString() };
}

/** Members ordered owners first, then editors, viewers; by name within a role. */
export async function listMembers(db: Db, workspaceId: string): Promise<Member[]> {
  const rows = await db
    .select(memberColumns)
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.workspaceId, workspaceId))
    .orderBy(asc(memberships.role), asc(users.name));
  return rows.map(toMember);
}

/** Lock the workspace's memberships and count owners (serialises concurrent owner changes). */
async function ownerCount(tx: Tx, workspaceId: string): Promise<number> {
  await tx.execute(sql`select 1 from workspaces where id = ${workspaceId} for update`);
  const r = await tx.execute<{ n: number }>(
    sql`select count(*)::int as n from memberships where workspace_id = ${workspaceId} and role = 'owner'`,
  );
  return Number(r.rows[0]?.n ?? 0);
}

/**
 * Inside a transaction: locks the workspace's memberships, finds the member (404 when absent) and refuses,
 * with 409, a change that would leave the workspace without an owner (`staysOwner` false for the member).
 */
async function guardOwnerChange(tx: Tx, workspaceId: string, userId: string, staysOwner: boolean): Promise<void> {
  const owners = await ownerCount(tx, workspaceId);
  const [current] = await tx
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)));
  if (!current) throw new HttpError('not_found', 'Member not found.');
  if (current.role === 'owner' && !staysOwner && owners <= 1) {
    throw new HttpError('conflict', 'A workspace needs at least one owner; make someone else owner first.');
  }
}

/** Change a member's role; demoting the last owner → 409 conflict; non-member → 404. */
export async function setMemberRole(db: Db, workspaceId: string, userId: string, role: Role): Promise<Member> {
  return db.transaction(async (tx) => {
    await guardOwnerChange(tx, workspaceId, userId, role === 'owner');
    const member = and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId));
    await tx.update(memberships).set({ role }).where(member);
    const [row] = await tx.select(memberColumns).from(memberships).innerJoin(users, eq(users.id, memberships.userId)).where(member);
    return toMember(row);
  });
}

/** Remove a member; removing the last owner → 409 conflict; non-member → 404. */
export async function removeMember(db: Db, workspaceId: string, userId: string): Promise<void> {
  await db.transaction(async (tx) => {
    await guardOwnerChange(tx, workspaceId, userId, false);
    await tx.delete(memberships).where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.userId, userId)));
  });
}

/** Add (or change) a membership; used by invitations and the seed. */
export async function addMembership(db: Db | Tx, workspaceId: string, userId: string, role: Role): Promise<void> {
  await db
    .insert(memberships)
    .values({ workspaceId, userId, role })
    .onConflictDoUpdate({ target: [memberships.workspaceId, memberships.userId], set: { role } });
}
