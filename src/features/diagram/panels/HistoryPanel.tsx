import type { Revision, RevisionOperation } from '../../../../server/contract/index.js';
import { Button } from '../../../lib/ui';
import { curveLabel, dateText, regionLabel } from '../format';

/** A sentence for what produced a revision. */
export function describeOperation(op: RevisionOperation): string {
  switch (op.type) {
    case 'template': return `Created from the ${op.template.kind} template`;
    case 'upload': return `Uploaded ${op.fileName}`;
    case 'restore': return `Restored revision ${op.revision}`;
    case 'duplicate': return `Duplicated (revision ${op.revision})`;
    case 'twist': return `Dehn twist of ${curveLabel(op.curve.family, op.curve.index)} along ${curveLabel(op.along.family, op.along.index)}${op.negative ? ' (negative)' : ''}`;
    case 'subdivide': return op.method === 'loop' ? 'Loop subdivision' : 'Midpoint subdivision';
    case 'draw-curve': return `Drew a new ${op.family === 'alpha' ? 'α' : 'β'} curve`;
    case 'finger-move': return `Finger move of ${curveLabel(op.curve.family, op.curve.index)}`;
    case 'delete-curve': return `Deleted ${curveLabel(op.curve.family, op.curve.index)}`;
    case 'rename-curve': return `Renumbered ${curveLabel(op.curve.family, op.curve.index)}`;
    case 'add-basepoint': return `Added a basepoint ${op.kind}`;
    case 'move-basepoint': return 'Moved a basepoint';
    case 'remove-basepoint': return 'Removed a basepoint';
    case 'smooth': return `Smoothed the surface (${op.iterations ?? 5} steps)`;
    case 'smooth-curves': return `Smoothed the curves (${op.iterations ?? 10} steps)`;
    case 'remove-bigon': return `Removed the empty bigon ${regionLabel(op.region)}`;
  }
}

export interface HistoryPanelProps {
  revisions: Revision[];
  head: number;
  viewing: number;
  canEdit: boolean;
  busy: boolean;
  onView: (n: number) => void;
  onRestore: (n: number) => void;
}

/** Every revision, newest first: view any of them, restore an older one as a new head (history is kept). */
export function HistoryPanel({ revisions, head, viewing, canEdit, busy, onView, onRestore }: HistoryPanelProps) {
  return (
    <ol className="flex flex-col divide-y divide-line rounded-md border border-line text-sm" aria-label="Revisions, newest first">
      {revisions.map((r) => (
        <li key={r.number} className={`flex items-start justify-between gap-3 px-3 py-2 ${r.number === viewing ? 'bg-accent-soft' : ''}`} data-testid="revision-row" aria-current={r.number === viewing ? 'true' : undefined}>
          <div className="min-w-0">
            <p className="font-medium">
              Revision {r.number}
              {r.number === head && <span className="ml-2 rounded bg-ok-soft px-1.5 py-0.5 text-xs text-ok">latest</span>}
              {r.number === viewing && <span className="ml-2 text-xs text-ink-muted">(shown)</span>}
            </p>
            <p className="text-ink-muted">{r.message || describeOperation(r.operation)}</p>
            <p className="text-xs text-ink-faint">{r.authorName} · <time dateTime={r.createdAt}>{dateText(r.createdAt)}</time>{r.analysisStatus !== 'done' ? ` · analysis ${r.analysisStatus}` : ''}</p>
          </div>
          <div className="flex shrink-0 gap-1">
            {r.number !== viewing && <Button size="sm" variant="secondary" onClick={() => onView(r.number)} aria-label={`View revision ${r.number}`}>View</Button>}
            {canEdit && r.number !== head && (
              <Button size="sm" variant="secondary" disabled={busy} onClick={() => onRestore(r.number)} aria-label={`Restore revision ${r.number}`}>Restore</Button>
            )}
          </div>
        </li>
      ))}
    </ol>
  );
}
