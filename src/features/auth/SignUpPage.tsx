import { useState, type FormEvent } from 'react';
import { Link, Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { PASSWORD_MIN_LENGTH, signupRequestSchema } from '../../../server/contract/index.js';
import { ApiError, isApiUnreachable } from '../../lib/api';
import { serverFieldErrors, validate, type FieldErrors } from '../../lib/forms';
import { safeNextPath } from '../../lib/navigation';
import { useMe, useSignUp } from '../../lib/session';
import { Alert, Button, TextField } from '../../lib/ui';
import { AuthLayout } from './AuthLayout';
import { useDocumentTitle } from '../../lib/document-title';

function signUpMessage(error: unknown): string {
  if (isApiUnreachable(error)) return 'Quadrant’s server is not answering. Please try again in a moment.';
  if (error instanceof ApiError) {
    if (error.code === 'conflict') return 'An account with this email already exists. Sign in instead?';
    if (error.code === 'rate_limited') return 'Too many attempts. Please wait a few minutes before trying again.';
    if (error.code === 'validation') return 'Please correct the fields marked below.';
    return error.message;
  }
  return 'Creating the account failed.';
}

/** /sign-up — name, email, password (at least PASSWORD_MIN_LENGTH characters). */
export default function SignUpPage() {
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));
  const { data: user } = useMe();
  const signUp = useSignUp();
  const navigate = useNavigate();
  const [errors, setErrors] = useState<FieldErrors>({});
  useDocumentTitle('Create an account');

  if (user && !signUp.isSuccess) return <Navigate to={next} replace />;
  const shown = { ...serverFieldErrors(signUp.error), ...errors };

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const checked = validate(signupRequestSchema, {
      name: form.get('name'),
      email: form.get('email'),
      password: form.get('password'),
    });
    if (!checked.ok) {
      setErrors(checked.errors);
      signUp.reset();
      return;
    }
    setErrors({});
    signUp.mutate(checked.data, { onSuccess: () => navigate(next, { replace: true }) });
  }

  return (
    <AuthLayout
      title="Create your account"
      subtitle="Start a workspace for your group’s diagrams."
      footer={
        <>
          Already have an account?{' '}
          <Link to={params.get('next') ? `/sign-in?next=${encodeURIComponent(next)}` : '/sign-in'} className="font-medium">
            Sign in
          </Link>
        </>
      }
    >
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5">
        <div aria-live="assertive">{signUp.isError && <Alert tone="error">{signUpMessage(signUp.error)}</Alert>}</div>
        <TextField label="Name" name="name" autoComplete="name" required error={shown.name} autoFocus />
        <TextField label="Email" name="email" type="email" autoComplete="email" required error={shown.email} />
        <TextField
          label="Password"
          name="password"
          type="password"
          autoComplete="new-password"
          required
          minLength={PASSWORD_MIN_LENGTH}
          hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
          error={shown.password}
        />
        <Button type="submit" loading={signUp.isPending} className="mt-1 w-full">
          Create account
        </Button>
      </form>
    </AuthLayout>
  );
}
