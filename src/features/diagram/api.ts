/**
 * TanStack Query hooks for one diagram: the diagram, its revisions, a revision's mesh binary and analysis
 * (polled while it runs), generator pages, domain checks, saved domains, edits and restore.
 * The client never recomputes what the server cached: everything shown comes from these answers.
 */
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  DIAGRAM_PATHS, decodeMeshBinary,
  type AnalysisResponse, type CreateDomainRequest, type DiagramResponse, type DomainCheckResponse,
  type DomainCoefficients, type EditOperationInput, type GeneratorsPageResponse, type MeshBinary,
  type RevisionListResponse, type RevisionResponse, type SavedDomainListResponse, type SavedDomainResponse,
} from '../../../server/contract/index.js';
import { api, ApiError, apiFetch, ApiUnreachableError } from '../../lib/api';

export const diagramKeys = {
  all: (id: string) => ['diagrams', id] as const,
  one: (id: string) => ['diagrams', id, 'summary'] as const,
  revisions: (id: string) => ['diagrams', id, 'revisions'] as const,
  mesh: (id: string, rev: number) => ['diagrams', id, 'mesh', rev] as const,
  analysis: (id: string, rev: number) => ['diagrams', id, 'analysis', rev] as const,
  generators: (id: string, rev: number, offset: number, limit: number) => ['diagrams', id, 'generators', rev, offset, limit] as const,
  domainCheck: (id: string, rev: number, key: string) => ['diagrams', id, 'domain-check', rev, key] as const,
  domains: (id: string) => ['diagrams', id, 'domains'] as const,
};

export function useDiagram(id: string) {
  return useQuery({
    queryKey: diagramKeys.one(id),
    queryFn: ({ signal }) => api.get<DiagramResponse>(DIAGRAM_PATHS.one(id), signal),
    enabled: Boolean(id),
  });
}

export function useRevisions(id: string) {
  return useQuery({
    queryKey: diagramKeys.revisions(id),
    queryFn: ({ signal }) => api.get<RevisionListResponse>(DIAGRAM_PATHS.revisions(id), signal),
    enabled: Boolean(id),
  });
}

/** Fetches and decodes a QDM1 mesh binary (immutable per revision, so cached for the session). */
export async function fetchMesh(path: string, signal?: AbortSignal): Promise<MeshBinary> {
  let res: Response;
  try {
    res = await fetch(path, { credentials: 'same-origin', signal });
  } catch (e) {
    if (signal?.aborted) throw e;
    throw new ApiUnreachableError(0);
  }
  if (!res.ok) {
    let message = `Could not load the mesh (${res.status}).`;
    let code = `http_${res.status}`;
    try {
      const body = (await res.json()) as { error?: { code: string; message: string } };
      if (body.error) { message = body.error.message; code = body.error.code; }
    } catch { /* not JSON */ }
    throw new ApiError(res.status, code, message);
  }
  return decodeMeshBinary(await res.arrayBuffer());
}

export function useMesh(id: string, rev: number | null) {
  return useQuery({
    queryKey: diagramKeys.mesh(id, rev ?? 0),
    queryFn: ({ signal }) => fetchMesh(DIAGRAM_PATHS.mesh(id, rev!), signal),
    enabled: Boolean(id) && rev !== null,
    staleTime: Infinity,
    gcTime: 10 * 60_000,
  });
}

export function useAnalysis(id: string, rev: number | null) {
  return useQuery({
    queryKey: diagramKeys.analysis(id, rev ?? 0),
    queryFn: ({ signal }) => api.get<AnalysisResponse>(DIAGRAM_PATHS.analysis(id, rev!), signal),
    enabled: Boolean(id) && rev !== null,
    staleTime: (q) => (q.state.data?.status === 'done' || q.state.data?.status === 'failed' ? Infinity : 0),
    refetchInterval: (q) => (q.state.data && (q.state.data.status === 'pending' || q.state.data.status === 'running') ? 1000 : false),
  });
}

export function useGenerators(id: string, rev: number | null, offset: number, limit: number, enabled: boolean) {
  return useQuery({
    queryKey: diagramKeys.generators(id, rev ?? 0, offset, limit),
    queryFn: ({ signal }) => api.get<GeneratorsPageResponse>(`${DIAGRAM_PATHS.generators(id, rev!)}?offset=${offset}&limit=${limit}`, signal),
    enabled: enabled && rev !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
  });
}

/** Nonzero coefficients only, keys sorted, as the request body and a stable cache key. */
export function normalizeCoefficients(c: Record<number, number>): DomainCoefficients {
  const out: DomainCoefficients = {};
  for (const k of Object.keys(c).map(Number).sort((a, b) => a - b)) if (c[k]) out[String(k)] = c[k];
  return out;
}

/** Live domain check; the server answers e, n_x, n_y, μ and whether the boundary fits a pair of generators. */
export function useDomainCheck(id: string, rev: number | null, coefficients: DomainCoefficients, ends: { from?: number[]; to?: number[] } = {}) {
  const key = JSON.stringify([coefficients, ends.from ?? null, ends.to ?? null]);
  return useQuery({
    queryKey: diagramKeys.domainCheck(id, rev ?? 0, key),
    queryFn: () => apiFetch<DomainCheckResponse>(DIAGRAM_PATHS.domainCheck(id, rev!), { method: 'POST', body: { coefficients, ...ends } }),
    enabled: rev !== null && Object.keys(coefficients).length > 0,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
  });
}

export function useSavedDomains(id: string) {
  return useQuery({
    queryKey: diagramKeys.domains(id),
    queryFn: ({ signal }) => api.get<SavedDomainListResponse>(DIAGRAM_PATHS.domains(id), signal),
    enabled: Boolean(id),
  });
}

export function useSaveDomain(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateDomainRequest) => api.post<SavedDomainResponse>(DIAGRAM_PATHS.domains(id), body),
    onSuccess: () => qc.invalidateQueries({ queryKey: diagramKeys.domains(id) }),
  });
}

export function useDeleteDomain(id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (domainId: string) => api.delete(DIAGRAM_PATHS.domain(id, domainId)),
    onSuccess: () => qc.invalidateQueries({ queryKey: diagramKeys.domains(id) }),
  });
}

function useRefreshDiagram(id: string) {
  const qc = useQueryClient();
  return () => Promise.all([
    qc.invalidateQueries({ queryKey: diagramKeys.one(id) }),
    qc.invalidateQueries({ queryKey: diagramKeys.revisions(id) }),
    qc.invalidateQueries({ queryKey: ['workspaces'] }),
  ]);
}

/** Applies an operation to baseRevision; the server answers 409 when someone else changed the diagram first. */
export function useEdit(id: string) {
  const refresh = useRefreshDiagram(id);
  return useMutation({
    mutationFn: (v: { baseRevision: number; operation: EditOperationInput; message?: string }) =>
      api.post<RevisionResponse>(DIAGRAM_PATHS.edits(id), v),
    onSuccess: refresh,
  });
}

export function useRestore(id: string) {
  const refresh = useRefreshDiagram(id);
  return useMutation({
    mutationFn: (v: { revision: number; baseRevision: number }) => api.post<RevisionResponse>(DIAGRAM_PATHS.restore(id), v),
    onSuccess: refresh,
  });
}

/** Reloads the diagram and its history (after a conflict). */
export function useReloadDiagram(id: string) {
  return useRefreshDiagram(id);
}
