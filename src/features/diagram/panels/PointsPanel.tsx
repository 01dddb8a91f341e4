import type { Intersection } from '../../../../server/contract/index.js';
import { curveLabel, pointLabel } from '../format';
import { rowClass, type Focus } from './shared';

export interface PointsPanelProps {
  intersections: Intersection[];
  hover: Focus | null;
  selected: Focus | null;
  onHover: (f: Focus | null) => void;
  onSelect: (f: Focus) => void;
}

/** Intersection points of α and β curves with their file vertex numbers and local signs. */
export function PointsPanel({ intersections, hover, selected, onHover, onSelect }: PointsPanelProps) {
  const positive = intersections.filter((x) => x.sign > 0).length;
  return (
    <div>
      <p className="mb-2 text-xs text-ink-muted">
        {intersections.length} points, {positive} positive and {intersections.length - positive} negative.
      </p>
      <table className="w-full border-collapse text-xs" aria-label="Intersection points">
        <thead className="bg-sunken text-left text-ink-muted">
          <tr>
            <th scope="col" className="px-2 py-1.5">Point</th>
            <th scope="col" className="px-2 py-1.5 text-right">Vertex in file</th>
            <th scope="col" className="px-2 py-1.5">Curves</th>
            <th scope="col" className="px-2 py-1.5 text-right">Sign</th>
          </tr>
        </thead>
        <tbody>
          {intersections.map((x) => {
            const f: Focus = { kind: 'point', id: `x${x.id}` };
            return (
              <tr key={x.id} className={rowClass(hover, selected, f)} onMouseEnter={() => onHover(f)} onMouseLeave={() => onHover(null)} onClick={() => onSelect(f)}
                data-testid="point-row">
                <th scope="row" className="px-2 py-1 text-left font-medium">
                  <button type="button" className="rounded" onFocus={() => onHover(f)} onBlur={() => onHover(null)} onClick={(e) => { e.stopPropagation(); onSelect(f); }}>
                    {pointLabel(x.id)}
                  </button>
                </th>
                <td className="px-2 py-1 text-right tabular-nums">{x.label}</td>
                <td className="px-2 py-1">{curveLabel('alpha', x.alpha)} ∩ {curveLabel('beta', x.beta)}</td>
                <td className="px-2 py-1 text-right tabular-nums">{x.sign > 0 ? '+1' : '−1'}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
