/** TanStack Query hooks for workspaces, members and invitations, typed by server/contract. */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  WORKSPACE_PATHS,
  type AcceptInvitationResponse,
  type CreateInvitationRequest,
  type CreateWorkspaceRequest,
  type InvitationListResponse,
  type InvitationResponse,
  type MemberListResponse,
  type MemberResponse,
  type Role,
  type UpdateWorkspaceRequest,
  type WorkspaceListResponse,
  type WorkspaceResponse,
} from '../../../server/contract/index.js';
import { api } from '../../lib/api';
import { queryKeys } from '../../lib/query-client';

export { useWorkspace } from '../../lib/workspace';

export function useWorkspaces() {
  return useQuery({
    queryKey: queryKeys.workspaces,
    queryFn: ({ signal }) => api.get<WorkspaceListResponse>(WORKSPACE_PATHS.list, signal),
  });
}

export function useCreateWorkspace() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateWorkspaceRequest) => api.post<WorkspaceResponse>(WORKSPACE_PATHS.create, input),
    onSuccess: ({ workspace }) => {
      qc.setQueryData(queryKeys.workspace(workspace.id), { workspace });
      return qc.invalidateQueries({ queryKey: queryKeys.workspaces, exact: true });
    },
  });
}

export function useUpdateWorkspace(workspaceId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateWorkspaceRequest) => api.patch<WorkspaceResponse>(WORKSPACE_PATHS.one(workspaceId), input),
    onSuccess: (data) => {
      qc.setQueryData(queryKeys.workspace(workspaceId), data);
      return qc.invalidateQueries({ queryKey: queryKeys.workspaces, exact: true });
    },
  });
}

export function useMembers(workspaceId: string) {
  return useQuery({
    queryKey: queryKeys.members(workspaceId),
    queryFn: ({ signal }) => api.get<MemberListResponse>(WORKSPACE_PATHS.members(workspaceId), signal),
  });
}

export function useUpdateMemberRole(workspaceId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) =>
      api.patch<MemberResponse>(WORKSPACE_PATHS.member(workspaceId, userId), { role }),
    onSettled: () => qc.invalidateQueries({ queryKey: queryKeys.workspace(workspaceId) }),
  });
}

export function useRemoveMember(workspaceId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => api.delete(WORKSPACE_PATHS.member(workspaceId, userId)),
    onSuccess: () =>
      Promise.all([
        qc.invalidateQueries({ queryKey: queryKeys.members(workspaceId) }),
        qc.invalidateQueries({ queryKey: queryKeys.workspaces, exact: true }),
      ]),
  });
}

export function useInvitations(workspaceId: string, enabled: boolean) {
  return useQuery({
    queryKey: queryKeys.invitations(workspaceId),
    queryFn: ({ signal }) => api.get<InvitationListResponse>(WORKSPACE_PATHS.invitations(workspaceId), signal),
    enabled,
  });
}

export function useCreateInvitation(workspaceId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateInvitationRequest) => api.post<InvitationResponse>(WORKSPACE_PATHS.invitations(workspaceId), input),
    onSuccess: () => qc.invalidateQueries({ queryKey: queryKeys.invitations(workspaceId) }),
  });
}

export function useAcceptInvitation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (token: string) => api.post<AcceptInvitationResponse>(WORKSPACE_PATHS.acceptInvitation, { token }),
    onSuccess: ({ workspace }) => {
      qc.setQueryData(queryKeys.workspace(workspace.id), { workspace });
      return qc.invalidateQueries({ queryKey: queryKeys.workspaces, exact: true });
    },
  });
}
