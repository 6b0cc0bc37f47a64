import { Link, useLocation } from 'react-router';
import { paths } from '@/config/paths';

export function NotFoundRoute() {
  const location = useLocation();
  return (
    <div className="mx-auto max-w-xl py-16">
      <p className="text-sm font-medium text-muted">404</p>
      <h1 className="mt-1 text-2xl font-semibold">There is no page at this address</h1>
      <p className="mt-3 text-muted">
        <code className="rounded bg-panel px-1.5 py-0.5">{location.pathname}</code> does not exist in Knitwright. Check the
        address, or start again from the overview.
      </p>
      <Link to={paths.home.href()} className="mt-6 inline-flex min-h-touch items-center rounded-lg bg-accent px-5 font-medium text-white hover:bg-accent-strong">
        Go to the overview
      </Link>
    </div>
  );
}
