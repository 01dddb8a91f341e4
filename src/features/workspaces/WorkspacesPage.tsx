import { useState, type FormEvent } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { createWorkspaceRequestSchema } from '../../../server/contract/index.js';
import { errorMessage } from '../../lib/api';
import { serverFieldErrors, validate, type FieldErrors } from '../../lib/forms';
import { useMe } from '../../lib/session';
import { Alert, Button, Card, EmptyState, LoadingState, PageHeader, QueryError, RoleBadge, TextAreaField, TextField } from '../../lib/ui';
import { useCreateWorkspace, useWorkspaces } from './api';
import { useDocumentTitle } from '../../lib/document-title';

function CreateWorkspaceForm() {
  const create = useCreateWorkspace();
  const navigate = useNavigate();
  const [errors, setErrors] = useState<FieldErrors>({});
  const shown = { ...serverFieldErrors(create.error), ...errors };

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const checked = validate(createWorkspaceRequestSchema, {
      name: form.get('name'),
      description: form.get('description') || undefined,
    });
    if (!checked.ok) {
      setErrors(checked.errors);
      return;
    }
    setErrors({});
    create.mutate(checked.data, { onSuccess: ({ workspace }) => navigate(`/w/${workspace.id}`) });
  }

  return (
    <Card className="p-6">
      <h2 id="create-workspace-title" className="text-lg font-semibold">
        New workspace
      </h2>
      <p className="mt-1 text-sm text-ink-muted">A shared library of diagrams for a group or a project. You will be its owner.</p>
      <form noValidate onSubmit={onSubmit} aria-labelledby="create-workspace-title" className="mt-5 flex flex-col gap-4">
        <div aria-live="assertive">
          {create.isError && !Object.keys(serverFieldErrors(create.error)).length && <Alert tone="error">{errorMessage(create.error)}</Alert>}
        </div>
        <TextField label="Workspace name" name="name" required maxLength={120} error={shown.name} />
        <TextAreaField label="Description" name="description" hint="Optional." maxLength={2000} error={shown.description} />
        <Button type="submit" loading={create.isPending} className="self-start">
          Create workspace
        </Button>
      </form>
    </Card>
  );
}

/** /workspaces — the workspaces you belong to, and a form to start a new one. */
export default function WorkspacesPage() {
  const { data: user } = useMe();
  const workspaces = useWorkspaces();
  useDocumentTitle('Workspaces');

  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        title="Workspaces"
        description={user ? `Signed in as ${user.name}. Each workspace keeps its own diagrams and members.` : undefined}
      />
      <div className="grid grid-cols-1 gap-8 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <section aria-labelledby="your-workspaces">
          <h2 id="your-workspaces" className="sr-only">
            Your workspaces
          </h2>
          {workspaces.isPending && <LoadingState label="Loading workspaces…" />}
          {workspaces.isError && <QueryError error={workspaces.error} what="your workspaces" onRetry={() => workspaces.refetch()} />}
          {workspaces.data && workspaces.data.workspaces.length === 0 && (
            <EmptyState title="No workspaces yet">Create one with the form, or accept an invitation from a colleague.</EmptyState>
          )}
          {workspaces.data && workspaces.data.workspaces.length > 0 && (
            <ul className="grid gap-4 sm:grid-cols-2">
              {workspaces.data.workspaces.map((w) => (
                <li key={w.id}>
                  <Link
                    to={`/w/${w.id}`}
                    className="group flex h-full flex-col rounded-[var(--radius-card)] border border-line bg-surface p-5 text-ink no-underline shadow-[0_1px_2px_rgba(28,39,54,0.05)] transition hover:border-accent hover:text-ink hover:shadow-md"
                  >
                    <span className="flex items-start justify-between gap-3">
                      <span className="text-lg font-semibold leading-snug group-hover:text-accent-strong">{w.name}</span>
                      <RoleBadge role={w.role} />
                    </span>
                    <span className="mt-2 line-clamp-3 text-sm text-ink-muted">{w.description || 'No description.'}</span>
                    <span className="mt-auto pt-4 text-xs text-ink-faint">
                      {w.memberCount} {w.memberCount === 1 ? 'member' : 'members'}
                    </span>
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </section>
        <aside>
          <CreateWorkspaceForm />
        </aside>
      </div>
    </div>
  );
}
