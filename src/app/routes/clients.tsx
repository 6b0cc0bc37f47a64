import { useCallback, useEffect, useRef, useState } from 'react';
import { useNavigate, useSearchParams } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { isOwner, useMember } from '@/features/auth/hooks/use-member';
import { useClients } from '@/features/clients/api/get-clients';
import { ClientCreateDialog } from '@/features/clients/components/client-create-dialog';
import { ClientsEmpty } from '@/features/clients/components/clients-empty';
import { ClientsPager } from '@/features/clients/components/clients-pager';
import { ClientsTable } from '@/features/clients/components/clients-table';
import { ClientsToolbar } from '@/features/clients/components/clients-toolbar';
import { useDebouncedValue } from '@/hooks/use-debounced-value';
import { listParamsRead, listParamsWrite, listQuery, pageCount, type ClientListParams } from '@/features/clients/lib/list-params';

/** Typing settles for this long before the list is searched. */
const SEARCH_DEBOUNCE_MS = 300;

export function ClientsRoute() {
  const me = useMember();
  const owner = isOwner(me);
  const navigate = useNavigate();
  const [searchParams, setSearchParams] = useSearchParams();
  const params = listParamsRead(searchParams);
  const [searchText, setSearchText] = useState(params.q);
  const debouncedSearch = useDebouncedValue(searchText, SEARCH_DEBOUNCE_MS);
  const [adding, setAdding] = useState(false);

  const paramsSet = useCallback(
    (change: Partial<ClientListParams>) => {
      setSearchParams((prev) => listParamsWrite({ ...listParamsRead(prev), page: 1, ...change }), { replace: true });
    },
    [setSearchParams],
  );

  // Typing writes the search to the address once it settles; only a new settled text does, so
  // Back and Forward (which change the address) are never undone by a stale search box.
  const written = useRef(debouncedSearch);
  useEffect(() => {
    if (debouncedSearch === written.current) return;
    written.current = debouncedSearch;
    setSearchParams(
      (prev) => {
        const current = listParamsRead(prev);
        return current.q === debouncedSearch ? prev : listParamsWrite({ ...current, page: 1, q: debouncedSearch });
      },
      { replace: true },
    );
  }, [debouncedSearch, setSearchParams]);
  // ...and an address changed by Back or Forward puts its search back in the box.
  const [shownQ, setShownQ] = useState(params.q);
  if (params.q !== shownQ) {
    setShownQ(params.q);
    if (params.q !== debouncedSearch) setSearchText(params.q);
  }

  const clients = useClients(listQuery(params));
  const total = clients.data?.total ?? 0;
  const pages = pageCount(total, clients.data?.pageSize);

  const addButton = (
    <Button variant="primary" onClick={() => setAdding(true)}>
      Add client
    </Button>
  );

  return (
    <div>
      <PageHeader
        title="Clients"
        description="Everyone the studio makes for, with their fittings. Open a client to see their measurements or take a new set."
        actions={owner ? addButton : null}
      />
      <ClientsToolbar
        search={searchText}
        onSearchChange={setSearchText}
        status={params.status}
        onStatusChange={(status) => paramsSet({ status })}
        summary={clients.data ? `${total} ${total === 1 ? 'client' : 'clients'}` : ''}
      />
      {clients.isPending && <LoadingState>Loading clients…</LoadingState>}
      {clients.isError && (
        <Alert tone="error" title="The clients could not be loaded">
          {clients.error.message} Reload the page to try again.
        </Alert>
      )}
      {clients.data && clients.data.items.length === 0 && (
        <ClientsEmpty
          search={params.q}
          status={params.status}
          canEdit={owner}
          addAction={addButton}
          onSearchClear={() => {
            setSearchText('');
            paramsSet({ q: '' });
          }}
        />
      )}
      {clients.data && clients.data.items.length > 0 && (
        <>
          <ClientsTable
            rows={clients.data.items}
            params={params}
            showContact={owner}
            clientHref={paths.client.href}
            stale={clients.isPlaceholderData}
            onSortChange={(sort, order) => paramsSet({ sort, order })}
          />
          <ClientsPager page={Math.min(params.page, pages)} pages={pages} onPageChange={(page) => paramsSet({ page })} />
        </>
      )}
      {owner && (
        <ClientCreateDialog
          open={adding}
          onClose={() => setAdding(false)}
          onCreated={(client) => {
            setAdding(false);
            void navigate(paths.client.href(client.id));
          }}
        />
      )}
    </div>
  );
}
