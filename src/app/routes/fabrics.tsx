import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { controlClasses } from '@/components/ui/field';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { isOwner, useMember } from '@/features/auth/hooks/use-member';
import { useFabrics } from '@/features/fabrics/api/get-fabrics';
import { FabricsTable } from '@/features/fabrics/components/fabrics-table';
import { useDebouncedValue } from '@/hooks/use-debounced-value';
import { SwatchThumb } from '@/features/photos/components/swatch-thumb';
import { UnitSwitch } from '@/features/units/components/unit-switch';
import { useDisplayUnit } from '@/lib/unit';

const SEARCH_DEBOUNCE_MS = 300;
/** A studio keeps a shelf of knits, not a warehouse: one page of the largest size the API gives. */
const FABRIC_PAGE_SIZE = 100;

export function FabricsRoute() {
  const owner = isOwner(useMember());
  const unit = useDisplayUnit();
  const [search, setSearch] = useState('');
  const q = useDebouncedValue(search.trim(), SEARCH_DEBOUNCE_MS);
  const fabrics = useFabrics({ q: q || undefined, sort: 'name', order: 'asc', pageSize: FABRIC_PAGE_SIZE });
  const items = fabrics.data?.items ?? [];

  return (
    <div>
      <PageHeader
        title="Fabrics"
        description="Each knit with its stretch and recovery, and the negative ease it suits for a fitted top."
        actions={
          <>
            <UnitSwitch />
            {owner && (
              <ButtonLink variant="primary" to={paths.fabricNew.href()}>
                Add fabric
              </ButtonLink>
            )}
          </>
        }
      />
      <div className="mb-4 flex max-w-md flex-col gap-1.5">
        <label htmlFor="fabric-search" className="text-sm font-medium">
          Search fabrics
        </label>
        <input id="fabric-search" type="search" value={search} onChange={(e) => setSearch(e.target.value)} placeholder="Name or fibre" maxLength={120} className={controlClasses(false)} />
      </div>
      {fabrics.isPending && <LoadingState>Loading fabrics…</LoadingState>}
      {fabrics.isError && (
        <Alert tone="error" title="The fabrics could not be loaded">
          {fabrics.error.message} Reload the page to try again.
        </Alert>
      )}
      {fabrics.data && items.length === 0 && (
        <div className="rounded-xl border border-dashed border-line bg-panel px-6 py-12 text-center">
          <h2 className="text-lg font-semibold">{q ? `No fabric matches “${q}”` : 'No fabrics yet'}</h2>
          <p className="mx-auto mt-2 max-w-md text-muted">
            {q
              ? 'Search by part of the name or the fibre content.'
              : owner
                ? 'Add a knit with its stretch test: the drafts use its stretch to choose the negative ease.'
                : 'An owner adds the studio’s fabrics; they will appear here with their stretch.'}
          </p>
          {owner && !q && (
            <div className="mt-6 flex justify-center">
              <ButtonLink variant="primary" to={paths.fabricNew.href()}>
                Add fabric
              </ButtonLink>
            </div>
          )}
        </div>
      )}
      {items.length > 0 && <FabricsTable fabrics={items} unit={unit} fabricHref={paths.fabric.href} swatch={(f) => <SwatchThumb fabricId={f.id} />} />}
      {fabrics.data && fabrics.data.total > items.length && (
        <p className="mt-3 text-sm text-muted">
          Showing {items.length} of {fabrics.data.total}; search to find the others.
        </p>
      )}
    </div>
  );
}
