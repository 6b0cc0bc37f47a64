import { useQuery } from '@tanstack/react-query';
import { useNavigate, useSearchParams } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { isOwner, useMember } from '@/features/auth/hooks/use-member';
import { useClients } from '@/features/clients/api/get-clients';
import { NewDraftForm } from '@/features/drafts/components/new-draft-form';
import { useFabrics } from '@/features/fabrics/api/get-fabrics';
import { measurementSetsQueryOptions } from '@/features/measurements/api/get-measurement-sets';
import { useDisplayUnit } from '@/lib/unit';

function clientParam(raw: string | null): number | null {
  const id = Number(raw);
  return Number.isInteger(id) && id > 0 ? id : null;
}

function takenOn(iso: string): string {
  return new Date(iso).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
}

/** Starting a draft: client → block → style → fabric; creating it opens the workspace. */
export function DraftNewRoute() {
  const me = useMember();
  const unit = useDisplayUnit();
  const navigate = useNavigate();
  const [search, setSearch] = useSearchParams();
  const clientId = clientParam(search.get('client'));
  const clients = useClients({ status: 'active', sort: 'name', order: 'asc', pageSize: 100 });
  const fabrics = useFabrics({ sort: 'name', order: 'asc', pageSize: 100 });
  const sets = useQuery({ ...measurementSetsQueryOptions(clientId ?? 0), enabled: clientId !== null });

  if (!isOwner(me)) {
    return (
      <Alert tone="info" title="Only the studio’s owner starts drafts">
        Approved drafts appear in the work queue for cutting.
        <ButtonLink compact className="mt-2" to={paths.queue.href()}>
          Open the work queue
        </ButtonLink>
      </Alert>
    );
  }

  const setOptions =
    clientId !== null && sets.data
      ? sets.data.items.filter((s) => s.isCurrent).map((s) => ({ id: s.id, label: `Fitting of ${takenOn(s.takenAt)}` }))
      : [];

  return (
    <div>
      <PageHeader
        title="New draft"
        description="Choose the client, the block to draft from, a style and a fabric. The workspace opens with the pattern drawn; adjust it there."
      />
      {(clients.isError || fabrics.isError) && (
        <Alert tone="error" className="mb-4">
          {clients.error?.message ?? fabrics.error?.message}
        </Alert>
      )}
      {fabrics.data && fabrics.data.items.length === 0 && (
        <Alert tone="info" className="mb-4" title="No fabrics yet">
          Add the knit you will cut, with its stretch, before drafting: the stretch sets the negative ease.
          <ButtonLink compact className="mt-2" to={paths.fabricNew.href()}>
            Add a fabric
          </ButtonLink>
        </Alert>
      )}
      <NewDraftForm
        clientId={clientId}
        clients={(clients.data?.items ?? []).map((c) => ({ id: c.id, name: c.name }))}
        onClientChange={(id) => setSearch(id === null ? {} : { client: String(id) }, { replace: true })}
        fabrics={(fabrics.data?.items ?? []).map((f) => ({ id: f.id, name: f.name, detail: `${f.stretchCrosswise} % stretch` }))}
        measurementSets={setOptions}
        unit={unit}
        onCreated={(draft) => void navigate(paths.draft.href(draft.id))}
      />
    </div>
  );
}
