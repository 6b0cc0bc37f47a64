import { Link } from 'react-router';
import { paths } from '@/config/paths';
import { AuthCard } from '@/features/auth/components/auth-card';
import { ForgotPasswordForm } from '@/features/password-reset/components/forgot-password-form';

export function ForgotPasswordRoute() {
  return (
    <AuthCard
      title="Reset your password"
      description="Type the e-mail address you sign in with. We send a link to choose a new password; it works once, within an hour."
      footer={
        <>
          Remembered it?{' '}
          <Link to={paths.signIn.href()} className="font-medium text-accent underline underline-offset-2 hover:text-accent-strong">
            Sign in
          </Link>
        </>
      }
    >
      <ForgotPasswordForm />
    </AuthCard>
  );
}
