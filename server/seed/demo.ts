/**
 * Demo data (invented): the "Lattice Harbor Topology Group" at the Kestrel Point Institute with three
 * demo accounts, password `quadrant-demo` (demo only; never use on a public installation).
 * Idempotent: existing accounts keep their passwords, the workspace is created once, roles are restored.
 */
import { and, eq } from 'drizzle-orm';
import type { Role } from '../contract/workspaces.js';
import type { Db } from '../db/client.js';
import { users, workspaces } from '../db/schema.js';
import { createUser } from '../routes/auth/auth.service.js';
import { addMembership } from '../routes/workspaces/workspaces.service.js';

export const DEMO_PASSWORD = 'quadrant-demo';
export const DEMO_WORKSPACE_NAME = 'Lattice Harbor Topology Group';

/** Demo people; the owner is created first so on an empty installation they become site administrator. */
export const DEMO_USERS: readonly { email: string; name: string; role: Role }[] = [
  { email: 'owner@demo.quadrant.test', name: 'Mira Okonkwo-Hale', role: 'owner' },
  { email: 'editor@demo.quadrant.test', name: 'Tobias Lindqvist-Arden', role: 'editor' },
  { email: 'viewer@demo.quadrant.test', name: 'Ilse Varga-Moreau', role: 'viewer' },
];

export interface DemoSeed {
  workspaceId: string;
  userIds: Record<Role, string>;
}

async function ensureUser(db: Db, u: { email: string; name: string }, logN?: number): Promise<string> {
  const [row] = await db.select({ id: users.id }).from(users).where(eq(users.email, u.email)).limit(1);
  if (row) return row.id;
  return (await createUser(db, { email: u.email, name: u.name, password: DEMO_PASSWORD }, logN)).id;
}

/** Create (or restore) the demo accounts and workspace. Returns their ids. */
export async function seedDemo(db: Db, options: { passwordLogN?: number } = {}): Promise<DemoSeed> {
  const userIds = {} as Record<Role, string>;
  for (const u of DEMO_USERS) userIds[u.role] = await ensureUser(db, u, options.passwordLogN);

  const [existing] = await db
    .select({ id: workspaces.id })
    .from(workspaces)
    .where(and(eq(workspaces.name, DEMO_WORKSPACE_NAME), eq(workspaces.createdBy, userIds.owner)))
    .limit(1);
  const workspaceId =
    existing?.id ??
    (
      await db
        .insert(workspaces)
        .values({
          name: DEMO_WORKSPACE_NAME,
          description:
            'Kestrel Point Institute: Heegaard diagrams of lens spaces, the Poincaré sphere and small ' +
            'Seifert fibred spaces, drawn on triangulated surfaces for the group seminar.',
          createdBy: userIds.owner,
        })
        .returning({ id: workspaces.id })
    )[0].id;
  for (const u of DEMO_USERS) await addMembership(db, workspaceId, userIds[u.role], u.role);
  return { workspaceId, userIds };
}
