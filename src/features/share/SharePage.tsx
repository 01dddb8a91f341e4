/**
 * Public read-only view of a shared diagram at /s/:token (SHARE_CLIENT_PATH): no sign-in. Shows the head
 * revision's surface with its curves and the cached analysis summary and regions.
 */
import { lazy, Suspense, useMemo } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import {
  DIAGRAM_PATHS, decodeInt32Base64, decodeMeshBinary,
  type MeshBinary, type PublicShareResponse,
} from '../../../server/contract/index.js';
import { WebGLBoundary } from '../../app/WebGLBoundary';
import { api, ApiError } from '../../lib/api';
import { LoadingState, QueryError, Spinner } from '../../lib/ui';
import { faceColorsFromRegions, hexToRgb, symmetricExtent } from '../../viewer/color-scale';
import type { ViewerCurve, ViewerPoint } from '../../viewer/types';

const SurfaceView = lazy(() => import('../../viewer/SurfaceView'));

const SUB = '₀₁₂₃₄₅₆₇₈₉';
const sub = (n: number) => String(n).split('').map((d) => SUB[Number(d)]).join('');

/** Euler measures are multiples of 1/4 (Lipshitz 2006): 0.5 → 1/2, −0.25 → −1/4. */
function quarters(x: number): string {
  const q = Math.round(4 * x);
  if (Math.abs(4 * x - q) > 1e-9) return x.toFixed(4);
  const g = q % 4 === 0 ? 4 : q % 2 === 0 ? 2 : 1;
  const num = q / g, den = 4 / g;
  return `${num < 0 ? '−' : ''}${Math.abs(num)}${den === 1 ? '' : `/${den}`}`;
}
const bpName = (n: string) => n.replace(/_(\d+)$/, (_, d: string) => sub(Number(d)));

async function fetchMesh(path: string, signal?: AbortSignal): Promise<MeshBinary> {
  const res = await fetch(path, { signal, credentials: 'same-origin' });
  if (!res.ok) throw new ApiError(res.status, `http_${res.status}`, `Could not load the surface (${res.status}).`);
  return decodeMeshBinary(await res.arrayBuffer());
}

export default function SharePage() {
  const { token = '' } = useParams();
  const share = useQuery({
    queryKey: ['share', token],
    queryFn: ({ signal }) => api.get<PublicShareResponse>(DIAGRAM_PATHS.publicShare(token), signal),
    refetchInterval: (q) => (q.state.data && ['pending', 'running'].includes(q.state.data.analysis.status) ? 1500 : false),
  });
  const mesh = useQuery({
    queryKey: ['share', token, 'mesh', share.data?.diagram.headRevision],
    queryFn: ({ signal }) => fetchMesh(share.data!.meshPath, signal),
    enabled: Boolean(share.data),
    staleTime: Infinity,
  });
  const result = share.data?.analysis.result ?? null;
  const faceColors = useMemo(() => {
    if (!result) return null;
    const values = result.regions.map((r) => r.eulerMeasure);
    return faceColorsFromRegions(decodeInt32Base64(result.faceRegion), values, symmetricExtent(values), hexToRgb('#e9e6dc'));
  }, [result]);
  const curves: ViewerCurve[] = useMemo(() => (mesh.data?.curves ?? []).map((c) => ({
    id: `${c.family}${c.index}`, family: c.family, label: `${c.family === 'alpha' ? 'α' : 'β'}${sub(c.index + 1)}`, vertices: c.vertices,
  })), [mesh.data]);
  const points: ViewerPoint[] = useMemo(() => [
    ...(result?.intersections ?? []).map((x) => ({ id: `x${x.id}`, vertex: x.vertex, label: `x${sub(x.id + 1)}`, kind: 'intersection' as const })),
    ...(mesh.data?.basepoints ?? []).map((b) => ({ id: `${b.kind}${b.index}`, vertex: b.vertex, label: `${b.kind}${sub(b.index + 1)}`, kind: b.kind })),
  ], [mesh.data, result]);

  if (share.isPending) return <LoadingState label="Loading the shared diagram…" />;
  if (share.error) {
    const gone = share.error instanceof ApiError && share.error.status === 404;
    return (
      <main className="mx-auto max-w-xl p-8">
        {gone ? <p className="text-ink-muted">This share link does not exist or was revoked.</p> : <QueryError error={share.error} what="the shared diagram" />}
      </main>
    );
  }
  const { diagram, analysis } = share.data;
  return (
    <main className="flex flex-col gap-4 p-4 lg:h-screen">
      <header>
        <p className="text-sm text-ink-muted">Shared diagram · read only · revision {diagram.headRevision}</p>
        <h1 className="text-2xl font-semibold">{diagram.name}</h1>
        {diagram.description && <p className="text-ink-muted">{diagram.description}</p>}
      </header>
      <div className="grid min-h-0 flex-1 gap-4 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <div className="h-[60vh] overflow-hidden rounded-[var(--radius-card)] border border-line lg:h-full">
          {mesh.data ? (
            <WebGLBoundary className="h-full">
              <Suspense fallback={<LoadingState label="Loading the 3D view…" />}>
                <SurfaceView positions={mesh.data.positions} triangles={mesh.data.triangles} curves={curves} points={points} faceColors={faceColors} ariaLabel={`3D view of ${diagram.name}`} />
              </Suspense>
            </WebGLBoundary>
          ) : mesh.error ? <QueryError error={mesh.error} what="the surface" /> : <LoadingState label="Loading the surface…" />}
        </div>
        <aside className="min-h-0 overflow-auto rounded-[var(--radius-card)] border border-line bg-surface p-4 text-sm" aria-label="Analysis">
          {!result ? (
            <p role="status" className="flex items-center gap-2 text-ink-muted"><Spinner size={14} /> Analysis {analysis.status} {Math.round(analysis.progress * 100)}%</p>
          ) : (
            <>
              <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
                <dt className="text-ink-muted">Genus</dt><dd>{result.stats.genus}</dd>
                <dt className="text-ink-muted">Intersection points</dt><dd>{result.intersections.length}</dd>
                <dt className="text-ink-muted">Regions</dt><dd>{result.regions.length}</dd>
                {result.floer && <><dt className="text-ink-muted">H₁</dt><dd className="font-mono">{result.floer.h1}</dd></>}
                {result.floer?.homology && <><dt className="text-ink-muted">rank HF-hat</dt><dd>{result.floer.homology.rank}</dd></>}
              </dl>
              <table className="mt-4 w-full border-collapse text-xs" aria-label="Regions">
                <thead className="bg-sunken text-left text-ink-muted">
                  <tr><th scope="col" className="px-2 py-1">Region</th><th scope="col" className="px-2 py-1 text-right">χ</th><th scope="col" className="px-2 py-1 text-right">Corners</th><th scope="col" className="px-2 py-1 text-right">e</th><th scope="col" className="px-2 py-1">Basepoints</th></tr>
                </thead>
                <tbody>
                  {result.regions.map((r) => (
                    <tr key={r.id} className="border-t border-line">
                      <th scope="row" className="px-2 py-1 text-left font-medium">R{sub(r.id + 1)}</th>
                      <td className="px-2 py-1 text-right">{r.chi}</td>
                      <td className="px-2 py-1 text-right">{r.corners}</td>
                      <td className="px-2 py-1 text-right tabular-nums">{quarters(r.eulerMeasure)}</td>
                      <td className="px-2 py-1">{r.basepoints.map(bpName).join(', ')}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </>
          )}
        </aside>
      </div>
    </main>
  );
}
