import { useState } from 'react';
import { Link, useParams } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { LoadingState } from '@/components/ui/loading-state';
import { paths } from '@/config/paths';
import { AuthCard } from '@/features/auth/components/auth-card';
import { useResetLink } from '@/features/password-reset/api/get-reset-link';
import { ResetPasswordForm } from '@/features/password-reset/components/reset-password-form';

export function ResetPasswordRoute() {
  const token = useParams().token ?? '';
  const link = useResetLink(token);
  const [done, setDone] = useState(false);

  let body;
  if (done) {
    body = (
      <>
        <Alert tone="success" title="Password changed">
          Your account was signed out on every device. Sign in with the new password.
        </Alert>
        <ButtonLink to={paths.signIn.href()} variant="primary" block className="mt-5">
          Sign in
        </ButtonLink>
      </>
    );
  } else if (link.isPending) {
    body = <LoadingState>Checking the link…</LoadingState>;
  } else if (link.isError) {
    body = (
      <>
        <Alert tone="error" title="This link cannot be used">
          {link.error.message}
        </Alert>
        <ButtonLink to={paths.forgotPassword.href()} variant="primary" block className="mt-5">
          Ask for a new link
        </ButtonLink>
      </>
    );
  } else {
    body = <ResetPasswordForm token={token} email={link.data.email} onDone={() => setDone(true)} />;
  }

  return (
    <AuthCard
      title="Choose a new password"
      footer={
        <Link to={paths.signIn.href()} className="font-medium text-accent underline underline-offset-2 hover:text-accent-strong">
          Back to sign in
        </Link>
      }
    >
      {body}
    </AuthCard>
  );
}
