import { useSearchParams } from 'react-router';
import { DRAFT_STATES, type DraftState } from '@shared/schemas/draft';
import { Alert } from '@/components/ui/alert';
import { Button, ButtonLink } from '@/components/ui/button';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { SelectField } from '@/components/ui/select-field';
import { paths } from '@/config/paths';
import { isOwner, useMember } from '@/features/auth/hooks/use-member';
import { draftsQueryOptions, useDrafts } from '@/features/drafts/api/get-drafts';
import type { DraftListFilters } from '@/features/drafts/api/draft-keys';
import { DraftsTable } from '@/features/drafts/components/drafts-table';
import { DRAFT_STATE_LABELS } from '@/features/drafts/lib/draft-states';
import { queryClient } from '@/lib/query-client';

function filtersFrom(search: URLSearchParams): DraftListFilters {
  const state = search.get('state');
  const page = Number(search.get('page'));
  return {
    state: state && (DRAFT_STATES as readonly string[]).includes(state) ? (state as DraftState) : undefined,
    sort: search.get('sort') === 'due' ? 'due' : 'updated',
    page: Number.isInteger(page) && page > 1 ? page : undefined,
  };
}

export async function draftsLoader({ request }: { request: Request }) {
  await queryClient.ensureQueryData(draftsQueryOptions(filtersFrom(new URL(request.url).searchParams)));
  return null;
}

/** Every draft of the studio, filtered by state, most recently changed first. */
export function DraftsRoute() {
  const [search, setSearch] = useSearchParams();
  const filters = filtersFrom(search);
  const owner = isOwner(useMember());
  const drafts = useDrafts(filters);
  const set = (key: string, value: string | undefined) => {
    const next = new URLSearchParams(search);
    if (value) next.set(key, value);
    else next.delete(key);
    if (key !== 'page') next.delete('page');
    setSearch(next);
  };
  const page = drafts.data?.page ?? 1;
  const pages = drafts.data ? Math.max(1, Math.ceil(drafts.data.total / drafts.data.pageSize)) : 1;

  return (
    <div className="flex flex-col gap-5">
      <PageHeader
        title="Drafts"
        description="Every style drafted for a client, with its state. Open one to adjust it, approve it or see its revisions."
        actions={
          owner && (
            <ButtonLink to={paths.draftNew.href()} variant="primary">
              New draft
            </ButtonLink>
          )
        }
      />
      <div className="flex flex-wrap items-end gap-4">
        <SelectField
          label="State"
          className="w-48"
          value={filters.state ?? ''}
          onChange={(e) => set('state', e.target.value || undefined)}
          options={[{ value: '', label: 'All states' }, ...DRAFT_STATES.map((s) => ({ value: s, label: DRAFT_STATE_LABELS[s] }))]}
        />
        <SelectField
          label="Order"
          className="w-56"
          value={filters.sort ?? 'updated'}
          onChange={(e) => set('sort', e.target.value === 'due' ? 'due' : undefined)}
          options={[
            { value: 'updated', label: 'Last changed first' },
            { value: 'due', label: 'Due date, soonest first' },
          ]}
        />
      </div>
      {drafts.isPending && <LoadingState>Loading drafts…</LoadingState>}
      {drafts.isError && <Alert tone="error" title="The drafts could not be loaded">{drafts.error.message}</Alert>}
      {drafts.data && drafts.data.items.length === 0 && (
        <p className="rounded-xl border border-line bg-panel p-6 text-muted">
          {filters.state
            ? `No drafts are ${DRAFT_STATE_LABELS[filters.state as DraftState].toLowerCase()}.`
            : owner
              ? 'No drafts yet. Start one with “New draft”: choose a client, their block, a style and a fabric.'
              : 'No drafts yet. The owner starts drafts; approved ones appear in the work queue.'}
        </p>
      )}
      {drafts.data && drafts.data.items.length > 0 && (
        <>
          <DraftsTable items={drafts.data.items} caption="Drafts" href={paths.draft.href} />
          {pages > 1 && (
            <nav aria-label="Pages" className="flex items-center gap-3">
              <Button compact disabled={page <= 1} onClick={() => set('page', String(page - 1))}>
                Previous
              </Button>
              <span className="num text-sm text-muted">
                Page {page} of {pages}
              </span>
              <Button compact disabled={page >= pages} onClick={() => set('page', String(page + 1))}>
                Next
              </Button>
            </nav>
          )}
        </>
      )}
    </div>
  );
}
