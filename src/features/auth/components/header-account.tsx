import { Link } from 'react-router';
import { Button } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { useMe } from '../api/get-me';
import { useSignOut } from '../api/sign-out';
import { ROLE_LABEL } from '../lib/role-label';

/** The header's right side: the studio, who is signed in (a link to their account) and sign-out. */
export function HeaderAccount() {
  const { data: me } = useMe();
  const signOut = useSignOut({ onSuccess: () => window.location.replace(paths.signIn.href()) });
  if (!me) return null;
  return (
    <div className="ml-auto flex items-center gap-2 sm:gap-3">
      <Link
        to={paths.account.href()}
        className="flex min-h-touch flex-col justify-center rounded-lg px-2 text-right leading-tight hover:bg-surface"
      >
        <span className="sr-only">Your account: </span>
        <span className="text-sm font-semibold" data-testid="header-studio">
          {me.studio.name}
        </span>
        <span className="text-xs text-muted" data-testid="header-member">
          {me.user.name} · {ROLE_LABEL[me.user.role]}
        </span>
      </Link>
      <Button compact className="whitespace-nowrap" onClick={() => signOut.mutate()} pending={signOut.isPending} pendingLabel="Signing out…">
        Sign out
      </Button>
      {signOut.isError && (
        <p role="alert" className="text-sm text-danger">
          Not signed out: {signOut.error.message}
        </p>
      )}
    </div>
  );
}
