import { useState } from 'react';
import { useMutation } from '@tanstack/react-query';
import { DIAGRAM_PATHS, type CreateShareLinkResponse, type ExportFormat } from '../../../server/contract/index.js';
import { api, errorMessage } from '../../lib/api';
import { Button } from '../../lib/ui';

const FORMATS: ExportFormat[] = ['obj', 'ply', 'off', 'stl'];

/** Download the shown revision in a mesh format; editors can create a public read-only link. */
export function ShareExport({ diagramId, revision, canEdit }: { diagramId: string; revision: number; canEdit: boolean }) {
  const [format, setFormat] = useState<ExportFormat>('obj');
  const share = useMutation({ mutationFn: () => api.post<CreateShareLinkResponse>(DIAGRAM_PATHS.shares(diagramId), {}) });
  const [copied, setCopied] = useState(false);
  return (
    <div className="flex flex-wrap items-center gap-2 text-sm">
      <label className="flex items-center gap-1.5">
        <span className="text-ink-muted">Export</span>
        <select className="h-8 rounded-md border border-line-strong bg-surface px-2" value={format} onChange={(e) => setFormat(e.target.value as ExportFormat)}>
          {FORMATS.map((f) => <option key={f} value={f}>{f.toUpperCase()}</option>)}
        </select>
      </label>
      <a className="inline-flex h-8 items-center rounded-md border border-line-strong bg-surface px-3 font-medium text-ink no-underline hover:bg-sunken" href={DIAGRAM_PATHS.export(diagramId, revision, format)} download>
        Download
      </a>
      {canEdit && (
        share.data ? (
          <span className="flex items-center gap-1.5">
            <input readOnly aria-label="Share link" value={share.data.url} className="h-8 w-64 rounded-md border border-line-strong px-2 font-mono text-xs" onFocus={(e) => e.target.select()} />
            <Button size="sm" variant="secondary" onClick={async () => { await navigator.clipboard?.writeText(share.data!.url).catch(() => undefined); setCopied(true); }}>
              {copied ? 'Copied' : 'Copy'}
            </Button>
          </span>
        ) : (
          <Button size="sm" variant="secondary" loading={share.isPending} onClick={() => share.mutate()}>Create a share link</Button>
        )
      )}
      {share.error && <span role="alert" className="text-danger">{errorMessage(share.error)}</span>}
    </div>
  );
}
