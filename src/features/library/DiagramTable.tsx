import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import type { DiagramSummary } from '../../../server/contract/index.js';
import { Button, Spinner } from '../../lib/ui';

export type SortKey = 'name' | 'genus' | 'curveCount' | 'intersectionCount' | 'generatorCount' | 'nice' | 'weaklyAdmissible' | 'h1' | 'updatedAt';

interface Column { key: SortKey; label: string; numeric?: boolean }

const COLUMNS: Column[] = [
  { key: 'name', label: 'Name' },
  { key: 'genus', label: 'Genus', numeric: true },
  { key: 'curveCount', label: 'Curve pairs', numeric: true },
  { key: 'intersectionCount', label: 'Intersections', numeric: true },
  { key: 'generatorCount', label: 'Generators', numeric: true },
  { key: 'nice', label: 'Nice' },
  { key: 'weaklyAdmissible', label: 'Admissible' },
  { key: 'h1', label: 'H₁' },
  { key: 'updatedAt', label: 'Last change' },
];

/** Compares two rows by a column; nulls (analysis not done) sort last in either direction. */
function compare(a: DiagramSummary, b: DiagramSummary, key: SortKey): number {
  const va = a[key], vb = b[key];
  if (va === null && vb === null) return 0;
  if (va === null) return 1;
  if (vb === null) return -1;
  if (key === 'generatorCount') {
    const x = BigInt(va as string), y = BigInt(vb as string);
    return x < y ? -1 : x > y ? 1 : 0;
  }
  if (typeof va === 'number' && typeof vb === 'number') return va - vb;
  if (typeof va === 'boolean' && typeof vb === 'boolean') return Number(vb) - Number(va);
  return String(va).localeCompare(String(vb), undefined, { numeric: true, sensitivity: 'base' });
}

const dateFormat = new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

function YesNo({ value }: { value: boolean | null }) {
  if (value === null) return <span className="text-ink-faint">—</span>;
  return value ? <span className="text-ok">Yes</span> : <span className="text-danger">No</span>;
}

export interface DiagramTableProps {
  workspaceId: string;
  diagrams: DiagramSummary[];
  canEdit: boolean;
  onRename: (d: DiagramSummary, name: string) => void;
  onDuplicate: (d: DiagramSummary) => void;
  onDelete: (d: DiagramSummary) => void;
  busyId: string | null;
}

/** The library table: sortable by any column (buttons in the headers, aria-sort), with row actions. */
export function DiagramTable({ workspaceId, diagrams, canEdit, onRename, onDuplicate, onDelete, busyId }: DiagramTableProps) {
  const [sort, setSort] = useState<{ key: SortKey; dir: 1 | -1 }>({ key: 'updatedAt', dir: -1 });
  const [renaming, setRenaming] = useState<{ id: string; name: string } | null>(null);
  const rows = useMemo(() => [...diagrams].sort((a, b) => {
    const c = compare(a, b, sort.key);
    // keep nulls last whatever the direction
    if (a[sort.key] === null || b[sort.key] === null) return c;
    return c * sort.dir;
  }), [diagrams, sort]);

  const toggle = (key: SortKey) => setSort((s) => (s.key === key ? { key, dir: s.dir === 1 ? -1 : 1 } : { key, dir: key === 'updatedAt' ? -1 : 1 }));

  return (
    <div className="overflow-x-auto rounded-[var(--radius-card)] border border-line bg-surface">
      <table className="w-full border-collapse text-sm" aria-label="Diagrams">
        <thead className="bg-sunken text-left text-ink-muted">
          <tr>
            {COLUMNS.map((c) => {
              const active = sort.key === c.key;
              return (
                <th key={c.key} scope="col" aria-sort={active ? (sort.dir === 1 ? 'ascending' : 'descending') : 'none'} className={`whitespace-nowrap px-2 py-2 font-medium ${c.numeric ? 'text-right' : ''}`}>
                  <button type="button" onClick={() => toggle(c.key)} className="inline-flex items-center gap-1 rounded hover:text-ink">
                    {c.label}
                    <span aria-hidden="true" className={active ? 'text-ink' : 'text-ink-faint/50'}>{active ? (sort.dir === 1 ? '▲' : '▼') : '↕'}</span>
                  </button>
                </th>
              );
            })}
            <th scope="col" className="px-2 py-2 font-medium"><span className="sr-only">Actions</span></th>
          </tr>
        </thead>
        <tbody>
          {rows.map((d) => {
            const analysing = d.analysisStatus === 'pending' || d.analysisStatus === 'running';
            const stat = (v: React.ReactNode) => (analysing && v === null ? <span className="text-ink-faint">…</span> : v ?? <span className="text-ink-faint">—</span>);
            return (
              <tr key={d.id} className="border-t border-line hover:bg-paper" data-testid="diagram-row">
                <td className="min-w-[8rem] px-2 py-2">
                  {renaming?.id === d.id ? (
                    <form
                      className="flex items-center gap-2"
                      onSubmit={(e) => { e.preventDefault(); if (renaming.name.trim()) { onRename(d, renaming.name.trim()); setRenaming(null); } }}
                    >
                      <label className="sr-only" htmlFor={`rename-${d.id}`}>New name for {d.name}</label>
                      <input
                        id={`rename-${d.id}`}
                        autoFocus
                        value={renaming.name}
                        maxLength={160}
                        onChange={(e) => setRenaming({ id: d.id, name: e.target.value })}
                        onKeyDown={(e) => { if (e.key === 'Escape') setRenaming(null); }}
                        className="h-8 rounded-md border border-line-strong px-2"
                      />
                      <Button type="submit" size="sm">Save</Button>
                      <Button size="sm" variant="ghost" onClick={() => setRenaming(null)}>Cancel</Button>
                    </form>
                  ) : (
                    <div className="flex items-center gap-2">
                      <Link to={`/w/${workspaceId}/d/${d.id}`} className="font-medium">{d.name}</Link>
                      {analysing && (
                        <span role="status" className="inline-flex items-center gap-1 text-xs text-ink-muted"><Spinner size={12} /> Analysing</span>
                      )}
                      {d.analysisStatus === 'failed' && <span className="text-xs text-danger">Analysis failed</span>}
                    </div>
                  )}
                </td>
                <td className="px-2 py-2 text-right tabular-nums">{stat(d.genus)}</td>
                <td className="px-2 py-2 text-right tabular-nums">{d.curveCount}</td>
                <td className="px-2 py-2 text-right tabular-nums">{stat(d.intersectionCount)}</td>
                <td className="px-2 py-2 text-right tabular-nums">{stat(d.generatorCount)}</td>
                <td className="px-2 py-2">{analysing && d.nice === null ? <span className="text-ink-faint">…</span> : <YesNo value={d.nice} />}</td>
                <td className="px-2 py-2">{analysing && d.weaklyAdmissible === null ? <span className="text-ink-faint">…</span> : <YesNo value={d.weaklyAdmissible} />}</td>
                <td className="px-2 py-2 font-mono text-xs">{stat(d.h1)}</td>
                <td className="min-w-[8rem] px-2 py-2 text-ink-muted">
                  <time className="whitespace-nowrap" dateTime={d.updatedAt}>{dateFormat.format(new Date(d.updatedAt))}</time>
                  <span className="block text-xs">by {d.updatedBy.name}</span>
                </td>
                <td className="px-2 py-2">
                  {canEdit && (
                    <div className="grid w-[9.5rem] grid-cols-2 justify-items-end gap-x-1">
                      <Button size="sm" variant="ghost" onClick={() => setRenaming({ id: d.id, name: d.name })} aria-label={`Rename ${d.name}`} className="px-2">Rename</Button>
                      <Button size="sm" variant="ghost" onClick={() => onDuplicate(d)} loading={busyId === d.id} aria-label={`Duplicate ${d.name}`} className="px-2">Duplicate</Button>
                      <Button size="sm" variant="ghost" onClick={() => onDelete(d)} aria-label={`Delete ${d.name}`} className="px-2 hover:text-danger">Delete</Button>
                    </div>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
