import { useState, type FormEvent } from 'react';
import { NavLink, Outlet, useParams } from 'react-router-dom';
import { updateWorkspaceRequestSchema, type Workspace } from '../../../server/contract/index.js';
import { errorMessage, hasStatus } from '../../lib/api';
import { serverFieldErrors, validate, type FieldErrors } from '../../lib/forms';
import { Alert, Button, Card, LoadingState, NotFoundView, PageHeader, QueryError, RoleBadge, TextAreaField, TextField, cx } from '../../lib/ui';
import { useUpdateWorkspace, useWorkspace } from './api';
import { useDocumentTitle } from '../../lib/document-title';

/** What child routes of the workspace page receive through `useOutletContext()`. */
export interface WorkspaceOutletContext {
  workspace: Workspace;
}

function RenameForm({ workspace, onDone }: { workspace: Workspace; onDone: () => void }) {
  const update = useUpdateWorkspace(workspace.id);
  const [errors, setErrors] = useState<FieldErrors>({});
  const shown = { ...serverFieldErrors(update.error), ...errors };

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const checked = validate(updateWorkspaceRequestSchema, { name: form.get('name'), description: form.get('description') ?? '' });
    if (!checked.ok) {
      setErrors(checked.errors);
      return;
    }
    setErrors({});
    update.mutate(checked.data, { onSuccess: onDone });
  }

  return (
    <Card className="p-6">
      <form noValidate onSubmit={onSubmit} aria-label="Rename workspace" className="flex flex-col gap-4">
        <div aria-live="assertive">
          {update.isError && !Object.keys(serverFieldErrors(update.error)).length && <Alert tone="error">{errorMessage(update.error)}</Alert>}
        </div>
        <TextField label="Workspace name" name="name" defaultValue={workspace.name} required maxLength={120} error={shown.name} autoFocus />
        <TextAreaField label="Description" name="description" defaultValue={workspace.description} maxLength={2000} error={shown.description} />
        <div className="flex gap-3">
          <Button type="submit" loading={update.isPending}>
            Save changes
          </Button>
          <Button variant="secondary" onClick={onDone}>
            Cancel
          </Button>
        </div>
      </form>
    </Card>
  );
}

const tabClass = ({ isActive }: { isActive: boolean }) =>
  cx(
    '-mb-px border-b-2 px-1 pb-3 pt-1 text-[0.95rem] font-medium no-underline transition-colors',
    isActive ? 'border-accent text-ink hover:text-ink' : 'border-transparent text-ink-muted hover:border-line-strong hover:text-ink',
  );

/** /w/:workspaceId — title, owner's rename, and the Library / Members sections (child routes). */
export default function WorkspacePage() {
  const { workspaceId = '' } = useParams();
  const query = useWorkspace(workspaceId);
  const [renaming, setRenaming] = useState(false);
  useDocumentTitle(query.data?.workspace.name ?? (query.isError ? 'Workspace not found' : undefined));

  if (query.isPending) return <LoadingState label="Loading workspace…" />;
  if (query.isError) {
    if (hasStatus(query.error, 404) || hasStatus(query.error, 400)) {
      return (
        <NotFoundView
          title="Workspace not found"
          message="This workspace does not exist, or it has not been shared with you. Ask its owner for an invitation."
        />
      );
    }
    return <QueryError error={query.error} what="this workspace" onRetry={() => query.refetch()} />;
  }

  const { workspace } = query.data;
  const isOwner = workspace.role === 'owner';
  const context: WorkspaceOutletContext = { workspace };

  return (
    <div className="flex flex-col gap-8">
      {renaming ? (
        <RenameForm workspace={workspace} onDone={() => setRenaming(false)} />
      ) : (
        <PageHeader
          eyebrow={
            <span className="inline-flex items-center gap-2">
              Workspace <RoleBadge role={workspace.role} />
            </span>
          }
          title={workspace.name}
          description={workspace.description || undefined}
          actions={
            isOwner && (
              <Button variant="secondary" size="sm" onClick={() => setRenaming(true)}>
                Rename
              </Button>
            )
          }
        />
      )}
      <div>
        <nav aria-label="Workspace sections" className="flex gap-6 border-b border-line">
          <NavLink to={`/w/${workspace.id}`} end className={tabClass}>
            Library
          </NavLink>
          <NavLink to={`/w/${workspace.id}/members`} className={tabClass}>
            Members
          </NavLink>
        </nav>
        <div className="pt-8">
          <Outlet context={context} />
        </div>
      </div>
    </div>
  );
}
