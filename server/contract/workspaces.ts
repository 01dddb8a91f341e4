/**
 * Workspaces, members and invitations. Client-safe (zod only).
 *
 * Visibility: a signed-in user who is not a member gets 404 not_found for a workspace (its existence is
 * not revealed); an anonymous request gets 401 unauthenticated. A member whose role is too low gets
 * 403 forbidden. Roles: viewer reads, editor writes content, owner manages the workspace and members.
 */
import { z } from 'zod';

export const ROLES = ['viewer', 'editor', 'owner'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

/** Rank of a role; `roleAtLeast(a, b)` is true when a grants everything b grants. */
export const ROLE_RANK: Record<Role, number> = { viewer: 1, editor: 2, owner: 3 };
export function roleAtLeast(role: Role, min: Role): boolean {
  return ROLE_RANK[role] >= ROLE_RANK[min];
}

export const WORKSPACE_PATHS = {
  list: '/api/workspaces',
  create: '/api/workspaces',
  one: (workspaceId: string) => `/api/workspaces/${workspaceId}`,
  members: (workspaceId: string) => `/api/workspaces/${workspaceId}/members`,
  member: (workspaceId: string, userId: string) => `/api/workspaces/${workspaceId}/members/${userId}`,
  invitations: (workspaceId: string) => `/api/workspaces/${workspaceId}/invitations`,
  acceptInvitation: '/api/invitations/accept',
} as const;

export const workspaceSummarySchema = z.object({
  id: z.uuid(),
  name: z.string(),
  description: z.string(),
  role: roleSchema,
  memberCount: z.number().int(),
});
export type WorkspaceSummary = z.infer<typeof workspaceSummarySchema>;

export const workspaceListResponseSchema = z.object({ workspaces: z.array(workspaceSummarySchema) });
export type WorkspaceListResponse = z.infer<typeof workspaceListResponseSchema>;

export const workspaceSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  description: z.string(),
  role: roleSchema,
});
export type Workspace = z.infer<typeof workspaceSchema>;
/** Body of GET/PATCH one workspace and of 201 create. */
export const workspaceResponseSchema = z.object({ workspace: workspaceSchema });
export type WorkspaceResponse = z.infer<typeof workspaceResponseSchema>;

const nameField = z.string().trim().min(1, { message: 'Enter a name.' }).max(120);
const descriptionField = z.string().trim().max(2000);

export const createWorkspaceRequestSchema = z.object({ name: nameField, description: descriptionField.optional() });
export type CreateWorkspaceRequest = z.infer<typeof createWorkspaceRequestSchema>;

export const updateWorkspaceRequestSchema = z
  .object({ name: nameField.optional(), description: descriptionField.optional() })
  .refine((v) => v.name !== undefined || v.description !== undefined, { message: 'Nothing to change.' });
export type UpdateWorkspaceRequest = z.infer<typeof updateWorkspaceRequestSchema>;

export const memberSchema = z.object({
  userId: z.uuid(),
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  joinedAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;
export const memberListResponseSchema = z.object({ members: z.array(memberSchema) });
export type MemberListResponse = z.infer<typeof memberListResponseSchema>;

/** PATCH member role (owner). Demoting the last owner answers 409 conflict. Answers { member }. */
export const updateMemberRequestSchema = z.object({ role: roleSchema });
export type UpdateMemberRequest = z.infer<typeof updateMemberRequestSchema>;
export const memberResponseSchema = z.object({ member: memberSchema });
export type MemberResponse = z.infer<typeof memberResponseSchema>;
/** DELETE member (owner, or the member themself) answers 204; removing the last owner answers 409. */

export const createInvitationRequestSchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email({ message: 'Enter a valid email address.' })),
  role: roleSchema,
});
export type CreateInvitationRequest = z.infer<typeof createInvitationRequestSchema>;

export const invitationSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  role: roleSchema,
  invitedBy: z.string(),
  createdAt: z.string(),
  expiresAt: z.string(),
  acceptedAt: z.string().nullable(),
});
export type Invitation = z.infer<typeof invitationSchema>;
/** 201 body of POST invitations (the token travels only by email). */
export const invitationResponseSchema = z.object({ invitation: invitationSchema });
export type InvitationResponse = z.infer<typeof invitationResponseSchema>;
export const invitationListResponseSchema = z.object({ invitations: z.array(invitationSchema) });
export type InvitationListResponse = z.infer<typeof invitationListResponseSchema>;

/** The accept link in the email is `${PUBLIC_ORIGIN}/invitations/accept?token=...` (a client route). */
export const INVITATION_ACCEPT_CLIENT_PATH = '/invitations/accept';
export const acceptInvitationRequestSchema = z.object({ token: z.string().min(10).max(200) });
export type AcceptInvitationRequest = z.infer<typeof acceptInvitationRequestSchema>;
/** 200 body of accept: the joined workspace with the granted role. */
export const acceptInvitationResponseSchema = z.object({ workspace: workspaceSchema });
export type AcceptInvitationResponse = z.infer<typeof acceptInvitationResponseSchema>;
