import { useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { ApiError, errorMessage } from '../../lib/api';
import { useMe } from '../../lib/session';
import { Alert, Button, ButtonLink, Card, LogoMark } from '../../lib/ui';
import { useAcceptInvitation } from './api';
import { useDocumentTitle } from '../../lib/document-title';

function acceptMessage(error: unknown): string {
  if (error instanceof ApiError && error.code === 'validation') {
    return 'This invitation link is not valid. It may have been cut short when it was copied.';
  }
  return errorMessage(error);
}

/** /invite/:token (and /invitations/accept?token=… from the email) — join a workspace. Signed-in route. */
export default function InviteAcceptPage() {
  const { token: pathToken } = useParams();
  const [params] = useSearchParams();
  const token = pathToken ?? params.get('token') ?? '';
  const { data: user } = useMe();
  const accept = useAcceptInvitation();
  const navigate = useNavigate();
  useDocumentTitle('Join a workspace');

  return (
    <div className="mx-auto max-w-lg py-10">
      <Card className="p-8 text-center">
        <div className="mx-auto w-fit">
          <LogoMark size={40} />
        </div>
        <h1 className="mt-5 text-2xl font-semibold tracking-tight">Join a workspace</h1>
        <p className="mt-3 text-ink-muted">
          You have been invited to a Quadrant workspace. Accepting adds {user ? <strong className="text-ink">{user.email}</strong> : 'your account'}{' '}
          to it with the role chosen by its owner.
        </p>
        <div aria-live="assertive" className="mt-5 text-left">
          {!token && <Alert tone="error">This link has no invitation code in it.</Alert>}
          {accept.isError && <Alert tone="error">{acceptMessage(accept.error)}</Alert>}
        </div>
        <div className="mt-6 flex justify-center gap-3">
          <ButtonLink to="/workspaces" variant="secondary">
            Not now
          </ButtonLink>
          <Button
            disabled={!token}
            loading={accept.isPending}
            onClick={() => accept.mutate(token, { onSuccess: ({ workspace }) => navigate(`/w/${workspace.id}`, { replace: true }) })}
          >
            Accept invitation
          </Button>
        </div>
      </Card>
    </div>
  );
}
