import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { LoadingState } from '@/components/ui/loading-state';
import { useDrafts } from '../api/get-drafts';
import { DraftsTable } from './drafts-table';

export interface ClientDraftsProps {
  clientId: number;
  href: (id: number) => string;
  /** Where "New draft" goes, or null when the member may not start one. */
  newHref: string | null;
}

/** A client's drafts on their page, newest change first, with the way to start another. */
export function ClientDrafts({ clientId, href, newHref }: ClientDraftsProps) {
  const drafts = useDrafts({ clientId, sort: 'updated' });
  return (
    <div className="flex flex-col gap-3" data-testid="client-drafts">
      {drafts.isPending && <LoadingState>Loading drafts…</LoadingState>}
      {drafts.isError && <Alert tone="error">{drafts.error.message}</Alert>}
      {drafts.data && drafts.data.items.length === 0 && (
        <p className="text-muted">
          No drafts yet.{' '}
          {newHref ? 'Start one from this client’s block: choose a style and a fabric, then adjust it live.' : 'The owner starts drafts.'}
        </p>
      )}
      {drafts.data && drafts.data.items.length > 0 && <DraftsTable items={drafts.data.items} caption="This client’s drafts" href={href} hideClient />}
      {newHref && (
        <div>
          <ButtonLink to={newHref} variant="primary" data-testid="client-new-draft">
            New draft
          </ButtonLink>
        </div>
      )}
    </div>
  );
}
