/** Auth public surface for routers: role checks, origin check, sessions, passwords. */
export { requireUser, requireWorkspaceRole, workspaceRoleOf, assertRole, isUuid } from './roles.js';
export { requireSameOrigin } from './origin.js';
export { sessionMiddleware, createPassport, toUser, SESSION_COOKIE } from './session.js';
export { loginRateLimit } from './rate-limit.js';
export { hashPassword, verifyPassword, needsRehash, DEFAULT_LOG_N } from './password.js';
