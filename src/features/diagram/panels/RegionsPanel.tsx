import { useEffect, useRef } from 'react';
import type { Region } from '../../../../server/contract/index.js';
import { basepointNames, decimalText, fractionText, regionLabel } from '../format';
import { rowClass, type Focus } from './shared';

export interface RegionsPanelProps {
  regions: Region[];
  hover: Focus | null;
  selected: Focus | null;
  onHover: (f: Focus | null) => void;
  onSelect: (f: Focus) => void;
}

/**
 * One row per region: χ of the region cut open, its corners, the Euler measure by the corner formula
 * χ − convex/4 + reflex/4 and by discrete Gauss–Bonnet with its three parts (Lipshitz 2006; REFERENCE.md),
 * and their difference (nonzero beyond rounding would mean a topology error).
 */
export function RegionsPanel({ regions, hover, selected, onHover, onSelect }: RegionsPanelProps) {
  const body = useRef<HTMLTableSectionElement>(null);
  useEffect(() => {
    if (selected?.kind !== 'region') return;
    body.current?.querySelector(`[data-region="${selected.id}"]`)?.scrollIntoView({ block: 'nearest' });
  }, [selected]);
  const sumE = regions.reduce((s, r) => s + r.eulerMeasure, 0);
  return (
    <div>
      <p className="mb-2 text-xs text-ink-muted">
        Euler measure e = χ − convex/4 + reflex/4 (corners) and (1/2π)·(interior + boundary + corner terms) by
        discrete Gauss–Bonnet. Σ e = {fractionText(sumE)}. Hover or click a row to find the region on the surface.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-xs" aria-label="Regions">
          <thead className="sticky top-0 bg-sunken text-left text-ink-muted">
            <tr>
              <th scope="col" className="px-1.5 py-1.5">Region</th>
              <th scope="col" className="px-1.5 py-1.5">Basepoints</th>
              <th scope="col" className="px-1.5 py-1.5 text-right">χ</th>
              <th scope="col" className="px-1.5 py-1.5 text-right" title="convex / reflex corners">Corners</th>
              <th scope="col" className="px-1.5 py-1.5 text-right" title="Euler measure by the corner formula">e corners</th>
              <th scope="col" className="px-1.5 py-1.5 text-right" title="Euler measure by discrete Gauss–Bonnet">e GB</th>
              <th scope="col" className="px-1.5 py-1.5 text-right" title="Σ interior angle defects, radians">Interior</th>
              <th scope="col" className="px-1.5 py-1.5 text-right" title="Σ boundary turning, radians">Boundary</th>
              <th scope="col" className="px-1.5 py-1.5 text-right" title="Σ corner terms, radians">Corner terms</th>
              <th scope="col" className="px-1.5 py-1.5 text-right" title="e GB − e corners; nonzero beyond rounding means a topology error">Δ</th>
            </tr>
          </thead>
          <tbody ref={body}>
            {regions.map((r) => {
              const f: Focus = { kind: 'region', id: r.id };
              return (
                <tr
                  key={r.id}
                  data-region={r.id}
                  data-testid="region-row"
                  className={rowClass(hover, selected, f)}
                  onMouseEnter={() => onHover(f)}
                  onMouseLeave={() => onHover(null)}
                  onClick={() => onSelect(f)}
                  aria-selected={selected?.kind === 'region' && selected.id === r.id}
                >
                  <th scope="row" className="px-1.5 py-1 text-left font-medium">
                    <button type="button" className="rounded" onFocus={() => onHover(f)} onBlur={() => onHover(null)} onClick={(e) => { e.stopPropagation(); onSelect(f); }}>
                      {regionLabel(r.id)}
                    </button>
                  </th>
                  <td className="px-1.5 py-1">{basepointNames(r.basepoints) || <span className="text-ink-faint">—</span>}</td>
                  <td className="px-1.5 py-1 text-right tabular-nums">{r.chi}</td>
                  <td className="px-1.5 py-1 text-right tabular-nums">{r.convexCorners}{r.reflexCorners ? ` / ${r.reflexCorners}` : ''}</td>
                  <td className="px-1.5 py-1 text-right tabular-nums" data-col="euler">{fractionText(r.eulerMeasure)}</td>
                  <td className="px-1.5 py-1 text-right tabular-nums" data-col="euler-gb" title={String(r.geometricEulerMeasure)}>{decimalText(r.geometricEulerMeasure)}</td>
                  <td className="px-1.5 py-1 text-right tabular-nums">{decimalText(r.curvature.interior, 3)}</td>
                  <td className="px-1.5 py-1 text-right tabular-nums">{decimalText(r.curvature.boundary, 3)}</td>
                  <td className="px-1.5 py-1 text-right tabular-nums">{decimalText(r.curvature.corners, 3)}</td>
                  <td className={`px-1.5 py-1 text-right tabular-nums ${Math.abs(r.difference) > 1e-6 ? 'font-semibold text-danger' : 'text-ink-muted'}`}>
                    {Math.abs(r.difference) < 1e-9 ? '0' : r.difference.toExponential(1)}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
