import { useState } from 'react';
import { errorMessage } from '../../../lib/api';
import { Button, Spinner } from '../../../lib/ui';
import { useGenerators } from '../api';
import { generatorText } from '../format';

const PAGE = 50;

export interface GeneratorsPanelProps {
  diagramId: string;
  revision: number;
  listed: boolean;
  total: string | null;
  /** Highlight a generator's points on the surface (null clears). */
  onShow: (points: number[] | null) => void;
  shown: number[] | null;
}

/** Generators x = {x_1 … x_k}, one point on each α and β (Ozsváth–Szabó 2004), a page at a time. */
export function GeneratorsPanel({ diagramId, revision, listed, total, onShow, shown }: GeneratorsPanelProps) {
  const [offset, setOffset] = useState(0);
  const page = useGenerators(diagramId, revision, offset, PAGE, listed);
  if (!listed) {
    return <p className="text-sm text-ink-muted">Generators are not available for this revision{total ? ` (${total} in all)` : ''}; see Homology for the reason.</p>;
  }
  if (page.error) return <p role="alert" className="text-sm text-danger">{errorMessage(page.error)}</p>;
  if (!page.data) return <p className="flex items-center gap-2 text-sm text-ink-muted"><Spinner size={14} /> Loading generators…</p>;
  const n = Number(page.data.total);
  const key = (p: number[]) => p.join(',');
  return (
    <div>
      <div className="mb-2 flex items-center justify-between gap-2 text-xs text-ink-muted">
        <span aria-live="polite">Generators {n === 0 ? 0 : offset + 1}–{Math.min(offset + PAGE, n)} of {page.data.total}</span>
        <span className="flex gap-1">
          <Button size="sm" variant="secondary" disabled={offset === 0} onClick={() => setOffset(Math.max(0, offset - PAGE))}>Previous</Button>
          <Button size="sm" variant="secondary" disabled={offset + PAGE >= n} onClick={() => setOffset(offset + PAGE)}>Next</Button>
        </span>
      </div>
      <table className="w-full border-collapse text-xs" aria-label="Generators">
        <thead className="bg-sunken text-left text-ink-muted">
          <tr>
            <th scope="col" className="px-2 py-1.5 text-right">#</th>
            <th scope="col" className="px-2 py-1.5">Points</th>
            <th scope="col" className="px-2 py-1.5 text-right">Sign</th>
            <th scope="col" className="px-2 py-1.5">Spinᶜ class</th>
            <th scope="col" className="px-2 py-1.5 text-right">Relative grading</th>
          </tr>
        </thead>
        <tbody>
          {page.data.generators.map((g) => {
            const on = shown !== null && key(shown) === key(g.points);
            return (
              <tr key={g.index} className={`cursor-pointer border-t border-line ${on ? 'bg-accent-soft' : 'hover:bg-paper'}`}
                onMouseEnter={() => onShow(g.points)} onClick={() => onShow(on ? null : g.points)}>
                <td className="px-2 py-1 text-right tabular-nums">{g.index + 1}</td>
                <th scope="row" className="px-2 py-1 text-left font-medium">
                  <button type="button" className="rounded" aria-pressed={on} onClick={(e) => { e.stopPropagation(); onShow(on ? null : g.points); }}>
                    {generatorText(g.points)}
                  </button>
                </th>
                <td className="px-2 py-1 text-right tabular-nums">{g.sign > 0 ? '+' : '−'}</td>
                <td className="px-2 py-1 font-mono">{g.spinc ?? '—'}</td>
                <td className="px-2 py-1 text-right tabular-nums">{g.grading ?? '—'}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
