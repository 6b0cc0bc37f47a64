import { Link, useNavigate } from 'react-router';
import { paths } from '@/config/paths';
import { AuthCard } from '@/features/auth/components/auth-card';
import { SignUpForm } from '@/features/auth/components/sign-up-form';

export { signedOutLoader as signUpLoader } from '@/features/auth/lib/route-guards';

export function SignUpRoute() {
  const navigate = useNavigate();
  return (
    <AuthCard
      title="Create a studio account"
      description="You become the studio's owner: you set its defaults and manage its members."
      footer={
        <>
          Already have an account?{' '}
          <Link to={paths.signIn.href()} className="font-medium text-accent underline underline-offset-2 hover:text-accent-strong">
            Sign in
          </Link>
        </>
      }
    >
      <SignUpForm onSignedUp={() => void navigate(paths.home.href(), { replace: true })} />
    </AuthCard>
  );
}
