import { useState, type FormEvent } from 'react';
import { useNavigate, useOutletContext } from 'react-router-dom';
import { createInvitationRequestSchema, ROLES, type Member, type Role } from '../../../server/contract/index.js';
import { ApiError, errorMessage } from '../../lib/api';
import { formatDate } from '../../lib/format';
import { validate, type FieldErrors } from '../../lib/forms';
import { useMe } from '../../lib/session';
import { Alert, Button, Card, ConfirmDialog, EmptyState, LoadingState, QueryError, RoleBadge, ROLE_LABELS, SelectField, TextField } from '../../lib/ui';
import { useCreateInvitation, useInvitations, useMembers, useRemoveMember, useUpdateMemberRole } from './api';
import type { WorkspaceOutletContext } from './WorkspacePage';

const ROLE_OPTIONS = [...ROLES].reverse().map((r) => ({ value: r, label: ROLE_LABELS[r] }));

function mutationMessage(error: unknown): string {
  if (error instanceof ApiError && error.code === 'conflict') return error.message || 'A workspace needs at least one owner.';
  return errorMessage(error);
}

function InviteForm({ workspaceId }: { workspaceId: string }) {
  const invite = useCreateInvitation(workspaceId);
  const [errors, setErrors] = useState<FieldErrors>({});
  const [sentTo, setSentTo] = useState<string | null>(null);

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const formEl = e.currentTarget;
    const form = new FormData(formEl);
    const checked = validate(createInvitationRequestSchema, { email: form.get('email'), role: form.get('role') });
    setSentTo(null);
    if (!checked.ok) {
      setErrors(checked.errors);
      return;
    }
    setErrors({});
    invite.mutate(checked.data, {
      onSuccess: ({ invitation }) => {
        setSentTo(invitation.email);
        formEl.reset();
      },
    });
  }

  return (
    <Card className="p-6">
      <h3 id="invite-title" className="text-lg font-semibold">
        Invite a colleague
      </h3>
      <p className="mt-1 text-sm text-ink-muted">They receive an email with a link to join this workspace.</p>
      <form noValidate onSubmit={onSubmit} aria-labelledby="invite-title" className="mt-5 flex flex-col gap-4">
        <div aria-live="polite">
          {invite.isError && <Alert tone="error">{mutationMessage(invite.error)}</Alert>}
          {sentTo && <Alert tone="success">Invitation sent to {sentTo}.</Alert>}
        </div>
        <TextField label="Email address" name="email" type="email" autoComplete="off" required error={errors.email} />
        <SelectField label="Role" name="role" options={ROLE_OPTIONS} defaultValue="editor" error={errors.role} />
        <Button type="submit" loading={invite.isPending} className="self-start">
          Send invitation
        </Button>
      </form>
    </Card>
  );
}

function PendingInvitations({ workspaceId }: { workspaceId: string }) {
  const query = useInvitations(workspaceId, true);
  const pending = query.data?.invitations.filter((i) => !i.acceptedAt) ?? [];
  return (
    <section aria-labelledby="pending-title" className="flex flex-col gap-3">
      <h3 id="pending-title" className="text-lg font-semibold">
        Pending invitations
      </h3>
      {query.isPending && <LoadingState label="Loading invitations…" />}
      {query.isError && <QueryError error={query.error} what="the invitations" onRetry={() => query.refetch()} />}
      {query.data && pending.length === 0 && <p className="text-sm text-ink-muted">No invitations are waiting for an answer.</p>}
      {pending.length > 0 && (
        <ul className="divide-y divide-line rounded-[var(--radius-card)] border border-line bg-surface">
          {pending.map((inv) => (
            <li key={inv.id} className="flex flex-wrap items-center justify-between gap-2 px-4 py-3 text-sm">
              <span className="min-w-0">
                <span className="block truncate font-medium text-ink">{inv.email}</span>
                <span className="text-ink-faint">
                  Invited by {inv.invitedBy} · expires {formatDate(inv.expiresAt)}
                </span>
              </span>
              <RoleBadge role={inv.role} />
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

/** /w/:workspaceId/members — who belongs to the workspace; owners manage roles, removals and invitations. */
export default function MembersTab() {
  const { workspace } = useOutletContext<WorkspaceOutletContext>();
  const { data: me } = useMe();
  const members = useMembers(workspace.id);
  const updateRole = useUpdateMemberRole(workspace.id);
  const remove = useRemoveMember(workspace.id);
  const navigate = useNavigate();
  const [removing, setRemoving] = useState<Member | null>(null);
  const isOwner = workspace.role === 'owner';
  const leaving = removing?.userId === me?.id;

  return (
    <div className="grid grid-cols-1 gap-10 lg:grid-cols-[minmax(0,1fr)_22rem]">
      <section aria-labelledby="members-title" className="flex min-w-0 flex-col gap-4">
        <div className="flex items-baseline justify-between gap-4">
          <h2 id="members-title" className="text-xl font-semibold">
            Members
          </h2>
          {members.data && <span className="text-sm text-ink-muted">{members.data.members.length} in total</span>}
        </div>
        <div aria-live="polite">
          {updateRole.isError && <Alert tone="error">Could not change the role: {mutationMessage(updateRole.error)}</Alert>}
          {remove.isError && <Alert tone="error">Could not remove the member: {mutationMessage(remove.error)}</Alert>}
        </div>
        {members.isPending && <LoadingState label="Loading members…" />}
        {members.isError && <QueryError error={members.error} what="the members" onRetry={() => members.refetch()} />}
        {members.data && members.data.members.length === 0 && <EmptyState title="No members" />}
        {members.data && members.data.members.length > 0 && (
          <div className="relative overflow-x-auto rounded-[var(--radius-card)] border border-line bg-surface">
            <table className="w-full min-w-[34rem] text-left text-sm">
              <caption className="sr-only">Members of {workspace.name} and their roles</caption>
              <thead className="bg-sunken text-xs uppercase tracking-wide text-ink-muted">
                <tr>
                  <th scope="col" className="px-4 py-3 font-medium">Name</th>
                  <th scope="col" className="px-4 py-3 font-medium">Role</th>
                  <th scope="col" className="hidden px-4 py-3 font-medium md:table-cell">Joined</th>
                  <th scope="col" className="px-4 py-3 font-medium"><span className="sr-only">Actions</span></th>
                </tr>
              </thead>
              <tbody className="divide-y divide-line">
                {members.data.members.map((m) => {
                  const self = m.userId === me?.id;
                  return (
                    <tr key={m.userId} className="align-middle">
                      <th scope="row" className="px-4 py-3 font-normal">
                        <span className="block font-medium text-ink">
                          {m.name}
                          {self && <span className="ml-2 text-xs font-normal text-ink-faint">(you)</span>}
                        </span>
                        <span className="block text-ink-muted">{m.email}</span>
                      </th>
                      <td className="px-4 py-3">
                        {isOwner ? (
                          <SelectField
                            label={`Role of ${m.name}`}
                            hideLabel
                            options={ROLE_OPTIONS}
                            value={m.role}
                            disabled={updateRole.isPending}
                            onChange={(e) => updateRole.mutate({ userId: m.userId, role: e.target.value as Role })}
                            containerClassName="w-32"
                            className="h-9"
                          />
                        ) : (
                          <RoleBadge role={m.role} />
                        )}
                      </td>
                      <td className="hidden px-4 py-3 text-ink-muted md:table-cell">{formatDate(m.joinedAt)}</td>
                      <td className="px-4 py-3 text-right">
                        {(isOwner || self) && (
                          <Button variant="ghost" size="sm" onClick={() => setRemoving(m)} aria-label={self ? 'Leave workspace' : `Remove ${m.name}`}>
                            {self ? 'Leave' : 'Remove'}
                          </Button>
                        )}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        )}
      </section>
      {isOwner && (
        <aside className="flex flex-col gap-8">
          <InviteForm workspaceId={workspace.id} />
          <PendingInvitations workspaceId={workspace.id} />
        </aside>
      )}
      <ConfirmDialog
        open={removing !== null}
        title={leaving ? `Leave ${workspace.name}?` : `Remove ${removing?.name ?? ''}?`}
        confirmLabel={leaving ? 'Leave workspace' : 'Remove member'}
        busy={remove.isPending}
        onCancel={() => setRemoving(null)}
        onConfirm={() => {
          if (!removing) return;
          const wasSelf = leaving;
          remove.mutate(removing.userId, {
            onSettled: () => setRemoving(null),
            onSuccess: () => {
              if (wasSelf) navigate('/workspaces', { replace: true });
            },
          });
        }}
      >
        {leaving
          ? 'You will lose access to its diagrams until someone invites you again.'
          : `${removing?.name ?? 'This member'} will lose access to the workspace and its diagrams. You can invite them again later.`}
      </ConfirmDialog>
    </div>
  );
}
