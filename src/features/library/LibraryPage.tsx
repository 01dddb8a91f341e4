/**
 * The workspace's diagram library: a sortable, filterable table, create from a template, upload a file,
 * rename, duplicate, delete with undo. Rendered inside the workspace page at /w/:workspaceId.
 */
import { useEffect, useMemo, useRef, useState } from 'react';
import { useParams } from 'react-router-dom';
import type { DiagramSummary } from '../../../server/contract/index.js';
import { errorMessage } from '../../lib/api';
import { useCanInWorkspace } from '../../lib/workspace';
import { Alert, Button, Card, EmptyState, LoadingState, QueryError, TextField } from '../../lib/ui';
import { useDeleteDiagram, useDiagramList, useDuplicateDiagram, useRenameDiagram, useUndeleteDiagram } from './api';
import { CreateFromTemplate } from './CreateFromTemplate';
import { DiagramTable } from './DiagramTable';
import { UploadPanel } from './UploadPanel';

interface Toast { id: number; text: string; undo?: () => void }

/** A polite live region at the bottom of the screen with an optional Undo button; disappears after 10 s. */
function ToastBar({ toast, onClose }: { toast: Toast | null; onClose: () => void }) {
  useEffect(() => {
    if (!toast) return;
    const t = setTimeout(onClose, 10_000);
    return () => clearTimeout(t);
  }, [toast, onClose]);
  return (
    <div role="status" aria-live="polite" className="pointer-events-none fixed inset-x-0 bottom-6 z-30 flex justify-center">
      {toast && (
        <div className="pointer-events-auto flex items-center gap-4 rounded-lg bg-ink px-4 py-3 text-sm text-white shadow-xl">
          <span>{toast.text}</span>
          {toast.undo && (
            <button type="button" className="font-semibold text-[#9fe3dd] underline underline-offset-2" onClick={() => { toast.undo?.(); onClose(); }}>
              Undo
            </button>
          )}
          <button type="button" aria-label="Dismiss" className="text-white/70 hover:text-white" onClick={onClose}>✕</button>
        </div>
      )}
    </div>
  );
}

function matches(d: DiagramSummary, q: string): boolean {
  if (!q) return true;
  const hay = `${d.name} ${d.description} ${d.h1 ?? ''} ${d.updatedBy.name} ${d.createdBy.name}`.toLowerCase();
  return q.toLowerCase().split(/\s+/).filter(Boolean).every((w) => hay.includes(w));
}

export default function LibraryPage() {
  const { workspaceId = '' } = useParams();
  const list = useDiagramList(workspaceId);
  const canEdit = useCanInWorkspace(workspaceId, 'editor');
  const [filter, setFilter] = useState('');
  const [panel, setPanel] = useState<'none' | 'template' | 'upload'>('none');
  const [toast, setToast] = useState<Toast | null>(null);
  const toastId = useRef(0);
  const rename = useRenameDiagram(workspaceId);
  const duplicate = useDuplicateDiagram(workspaceId);
  const remove = useDeleteDiagram(workspaceId);
  const undelete = useUndeleteDiagram(workspaceId);
  const [actionError, setActionError] = useState<string | null>(null);

  const show = (text: string, undo?: () => void) => setToast({ id: ++toastId.current, text, undo });
  const fail = (e: unknown) => setActionError(errorMessage(e));

  const diagrams = useMemo(() => (list.data?.diagrams ?? []).filter((d) => !d.deletedAt), [list.data]);
  const shown = useMemo(() => diagrams.filter((d) => matches(d, filter.trim())), [diagrams, filter]);

  return (
    <section aria-labelledby="library-title" className="flex flex-col gap-5">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h2 id="library-title" className="text-xl font-semibold">Diagrams</h2>
          <p className="text-sm text-ink-muted">Heegaard diagrams on triangulated surfaces, analysed once per revision.</p>
        </div>
        {canEdit && (
          <div className="flex gap-2">
            <Button variant={panel === 'template' ? 'secondary' : 'primary'} onClick={() => setPanel(panel === 'template' ? 'none' : 'template')} aria-expanded={panel === 'template'}>
              New from template
            </Button>
            <Button variant="secondary" onClick={() => setPanel(panel === 'upload' ? 'none' : 'upload')} aria-expanded={panel === 'upload'}>
              Upload a file
            </Button>
          </div>
        )}
      </div>

      {panel === 'template' && (
        <Card className="p-5">
          <h3 className="mb-4 font-semibold">New diagram from a template</h3>
          <CreateFromTemplate workspaceId={workspaceId} onDone={() => setPanel('none')} />
        </Card>
      )}
      {panel === 'upload' && (
        <Card className="p-5">
          <h3 className="mb-4 font-semibold">Upload a diagram</h3>
          <UploadPanel workspaceId={workspaceId} onDone={() => setPanel('none')} />
        </Card>
      )}

      <div className="flex flex-wrap items-end justify-between gap-3">
        <TextField
          label="Filter diagrams"
          type="search"
          placeholder="Name, H₁ or person"
          value={filter}
          onChange={(e) => setFilter(e.target.value)}
          containerClassName="w-full max-w-sm"
        />
        <p className="text-sm text-ink-muted" aria-live="polite">
          {list.data ? `${shown.length} of ${diagrams.length} diagram${diagrams.length === 1 ? '' : 's'}` : ''}
        </p>
      </div>

      {actionError && <Alert tone="error">{actionError}</Alert>}
      {list.isPending && <LoadingState label="Loading diagrams…" />}
      {list.error && <QueryError error={list.error} onRetry={() => list.refetch()} />}
      {list.data && diagrams.length === 0 && (
        <EmptyState title="No diagrams yet">{canEdit ? 'Create one from a template or upload a mesh file.' : 'Editors of this workspace can add diagrams.'}</EmptyState>
      )}
      {list.data && diagrams.length > 0 && shown.length === 0 && <EmptyState title="Nothing matches the filter" />}
      {shown.length > 0 && (
        <DiagramTable
          workspaceId={workspaceId}
          diagrams={shown}
          canEdit={canEdit}
          busyId={duplicate.isPending ? (duplicate.variables ?? null) : null}
          onRename={(d, name) => rename.mutate({ id: d.id, name }, { onSuccess: () => show(`Renamed to “${name}”.`), onError: fail })}
          onDuplicate={(d) => duplicate.mutate(d.id, { onSuccess: (r) => show(`Created “${r.diagram.name}”.`), onError: fail })}
          onDelete={(d) => remove.mutate(d.id, {
            onSuccess: () => show(`Deleted “${d.name}”.`, () => undelete.mutate(d.id, { onSuccess: () => show(`Restored “${d.name}”.`), onError: fail })),
            onError: fail,
          })}
        />
      )}
      <ToastBar toast={toast} onClose={() => setToast(null)} />
    </section>
  );
}
