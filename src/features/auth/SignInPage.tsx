import { useState, type FormEvent } from 'react';
import { Link, Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { loginRequestSchema } from '../../../server/contract/index.js';
import { ApiError, isApiUnreachable } from '../../lib/api';
import { validate, type FieldErrors } from '../../lib/forms';
import { safeNextPath } from '../../lib/navigation';
import { useMe, useSignIn } from '../../lib/session';
import { Alert, Button, TextField } from '../../lib/ui';
import { AuthLayout } from './AuthLayout';
import { useDocumentTitle } from '../../lib/document-title';

function signInMessage(error: unknown): string {
  if (isApiUnreachable(error)) return 'Quadrant’s server is not answering. Please try again in a moment.';
  if (error instanceof ApiError) {
    if (error.code === 'invalid_credentials') return 'That email and password do not match an account.';
    if (error.code === 'rate_limited') return 'Too many attempts. Please wait a few minutes before trying again.';
    return error.message;
  }
  return 'Signing in failed.';
}

/** /sign-in — email and password; returns to `?next=` afterwards. */
export default function SignInPage() {
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));
  const { data: user } = useMe();
  const signIn = useSignIn();
  const navigate = useNavigate();
  const [errors, setErrors] = useState<FieldErrors>({});
  useDocumentTitle('Sign in');

  if (user && !signIn.isSuccess) return <Navigate to={next} replace />;

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const checked = validate(loginRequestSchema, { email: form.get('email'), password: form.get('password') });
    if (!checked.ok) {
      setErrors(checked.errors);
      signIn.reset();
      return;
    }
    setErrors({});
    signIn.mutate(checked.data, { onSuccess: () => navigate(next, { replace: true }) });
  }

  return (
    <AuthLayout
      title="Sign in"
      subtitle="Welcome back to your diagrams."
      footer={
        <>
          New to Quadrant?{' '}
          <Link to={params.get('next') ? `/sign-up?next=${encodeURIComponent(next)}` : '/sign-up'} className="font-medium">
            Create an account
          </Link>
        </>
      }
    >
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5" aria-describedby={signIn.isError ? 'sign-in-error' : undefined}>
        <div aria-live="assertive" id="sign-in-error">
          {signIn.isError && <Alert tone="error">{signInMessage(signIn.error)}</Alert>}
        </div>
        <TextField label="Email" name="email" type="email" autoComplete="email" required error={errors.email} autoFocus />
        <TextField label="Password" name="password" type="password" autoComplete="current-password" required error={errors.password} />
        <Button type="submit" loading={signIn.isPending} className="mt-1 w-full">
          Sign in
        </Button>
      </form>
    </AuthLayout>
  );
}
