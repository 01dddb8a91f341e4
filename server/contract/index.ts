/**
 * The API's public face: the only module of server/ that src/ may import. Zod schemas, types, paths and
 * error codes; no server-only imports here or in any file re-exported here.
 * Each resource file is re-exported explicitly (no `export *`); others add one line per file below.
 */
export {
  ERROR_STATUS,
  errorCodeSchema,
  apiErrorSchema,
  isApiError,
  type ErrorCode,
  type ApiErrorBody,
} from './errors.js';
export {
  AUTH_PATHS,
  PASSWORD_MIN_LENGTH,
  userSchema,
  signupRequestSchema,
  loginRequestSchema,
  userResponseSchema,
  type User,
  type SignupRequest,
  type LoginRequest,
  type UserResponse,
} from './auth.js';
export {
  ROLES,
  ROLE_RANK,
  roleSchema,
  roleAtLeast,
  WORKSPACE_PATHS,
  INVITATION_ACCEPT_CLIENT_PATH,
  workspaceSummarySchema,
  workspaceListResponseSchema,
  workspaceSchema,
  workspaceResponseSchema,
  createWorkspaceRequestSchema,
  updateWorkspaceRequestSchema,
  memberSchema,
  memberListResponseSchema,
  updateMemberRequestSchema,
  memberResponseSchema,
  createInvitationRequestSchema,
  invitationSchema,
  invitationResponseSchema,
  invitationListResponseSchema,
  acceptInvitationRequestSchema,
  acceptInvitationResponseSchema,
  type Role,
  type WorkspaceSummary,
  type WorkspaceListResponse,
  type Workspace,
  type WorkspaceResponse,
  type CreateWorkspaceRequest,
  type UpdateWorkspaceRequest,
  type Member,
  type MemberListResponse,
  type UpdateMemberRequest,
  type MemberResponse,
  type CreateInvitationRequest,
  type Invitation,
  type InvitationResponse,
  type InvitationListResponse,
  type AcceptInvitationRequest,
  type AcceptInvitationResponse,
} from './workspaces.js';
export { HEALTH_PATH, healthResponseSchema, type HealthResponse } from './health.js';
// --- diagrams (lab-server helper adds its exports here) ---
