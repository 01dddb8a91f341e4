/** Request augmentation shared by the auth middleware and routes. */
import type { Role } from '../contract/workspaces.js';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    /** The signed-in user as passport stores it on req.user. */
    interface User {
      id: string;
      email: string;
      name: string;
      isAdmin: boolean;
    }
    interface Request {
      /** Set by requireWorkspaceRole: the caller's role in req.params.workspaceId. */
      workspaceRole?: Role;
    }
  }
}

export {};
