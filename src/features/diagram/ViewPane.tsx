import { lazy, Suspense } from 'react';
import { WebGLBoundary } from '../../app/WebGLBoundary';
import { Button, Spinner } from '../../lib/ui';
import { divergingCss } from '../../viewer/color-scale';
import type { SurfaceViewHandle, SurfaceViewProps } from '../../viewer/types';
import { COLOR_MODE_LABELS, type ColorMode, type PointNaming } from './model';

// three.js, react-three-fiber and drei arrive with this chunk only.
const SurfaceView = lazy(() => import('../../viewer/SurfaceView'));

/** Colour bar for the current quantity: −extent … 0 … +extent on the diverging scale. */
export function Legend({ title, extent, unit }: { title: string; extent: number; unit?: string }) {
  const stops = Array.from({ length: 9 }, (_, i) => divergingCss(-1 + i / 4)).join(', ');
  const fmt = (x: number) => (Math.abs(x) >= 10 || Number.isInteger(x) ? String(x) : x.toFixed(3)).replace('-', '−');
  return (
    <figure className="rounded-md border border-line bg-surface/90 px-3 py-2 text-xs shadow-sm" aria-label={`Legend: ${title}`}>
      <figcaption className="mb-1 font-medium text-ink">{title}{unit ? ` (${unit})` : ''}</figcaption>
      <div className="h-2.5 w-48 rounded-sm" style={{ background: `linear-gradient(to right, ${stops})` }} />
      <div className="mt-0.5 flex w-48 justify-between tabular-nums text-ink-muted">
        <span>{fmt(-extent)}</span><span>0</span><span>{fmt(extent)}</span>
      </div>
    </figure>
  );
}

export interface ViewPaneProps {
  view: Omit<SurfaceViewProps, 'handleRef' | 'ariaLabel'> | null;
  ariaLabel: string;
  /** File name (without extension) for a saved image of the view. */
  imageName: string;
  handle: React.RefObject<SurfaceViewHandle | null>;
  colorMode: ColorMode;
  colorModes: ColorMode[];
  onColorMode: (m: ColorMode) => void;
  legend: { title: string; extent: number; unit?: string } | null;
  naming: PointNaming;
  onNaming: (n: PointNaming) => void;
  showLabels: boolean;
  onShowLabels: (b: boolean) => void;
  showEdges: boolean;
  onShowEdges: (b: boolean) => void;
  hint: string;
  loading: string | null;
}

/** Downloads a PNG data URL as `<name>.png`. */
function saveImage(url: string | null, name: string) {
  if (!url) return;
  const a = document.createElement('a');
  a.href = url;
  a.download = `${name.replace(/[^\p{L}\p{N}()×,._ -]+/gu, '_').trim() || 'diagram'}.png`;
  a.click();
}

/** Toolbar, the 3D view (lazily loaded, inside the WebGL boundary), legend and the current mode's hint. */
export function ViewPane(p: ViewPaneProps) {
  const h = p.handle;
  return (
    <div className="flex h-full min-h-0 flex-col gap-2">
      <div className="flex flex-wrap items-center gap-2" role="toolbar" aria-label="View controls">
        <Button size="sm" variant="secondary" onClick={() => h.current?.fitView()}>Fit to view</Button>
        <Button size="sm" variant="secondary" onClick={() => h.current?.resetView()}>Reset camera</Button>
        <Button size="sm" variant="secondary" onClick={() => h.current?.zoom(0.8)} aria-label="Zoom in">+</Button>
        <Button size="sm" variant="secondary" onClick={() => h.current?.zoom(1.25)} aria-label="Zoom out">−</Button>
        <Button size="sm" variant="secondary" onClick={() => h.current?.orbit(-0.35, 0)} aria-label="Orbit left">⟲</Button>
        <Button size="sm" variant="secondary" onClick={() => h.current?.orbit(0.35, 0)} aria-label="Orbit right">⟳</Button>
        <Button size="sm" variant="secondary" onClick={() => saveImage(h.current?.snapshot(2) ?? null, p.imageName)}>Save image</Button>
        <label className="ml-2 flex items-center gap-1.5 text-sm">
          <span className="text-ink-muted">Colour by</span>
          <select className="h-8 w-auto rounded-md border border-line-strong bg-surface px-2 text-sm" value={p.colorMode} onChange={(e) => p.onColorMode(e.target.value as ColorMode)}>
            {p.colorModes.map((m) => <option key={m} value={m}>{COLOR_MODE_LABELS[m]}</option>)}
          </select>
        </label>
        <label className="flex items-center gap-1.5 text-sm">
          <span className="text-ink-muted">Points</span>
          <select className="h-8 w-auto rounded-md border border-line-strong bg-surface px-2 text-sm" value={p.naming} onChange={(e) => p.onNaming(e.target.value as PointNaming)}>
            <option value="names">x₁, x₂, …</option>
            <option value="vertices">File vertex numbers</option>
          </select>
        </label>
        <label className="flex items-center gap-1.5 text-sm"><input type="checkbox" checked={p.showLabels} onChange={(e) => p.onShowLabels(e.target.checked)} /> Labels</label>
        <label className="flex items-center gap-1.5 text-sm"><input type="checkbox" checked={p.showEdges} onChange={(e) => p.onShowEdges(e.target.checked)} /> Mesh edges</label>
      </div>
      <div className="relative min-h-0 flex-1 overflow-hidden rounded-[var(--radius-card)] border border-line bg-paper">
        {p.view ? (
          <WebGLBoundary className="h-full">
            <Suspense fallback={<div role="status" className="flex h-full items-center justify-center gap-2 text-ink-muted"><Spinner /> Loading the 3D view…</div>}>
              <SurfaceView {...p.view} ariaLabel={p.ariaLabel} handleRef={p.handle} />
            </Suspense>
          </WebGLBoundary>
        ) : (
          <div role="status" className="flex h-full items-center justify-center gap-2 text-ink-muted"><Spinner /> {p.loading ?? 'Loading…'}</div>
        )}
        {p.legend && <div className="pointer-events-none absolute bottom-3 left-3"><Legend {...p.legend} /></div>}
        <p className="pointer-events-none absolute right-3 top-3 max-w-xs rounded-md bg-surface/85 px-2 py-1 text-xs text-ink-muted" aria-live="polite">{p.hint}</p>
      </div>
    </div>
  );
}
