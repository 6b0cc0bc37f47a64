import { isRouteErrorResponse, Link, useRouteError } from 'react-router';
import { paths } from '@/config/paths';

/** Shown when a screen fails to load or throws while drawing. */
export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'Unknown error';
  return (
    <div className="mx-auto max-w-xl px-6 py-16">
      <h1 className="text-2xl font-semibold">This screen could not be shown</h1>
      <p className="mt-3 text-muted">
        Your saved work is safe. Reload the page; if it happens again, note what you were doing and tell whoever looks after
        Knitwright for your studio.
      </p>
      <pre className="mt-4 overflow-x-auto rounded-lg border border-line bg-panel p-3 text-sm">{message}</pre>
      <div className="mt-6 flex gap-3">
        <button type="button" onClick={() => window.location.reload()} className="min-h-touch rounded-lg bg-accent px-5 font-medium text-white hover:bg-accent-strong">
          Reload
        </button>
        <Link to={paths.home.href()} className="flex min-h-touch items-center rounded-lg border border-line bg-panel px-5 font-medium">
          Go to the start
        </Link>
      </div>
    </div>
  );
}
