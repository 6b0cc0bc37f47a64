import { Link, useNavigate, useSearchParams } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { paths } from '@/config/paths';
import { AuthCard } from '@/features/auth/components/auth-card';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { NEXT_FALLBACK, nextPathSafe } from '@/features/auth/lib/next-path';

export { signedOutLoader as signInLoader } from '@/features/auth/lib/route-guards';

export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = nextPathSafe(params.get('next'));
  return (
    <AuthCard
      title="Sign in"
      description="Use the e-mail and password of your Knitwright account."
      footer={
        <>
          Setting up a new studio?{' '}
          <Link to={paths.signUp.href()} className="font-medium text-accent underline underline-offset-2 hover:text-accent-strong">
            Create a studio account
          </Link>
        </>
      }
    >
      {next !== NEXT_FALLBACK && (
        <Alert tone="info" className="mb-5">
          Sign in to continue to the page you opened.
        </Alert>
      )}
      <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
      <p className="mt-4 text-center text-sm">
        <Link to={paths.forgotPassword.href()} className="inline-flex min-h-touch items-center font-medium text-accent underline underline-offset-2 hover:text-accent-strong">
          Forgot your password?
        </Link>
      </p>
    </AuthCard>
  );
}
