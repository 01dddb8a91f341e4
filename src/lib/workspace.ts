/**
 * The one workspace query shared by features (the lab needs the caller's role to decide what to offer).
 * `useWorkspace(id).data?.workspace.role` is 'viewer' | 'editor' | 'owner'.
 */
import { useQuery } from '@tanstack/react-query';
import { roleAtLeast, WORKSPACE_PATHS, type Role, type WorkspaceResponse } from '../../server/contract/index.js';
import { api } from './api';
import { queryKeys } from './query-client';

export function useWorkspace(workspaceId: string) {
  return useQuery({
    queryKey: queryKeys.workspace(workspaceId),
    queryFn: ({ signal }) => api.get<WorkspaceResponse>(WORKSPACE_PATHS.one(workspaceId), signal),
    enabled: Boolean(workspaceId),
  });
}

/** True when the signed-in user's role in the workspace is at least `min` (false while loading). */
export function useCanInWorkspace(workspaceId: string, min: Role): boolean {
  const role = useWorkspace(workspaceId).data?.workspace.role;
  return role ? roleAtLeast(role, min) : false;
}
