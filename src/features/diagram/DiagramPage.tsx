/**
 * One diagram's lab at /w/:workspaceId/d/:diagramId: the 3D view beside tabbed tables that are linked to it
 * (hover or select a row and the surface shows it, and the other way round), domains built by clicking,
 * homology, drawing and edits (each a new revision), and the revision history. `?rev=n` shows an older
 * revision. Everything shown comes from the server's cached analysis.
 */
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { roleAtLeast, type EditOperationInput } from '../../../server/contract/index.js';
import { ApiError, errorMessage } from '../../lib/api';
import { Alert, Button, LoadingState, QueryError } from '../../lib/ui';
import type { SurfaceViewHandle, ViewerPick } from '../../viewer/types';
import { useAnalysis, useDiagram, useEdit, useMesh, useReloadDiagram, useRestore, useRevisions } from './api';
import { basepointLabel, basepointNames, curveLabel, decimalText, fractionText, pointLabel, regionLabel } from './format';
import { coloring, regionIndex, regionMask, viewerCurves, viewerPoints, type ColorMode, type PointNaming } from './model';
import { DomainsPanel } from './panels/DomainsPanel';
import { EditPanel, type DrawState } from './panels/EditPanel';
import { GeneratorsPanel } from './panels/GeneratorsPanel';
import { HistoryPanel } from './panels/HistoryPanel';
import { HomologyPanel } from './panels/HomologyPanel';
import { PointsPanel } from './panels/PointsPanel';
import { RegionsPanel } from './panels/RegionsPanel';
import type { Focus } from './panels/shared';
import { ShareExport } from './ShareExport';
import { ViewPane } from './ViewPane';

type TabId = 'regions' | 'points' | 'generators' | 'domains' | 'homology' | 'edit' | 'history';
const TABS: { id: TabId; label: string; editOnly?: boolean }[] = [
  { id: 'regions', label: 'Regions' },
  { id: 'points', label: 'Intersection points' },
  { id: 'generators', label: 'Generators' },
  { id: 'domains', label: 'Domains' },
  { id: 'homology', label: 'Homology' },
  { id: 'edit', label: 'Draw & edit', editOnly: true },
  { id: 'history', label: 'History' },
];

/** The tab strip: arrow keys move between tabs (WAI-ARIA tabs pattern). */
function Tabs({ tabs, active, onChange }: { tabs: typeof TABS; active: TabId; onChange: (t: TabId) => void }) {
  const refs = useRef(new Map<TabId, HTMLButtonElement>());
  const move = (d: number) => {
    const i = tabs.findIndex((t) => t.id === active);
    const next = tabs[(i + d + tabs.length) % tabs.length].id;
    onChange(next);
    refs.current.get(next)?.focus();
  };
  return (
    <div role="tablist" aria-label="Diagram data" className="flex flex-wrap gap-1 border-b border-line"
      onKeyDown={(e) => { if (e.key === 'ArrowRight') move(1); if (e.key === 'ArrowLeft') move(-1); }}>
      {tabs.map((t) => (
        <button key={t.id} type="button" role="tab" id={`tab-${t.id}`} aria-controls={`panel-${t.id}`} aria-selected={active === t.id}
          tabIndex={active === t.id ? 0 : -1} ref={(el) => { if (el) refs.current.set(t.id, el); }}
          onClick={() => onChange(t.id)}
          className={`-mb-px rounded-t-md border px-3 py-1.5 text-sm ${active === t.id ? 'border-line border-b-surface bg-surface font-semibold text-ink' : 'border-transparent text-ink-muted hover:text-ink'}`}>
          {t.label}
        </button>
      ))}
    </div>
  );
}

function ProgressBar({ value, label }: { value: number; label: string }) {
  const pct = Math.round(Math.max(0, Math.min(1, value)) * 100);
  return (
    <div className="flex items-center gap-3 text-sm">
      <div role="progressbar" aria-label={label} aria-valuemin={0} aria-valuemax={100} aria-valuenow={pct} className="h-2 w-48 overflow-hidden rounded-full bg-sunken">
        <div className="h-full bg-accent transition-[width]" style={{ width: `${pct}%` }} />
      </div>
      <span className="tabular-nums text-ink-muted">{label} {pct}%</span>
    </div>
  );
}

export default function DiagramPage() {
  const { workspaceId = '', diagramId = '' } = useParams();
  const [params, setParams] = useSearchParams();
  const diagram = useDiagram(diagramId);
  const revisions = useRevisions(diagramId);
  const head = diagram.data?.diagram.headRevision ?? null;
  const revParam = Number(params.get('rev')) || null;
  const rev = revParam ?? head;
  const isHead = rev !== null && rev === head;
  const mesh = useMesh(diagramId, rev);
  const analysis = useAnalysis(diagramId, rev);
  const result = analysis.data?.status === 'done' ? analysis.data.result : null;
  const index = useMemo(() => (result ? regionIndex(result, result.regions.length) : null), [result]);
  const canEdit = diagram.data ? roleAtLeast(diagram.data.diagram.role, 'editor') : false;

  const [tab, setTab] = useState<TabId>('regions');
  const [hover, setHover] = useState<Focus | null>(null);
  const [selected, setSelected] = useState<Focus | null>(null);
  const [colorMode, setColorMode] = useState<ColorMode>('euler');
  const [domain, setDomain] = useState<Record<number, number>>({});
  const [periodic, setPeriodic] = useState<{ coefficients: number[]; label: string } | null>(null);
  const [warnRegions, setWarnRegions] = useState<number[] | null>(null);
  const [generator, setGenerator] = useState<number[] | null>(null);
  const [draw, setDraw] = useState<DrawState | null>(null);
  const [naming, setNaming] = useState<PointNaming>('names');
  const [showLabels, setShowLabels] = useState(true);
  const [showEdges, setShowEdges] = useState(false);
  const [status, setStatus] = useState('');
  const handle = useRef<SurfaceViewHandle | null>(null);
  const edit = useEdit(diagramId);
  const restore = useRestore(diagramId);
  const reload = useReloadDiagram(diagramId);

  // When an analysis finishes, the history and the library row show its new status.
  const analysisStatus = analysis.data?.status;
  useEffect(() => {
    if (analysisStatus === 'done' || analysisStatus === 'failed') void reload();
  }, [analysisStatus]);

  // A different revision: forget per-revision state.
  useEffect(() => {
    setDomain({}); setPeriodic(null); setWarnRegions(null); setGenerator(null); setSelected(null); setHover(null); setDraw(null);
  }, [rev]);

  const chooseTab = (t: TabId) => {
    setTab(t);
    if (t === 'domains') setColorMode('domain');
    else if (colorMode === 'domain') setColorMode('euler');
    if (t !== 'edit') setDraw(null);
  };

  const viewRevision = (n: number | null) => {
    const next = new URLSearchParams(params);
    if (n === null || n === head) next.delete('rev'); else next.set('rev', String(n));
    setParams(next, { replace: false });
  };

  const applyEdit = (operation: EditOperationInput, message: string) => {
    if (head === null) return;
    edit.mutate({ baseRevision: head, operation, message }, {
      onSuccess: (r) => { setDraw(null); viewRevision(null); setStatus(`Saved as revision ${r.revision.number}.`); },
    });
  };
  const doRestore = (n: number) => {
    if (head === null) return;
    restore.mutate({ revision: n, baseRevision: head }, {
      onSuccess: (r) => { viewRevision(null); setStatus(`Revision ${n} restored as revision ${r.revision.number}.`); },
    });
  };
  const changeError = edit.error ?? restore.error;
  const conflict = changeError instanceof ApiError && changeError.status === 409;

  // --- linking the view and the tables ---
  const regionOf = useCallback((face: number) => (index ? index.faceRegion[face] : -1), [index]);
  const onHover = useCallback((pick: ViewerPick | null) => {
    if (!pick) { setHover(null); return; }
    if (pick.kind === 'point') { setHover({ kind: 'point', id: pick.id }); return; }
    const r = regionOf(pick.face);
    setHover((h) => (r < 0 ? null : h?.kind === 'region' && h.id === r ? h : { kind: 'region', id: r }));
  }, [regionOf]);

  const onPick = (pick: ViewerPick) => {
    if (draw && pick.kind === 'face' && pick.button === 0) {
      setDraw({ ...draw, points: [...draw.points, { face: pick.face, bary: pick.barycentric }], world: [...draw.world, pick.point] });
      return;
    }
    if (pick.kind === 'point') { setSelected({ kind: 'point', id: pick.id }); return; }
    const r = regionOf(pick.face);
    if (r < 0) return;
    if (tab === 'domains') {
      const d = pick.shiftKey || pick.button === 2 ? -1 : 1;
      setDomain((c) => ({ ...c, [r]: (c[r] ?? 0) + d }));
      setStatus(`${regionLabel(r)} coefficient ${d > 0 ? 'raised' : 'lowered'}.`);
      return;
    }
    setSelected({ kind: 'region', id: r });
    if (tab !== 'regions') setTab('regions');
  };

  /** Selects a region or point from a table and turns the view towards it. */
  const selectFromTable = (f: Focus) => {
    setSelected(f);
    const pos = mesh.data?.positions, tri = mesh.data?.triangles;
    if (!pos || !tri || !index) return;
    let face = -1;
    if (f.kind === 'region') {
      const faces = index.facesOf[f.id] ?? [];
      const c = (g: number, k: number) => (pos[3 * tri[3 * g] + k] + pos[3 * tri[3 * g + 1] + k] + pos[3 * tri[3 * g + 2] + k]) / 3;
      const mid = [0, 1, 2].map((k) => faces.reduce((s, g) => s + c(g, k), 0) / Math.max(1, faces.length));
      let best = Infinity;
      for (const g of faces) {
        const d = [0, 1, 2].reduce((s, k) => s + (c(g, k) - mid[k]) ** 2, 0);
        if (d < best) { best = d; face = g; }
      }
    } else {
      const v = points.find((p) => p.id === f.id)?.vertex;
      if (v !== undefined) for (let g = 0; g < tri.length / 3 && face < 0; g++) if (tri[3 * g] === v || tri[3 * g + 1] === v || tri[3 * g + 2] === v) face = g;
    }
    if (face >= 0) handle.current?.focusFace(face);
  };

  // --- view data ---
  const curves = useMemo(() => (mesh.data ? viewerCurves(mesh.data) : []), [mesh.data]);
  const points = useMemo(() => (mesh.data ? viewerPoints(mesh.data, result, naming) : []), [mesh.data, result, naming]);
  const colors = useMemo(() => coloring(colorMode, result, index, domain, periodic?.coefficients ?? null), [colorMode, result, index, domain, periodic]);
  const hoverFaces = useMemo(() => (index && hover?.kind === 'region' ? regionMask(index.faceRegion, [hover.id]) : null), [index, hover]);
  const selectedFaces = useMemo(() => (index && selected?.kind === 'region' ? regionMask(index.faceRegion, [selected.id]) : null), [index, selected]);
  const warnFaces = useMemo(() => (index && warnRegions ? regionMask(index.faceRegion, warnRegions) : null), [index, warnRegions]);
  const highlightPoints = useMemo(() => {
    const s = new Set<string>();
    if (hover?.kind === 'point') s.add(hover.id);
    if (selected?.kind === 'point') s.add(selected.id);
    for (const x of generator ?? []) s.add(`x${x}`);
    return s;
  }, [hover, selected, generator]);
  const highlightCurves = useMemo(() => {
    const s = new Set<string>();
    const id = hover?.kind === 'point' ? hover.id : selected?.kind === 'point' ? selected.id : null;
    const x = id?.startsWith('x') ? result?.intersections.find((i) => `x${i.id}` === id) : undefined;
    if (x) { s.add(`alpha${x.alpha}`); s.add(`beta${x.beta}`); }
    return s;
  }, [hover, selected, result]);

  const tooltip = useCallback((pick: ViewerPick) => {
    if (!result) return null;
    if (pick.kind === 'point') {
      const x = result.intersections.find((i) => `x${i.id}` === pick.id);
      if (x) return <span><strong>{pointLabel(x.id)}</strong> = {curveLabel('alpha', x.alpha)} ∩ {curveLabel('beta', x.beta)}, sign {x.sign > 0 ? '+1' : '−1'}, file vertex {x.label}</span>;
      const b = result.basepoints.find((q) => `${q.kind}${q.index}` === pick.id);
      return b ? <span>Basepoint <strong>{basepointLabel(b.kind, b.index)}</strong> in {regionLabel(b.region)}</span> : null;
    }
    const r = result.regions[regionOf(pick.face)];
    if (!r) return null;
    return (
      <span className="block leading-5">
        <strong>{regionLabel(r.id)}</strong> · χ = {r.chi} · {r.corners} corners<br />
        e = {fractionText(r.eulerMeasure)} (corners), {decimalText(r.geometricEulerMeasure)} (Gauss–Bonnet)
        {r.basepoints.length > 0 && <><br />Basepoints {basepointNames(r.basepoints)}</>}
        {tab === 'domains' && <><br />Coefficient {domain[r.id] ?? 0}</>}
      </span>
    );
  }, [result, regionOf, tab, domain]);

  // Automation hook for browser tests and scripting: a visible screen point inside a region, if any.
  useEffect(() => {
    const w = window as unknown as { __quadrantLab?: unknown };
    w.__quadrantLab = {
      regionScreenPoint(region: number) {
        const faces = index?.facesOf[region] ?? [];
        const pos = mesh.data?.positions, tri = mesh.data?.triangles;
        if (!pos || !tri || faces.length === 0) return null;
        // Try faces from the region's middle outwards, away from curves and markers.
        const c = (f: number, k: number) => (pos[3 * tri[3 * f] + k] + pos[3 * tri[3 * f + 1] + k] + pos[3 * tri[3 * f + 2] + k]) / 3;
        const mid = [0, 1, 2].map((k) => faces.reduce((s, f) => s + c(f, k), 0) / faces.length);
        const order = [...faces].sort((a, b) => [0, 1, 2].reduce((s, k) => s + (c(a, k) - mid[k]) ** 2 - (c(b, k) - mid[k]) ** 2, 0));
        for (const f of order) { const p = handle.current?.projectFace(f); if (p) return p; }
        return null;
      },
    };
    return () => { delete w.__quadrantLab; };
  }, [index, mesh.data]);

  if (diagram.isPending) return <LoadingState label="Loading the diagram…" />;
  if (diagram.error) return <div className="p-6"><QueryError error={diagram.error} what="this diagram" onRetry={() => diagram.refetch()} /></div>;
  const d = diagram.data.diagram;
  const floer = result?.floer ?? null;
  const running = analysis.data && (analysis.data.status === 'pending' || analysis.data.status === 'running');
  const hint = draw
    ? 'Drawing: click on the surface to add points.'
    : tab === 'domains' ? 'Click a region: +1 · shift-click or right-click: −1' : 'Hover for facts · click to select · drag to orbit';
  const colorModes: ColorMode[] = ['plain', 'euler', 'eulerGB', 'defect', 'domain', ...(periodic ? ['periodic' as const] : [])];
  const tabs = TABS.filter((t) => !t.editOnly || canEdit);

  return (
    <div className="flex flex-col gap-3 px-4 py-3 lg:h-[calc(100vh-4rem)]">
      <header className="flex flex-wrap items-center justify-between gap-3">
        <div className="min-w-0">
          <Link to={`/w/${workspaceId}`} className="text-sm">← Library</Link>
          <h1 className="truncate text-2xl font-semibold tracking-tight">{d.name}</h1>
          <p className="text-sm text-ink-muted">
            {rev !== null && (isHead ? `Revision ${rev} (latest)` : `Viewing revision ${rev}; the latest is ${head}.`)}
            {result && ` · genus ${result.stats.genus} · ${result.stats.vertices} vertices, ${result.stats.faces} faces · ${result.curves.length} curves · ${result.intersections.length} intersection points · ${result.regions.length} region${result.regions.length === 1 ? '' : 's'}`}
            {floer && ` · H₁ = ${floer.h1}`}
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-3">
          {!isHead && head !== null && <Button size="sm" variant="secondary" onClick={() => viewRevision(null)}>Show the latest revision</Button>}
          {running && <ProgressBar value={analysis.data!.progress} label="Analysing" />}
          {rev !== null && <ShareExport diagramId={diagramId} revision={rev} canEdit={canEdit} />}
        </div>
      </header>

      <p role="status" aria-live="polite" className="sr-only">{status}</p>
      {analysis.data?.status === 'failed' && <Alert tone="error" title="The analysis failed">{analysis.data.error?.message}</Alert>}
      {analysis.error && <QueryError error={analysis.error} what="the analysis" onRetry={() => analysis.refetch()} />}
      {mesh.error && <QueryError error={mesh.error} what="the mesh" onRetry={() => mesh.refetch()} />}
      {result?.warnings.length ? <Alert tone="info" title="Warnings">{result.warnings.join(' ')}</Alert> : null}
      {changeError && (
        <Alert tone="error" title={conflict ? 'Someone changed this diagram first' : 'The change was not applied'}>
          <p>{errorMessage(changeError)}</p>
          {changeError instanceof ApiError && Array.isArray(changeError.details) && (
            <ul className="mt-1 list-disc pl-5">{(changeError.details as { message: string }[]).map((x, i) => <li key={i}>{x.message}</li>)}</ul>
          )}
          {conflict && (
            <Button size="sm" className="mt-2" onClick={async () => { edit.reset(); restore.reset(); await reload(); viewRevision(null); }}>
              Reload the latest revision
            </Button>
          )}
        </Alert>
      )}

      <div className="grid min-h-0 flex-1 gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(30rem,40%)]">
        <div className="h-[60vh] min-h-0 lg:h-full">
          <ViewPane
            imageName={`${d.name} r${rev ?? ''}`}
            view={mesh.data ? {
              positions: mesh.data.positions, triangles: mesh.data.triangles, curves, points,
              faceColors: colors.faceColors, vertexColors: colors.vertexColors,
              hoverFaces, selectedFaces, warnFaces, highlightPoints, highlightCurves,
              showLabels, showEdges, drawPath: draw?.world, drawFamily: draw?.family,
              onHover, onPick, renderTooltip: tooltip,
            } : null}
            ariaLabel={`3D view of ${d.name}`}
            handle={handle}
            colorMode={colorMode}
            colorModes={colorModes}
            onColorMode={setColorMode}
            legend={colors.legend}
            naming={naming} onNaming={setNaming}
            showLabels={showLabels} onShowLabels={setShowLabels}
            showEdges={showEdges} onShowEdges={setShowEdges}
            hint={hint}
            loading={mesh.isPending ? 'Loading the mesh…' : null}
          />
        </div>
        <section className="flex min-h-0 flex-col rounded-[var(--radius-card)] border border-line bg-surface" aria-label="Diagram data">
          <div className="px-3 pt-2"><Tabs tabs={tabs} active={tab} onChange={chooseTab} /></div>
          <div role="tabpanel" id={`panel-${tab}`} aria-labelledby={`tab-${tab}`} className="min-h-0 flex-1 overflow-auto p-3" tabIndex={0}>
            {tab === 'history' ? (
              revisions.data && rev !== null && head !== null
                ? <HistoryPanel revisions={revisions.data.revisions} head={head} viewing={rev} canEdit={canEdit} busy={restore.isPending} onView={viewRevision} onRestore={doRestore} />
                : <LoadingState label="Loading the history…" />
            ) : tab === 'edit' ? (
              <EditPanel
                curves={mesh.data?.curves.map((c) => ({ family: c.family, index: c.index })) ?? []}
                basepoints={mesh.data?.basepoints.map((b) => ({ kind: b.kind, index: b.index })) ?? []}
                emptyBigons={result?.regions.filter((r) => r.corners === 2 && r.chi === 1 && r.basepoints.length === 0).map((r) => r.id) ?? []}
                isHead={isHead} busy={edit.isPending} draw={draw} onDraw={setDraw} onApply={applyEdit}
              />
            ) : !result ? (
              running ? <div className="py-8"><ProgressBar value={analysis.data!.progress} label="Analysing" /><p className="mt-2 text-sm text-ink-muted">The tables fill in when the analysis is done.</p></div>
                : analysis.isPending ? <LoadingState label="Loading the analysis…" /> : <p className="text-sm text-ink-muted">No analysis for this revision.</p>
            ) : tab === 'regions' ? (
              <RegionsPanel regions={result.regions} hover={hover} selected={selected} onHover={setHover} onSelect={selectFromTable} />
            ) : tab === 'points' ? (
              <PointsPanel intersections={result.intersections} hover={hover} selected={selected} onHover={setHover} onSelect={selectFromTable} />
            ) : tab === 'generators' ? (
              <GeneratorsPanel diagramId={diagramId} revision={rev!} listed={Boolean(floer)} total={floer?.generatorCount ?? null} onShow={setGenerator} shown={generator} />
            ) : tab === 'domains' ? (
              <DomainsPanel diagramId={diagramId} revision={rev!} pointCount={result.intersections.length} regions={result.regions} domain={domain} onChange={setDomain} canEdit={canEdit}
                hover={hover} selected={selected} onHover={setHover} />
            ) : (
              <HomologyPanel floer={floer} unavailable={result.floerUnavailable}
                onShowPeriodic={(p) => { setPeriodic(p); if (p) setColorMode('periodic'); else if (colorMode === 'periodic') setColorMode('euler'); }}
                onShowRegions={setWarnRegions}
                showing={warnRegions && !periodic ? 'not-nice' : periodic?.label ?? null} />
            )}
          </div>
        </section>
      </div>
    </div>
  );
}
