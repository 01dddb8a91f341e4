import { useRef, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { MAX_UPLOAD_BYTES, type FileProblem } from '../../../server/contract/index.js';
import { errorMessage } from '../../lib/api';
import { Button, TextField } from '../../lib/ui';
import { libraryKeys, uploadDiagram, UploadRejected } from './api';

const EXTENSIONS = ['obj', 'ply', 'off', 'stl'];

const formatBytes = (n: number) => (n >= 1024 * 1024 ? `${(n / 1024 / 1024).toFixed(1)} MB` : `${Math.ceil(n / 1024)} kB`);

/** Checks a chosen file before sending it: extension and size (the server checks again). */
export function checkFile(file: File): string | null {
  const ext = file.name.split('.').pop()?.toLowerCase() ?? '';
  if (!EXTENSIONS.includes(ext)) return `“${file.name}” is not an OBJ, PLY, OFF or STL file.`;
  if (file.size > MAX_UPLOAD_BYTES) return `“${file.name}” is ${formatBytes(file.size)}; the limit is ${formatBytes(MAX_UPLOAD_BYTES)}.`;
  if (file.size === 0) return `“${file.name}” is empty.`;
  return null;
}

/** Upload a mesh file with curves; a real progress bar; the server's problems listed with line numbers. */
export function UploadPanel({ workspaceId, onDone }: { workspaceId: string; onDone: () => void }) {
  const [file, setFile] = useState<File | null>(null);
  const [name, setName] = useState('');
  const [fileError, setFileError] = useState<string | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const [failure, setFailure] = useState<{ message: string; problems: FileProblem[] } | null>(null);
  const abort = useRef<AbortController | null>(null);
  const qc = useQueryClient();
  const navigate = useNavigate();

  const choose = (f: File | null) => {
    setFile(f);
    setFailure(null);
    setFileError(f ? checkFile(f) : null);
    if (f && !name) setName(f.name.replace(/\.[^.]+$/, ''));
  };

  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    if (!file) { setFileError('Choose a file to upload.'); return; }
    const problem = checkFile(file);
    if (problem) { setFileError(problem); return; }
    setFailure(null);
    setProgress(0);
    abort.current = new AbortController();
    try {
      const r = await uploadDiagram(workspaceId, file, name.trim() || file.name, setProgress, abort.current.signal);
      await qc.invalidateQueries({ queryKey: libraryKeys.list(workspaceId) });
      onDone();
      navigate(`/w/${workspaceId}/d/${r.diagram.id}`);
    } catch (err) {
      setFailure({ message: errorMessage(err), problems: err instanceof UploadRejected ? err.problems : [] });
    } finally {
      setProgress(null);
      abort.current = null;
    }
  };

  const busy = progress !== null;
  return (
    <form onSubmit={submit} noValidate aria-label="Upload a diagram file" className="grid gap-4">
      <div className="flex flex-col gap-1.5">
        <label htmlFor="diagram-file" className="text-sm font-medium text-ink">Mesh file (OBJ, PLY, OFF or STL)</label>
        <input
          id="diagram-file"
          type="file"
          accept=".obj,.ply,.off,.stl"
          aria-invalid={fileError ? true : undefined}
          aria-describedby="diagram-file-help"
          className="block w-full text-sm text-ink file:mr-3 file:rounded-md file:border file:border-line-strong file:bg-surface file:px-3 file:py-1.5 file:text-sm file:font-medium"
          onChange={(e) => choose(e.target.files?.[0] ?? null)}
          disabled={busy}
        />
        <p id="diagram-file-help" className={fileError ? 'text-sm text-danger' : 'text-sm text-ink-faint'}>
          {fileError ?? `Curves are edge cycles named in the file; at most ${formatBytes(MAX_UPLOAD_BYTES)}.`}
        </p>
      </div>
      <TextField label="Name" value={name} onChange={(e) => setName(e.target.value)} maxLength={160} disabled={busy} />
      {busy && (
        <div className="flex items-center gap-3">
          <div
            role="progressbar"
            aria-label="Upload progress"
            aria-valuemin={0}
            aria-valuemax={100}
            aria-valuenow={Math.round(progress * 100)}
            className="h-2 flex-1 overflow-hidden rounded-full bg-sunken"
          >
            <div className="h-full bg-accent transition-[width]" style={{ width: `${Math.round(progress * 100)}%` }} />
          </div>
          <span className="w-24 text-right text-sm tabular-nums text-ink-muted">
            {progress < 1 ? `${Math.round(progress * 100)}% sent` : 'Checking…'}
          </span>
          <Button variant="ghost" size="sm" onClick={() => abort.current?.abort()}>Cancel upload</Button>
        </div>
      )}
      {failure && (
        <div role="alert" data-testid="upload-errors" className="rounded-md border border-danger/40 bg-danger-soft px-4 py-3 text-sm text-danger">
          <p className="font-semibold">{failure.message}</p>
          {failure.problems.length > 0 && (
            <ul className="mt-2 list-disc space-y-1 pl-5">
              {failure.problems.map((p, i) => (
                <li key={i}>
                  {p.line !== undefined && <span className="font-mono font-semibold">Line {p.line}: </span>}
                  {p.offset !== undefined && p.line === undefined && <span className="font-mono font-semibold">Byte {p.offset}: </span>}
                  {p.line !== undefined ? p.message.replace(/^\s*line\s+\d+\s*[:,]\s*/i, '') : p.message}
                </li>
              ))}
            </ul>
          )}
        </div>
      )}
      <div className="flex gap-3">
        <Button type="submit" disabled={busy || Boolean(fileError)}>Upload</Button>
        <Button variant="ghost" onClick={onDone} disabled={busy}>Cancel</Button>
      </div>
    </form>
  );
}
