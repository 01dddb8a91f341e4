/**
 * TanStack Query hooks for the diagram library, built on server/contract. The list polls while any analysis
 * is still pending or running, so rows fill in as the server finishes.
 */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  DIAGRAM_PATHS, INVALID_FILE_STATUS,
  type CreateDiagramRequest, type DiagramListResponse, type DiagramResponse, type FileProblem,
  type UploadDiagramResponse,
} from '../../../server/contract/index.js';
import { api, ApiError } from '../../lib/api';

export const libraryKeys = {
  list: (workspaceId: string) => ['workspaces', workspaceId, 'diagrams'] as const,
};

const POLL_MS = 1500;

export function useDiagramList(workspaceId: string) {
  return useQuery({
    queryKey: libraryKeys.list(workspaceId),
    queryFn: ({ signal }) => api.get<DiagramListResponse>(DIAGRAM_PATHS.list(workspaceId), signal),
    enabled: Boolean(workspaceId),
    refetchInterval: (q) =>
      q.state.data?.diagrams.some((d) => d.analysisStatus === 'pending' || d.analysisStatus === 'running') ? POLL_MS : false,
  });
}

function useInvalidateList(workspaceId: string) {
  const qc = useQueryClient();
  return () => qc.invalidateQueries({ queryKey: libraryKeys.list(workspaceId) });
}

export function useCreateDiagram(workspaceId: string) {
  const invalidate = useInvalidateList(workspaceId);
  return useMutation({
    mutationFn: (body: CreateDiagramRequest) => api.post<DiagramResponse>(DIAGRAM_PATHS.create(workspaceId), body),
    onSuccess: invalidate,
  });
}

export function useRenameDiagram(workspaceId: string) {
  const invalidate = useInvalidateList(workspaceId);
  return useMutation({
    mutationFn: (v: { id: string; name: string }) => api.patch<DiagramResponse>(DIAGRAM_PATHS.one(v.id), { name: v.name }),
    onSuccess: invalidate,
  });
}

export function useDuplicateDiagram(workspaceId: string) {
  const invalidate = useInvalidateList(workspaceId);
  return useMutation({
    mutationFn: (id: string) => api.post<DiagramResponse>(DIAGRAM_PATHS.duplicate(id), {}),
    onSuccess: invalidate,
  });
}

export function useDeleteDiagram(workspaceId: string) {
  const invalidate = useInvalidateList(workspaceId);
  return useMutation({ mutationFn: (id: string) => api.delete(DIAGRAM_PATHS.one(id)), onSuccess: invalidate });
}

export function useUndeleteDiagram(workspaceId: string) {
  const invalidate = useInvalidateList(workspaceId);
  return useMutation({
    mutationFn: (id: string) => api.post<DiagramResponse>(DIAGRAM_PATHS.undelete(id), {}),
    onSuccess: invalidate,
  });
}

/** A rejected upload: the server's message and its problems (with line numbers for text formats). */
export class UploadRejected extends Error {
  constructor(message: string, readonly status: number, readonly problems: FileProblem[]) {
    super(message);
  }
}

/**
 * Uploads a mesh file with XMLHttpRequest so the browser reports real upload progress (fetch cannot).
 * Resolves with the created diagram; rejects with UploadRejected (422 problems, 413 too large, …) or
 * ApiError(0) when the network fails. `onProgress` receives 0..1.
 */
export function uploadDiagram(
  workspaceId: string,
  file: File,
  name: string,
  onProgress: (fraction: number) => void,
  signal?: AbortSignal,
): Promise<UploadDiagramResponse> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', DIAGRAM_PATHS.upload(workspaceId));
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (e) => { if (e.lengthComputable) onProgress(e.loaded / e.total); };
    xhr.onerror = () => reject(new ApiError(0, 'api_unreachable', 'The upload did not reach the server. Check the connection and try again.'));
    xhr.onabort = () => reject(new ApiError(0, 'aborted', 'Upload cancelled.'));
    xhr.onload = () => {
      let body: unknown;
      try { body = JSON.parse(xhr.responseText); } catch { body = undefined; }
      if (xhr.status >= 200 && xhr.status < 300) { onProgress(1); resolve(body as UploadDiagramResponse); return; }
      const err = (body as { error?: { code?: string; message?: string; details?: unknown } } | undefined)?.error;
      const problems = xhr.status === INVALID_FILE_STATUS && Array.isArray(err?.details) ? (err.details as FileProblem[]) : [];
      reject(new UploadRejected(err?.message ?? `The server answered ${xhr.status}.`, xhr.status, problems));
    };
    signal?.addEventListener('abort', () => xhr.abort());
    const form = new FormData();
    form.append('name', name);
    form.append('file', file);
    xhr.send(form);
  });
}
