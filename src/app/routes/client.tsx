import { useState } from 'react';
import { useLocation, useParams, type LoaderFunctionArgs } from 'react-router';
import type { MeasurementSetView } from '@shared/schemas/measurement';
import { Alert } from '@/components/ui/alert';
import { Badge } from '@/components/ui/badge';
import { Button, ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { isOwner, useMember } from '@/features/auth/hooks/use-member';
import { useArchiveClient } from '@/features/clients/api/archive-client';
import { clientQueryOptions, useClient } from '@/features/clients/api/get-client';
import { ClientDetails } from '@/features/clients/components/client-details';
import { dateFormat } from '@/lib/dates';
import { ClientDrafts } from '@/features/drafts/components/client-drafts';
import { ClientMailCard } from '@/features/mail/components/client-mail-card';
import { measurementSetsQueryOptions, useMeasurementSets } from '@/features/measurements/api/get-measurement-sets';
import { MeasurementHistory } from '@/features/measurements/components/measurement-history';
import { SetVersionsDialog } from '@/features/measurements/components/set-versions-dialog';
import { PhotosSection } from '@/features/photos/components/photos-section';
import { UnitSwitch } from '@/features/units/components/unit-switch';
import { queryClient } from '@/lib/query-client';
import { useDisplayUnit } from '@/lib/unit';

/** The client id in the address, or a 404 for anything else. */
export function clientIdParam(raw: string | undefined): number {
  const id = Number(raw);
  if (!Number.isInteger(id) || id < 1) throw new Response('No such client', { status: 404, statusText: 'No such client' });
  return id;
}

export async function clientLoader({ params }: LoaderFunctionArgs) {
  const id = clientIdParam(params.clientId);
  await Promise.all([queryClient.ensureQueryData(clientQueryOptions(id)), queryClient.ensureQueryData(measurementSetsQueryOptions(id))]);
  return null;
}

export function ClientRoute() {
  const id = clientIdParam(useParams().clientId);
  const me = useMember();
  const owner = isOwner(me);
  const unit = useDisplayUnit();
  const location = useLocation();
  const saved = (location.state as { saved?: string } | null)?.saved;
  const client = useClient(id);
  const sets = useMeasurementSets(id);
  const [versionsOf, setVersionsOf] = useState<MeasurementSetView | null>(null);
  const [confirmArchive, setConfirmArchive] = useState(false);
  const archive = useArchiveClient(id, { onSuccess: () => setConfirmArchive(false) });

  if (client.isPending) return <LoadingState>Loading the client…</LoadingState>;
  if (client.isError) {
    return (
      <Alert tone="error" title="This client could not be loaded">
        {client.error.message}
      </Alert>
    );
  }
  const c = client.data;
  const takeAction = (
    <ButtonLink variant="primary" to={paths.fitting.href(id)} data-testid="take-measurements">
      Take measurements
    </ButtonLink>
  );

  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        eyebrow={
          <>
            <ButtonLink to={paths.clients.href()} variant="ghost" compact className="-ml-3">
              ← Clients
            </ButtonLink>
          </>
        }
        title={
          <span className="flex flex-wrap items-center gap-3">
            {c.name}
            {c.archived && <Badge>Archived</Badge>}
          </span>
        }
        description={
          c.measurementSetCount === 0
            ? 'No fittings yet.'
            : `${c.measurementSetCount} ${c.measurementSetCount === 1 ? 'fitting' : 'fittings'}; the latest on ${c.lastTakenAt ? dateFormat(c.lastTakenAt) : '—'}.`
        }
        actions={
          <>
            <UnitSwitch />
            {owner && !c.archived && takeAction}
            {owner && (
              <Button onClick={() => (c.archived ? archive.mutate(false) : setConfirmArchive(true))} pending={archive.isPending && c.archived}>
                {c.archived ? 'Restore client' : 'Archive client'}
              </Button>
            )}
          </>
        }
      />
      {saved && <Alert tone="success">{saved}</Alert>}
      {archive.isError && !confirmArchive && <Alert tone="error" title="Not changed">{archive.error.message}</Alert>}
      {c.archived && (
        <Alert tone="info" title="This client is archived">
          Their records are kept but they are hidden from the clients list. {owner ? 'Restore them to take new measurements.' : ''}
        </Alert>
      )}
      <ClientDetails client={c} canEdit={owner} showContact={owner} />
      <Card title="Measurements" description={`Shown in ${unit === 'in' ? 'inches, to 1/8 in' : 'centimetres, to 1 mm'}. Stored exactly; switch units at any time.`}>
        {sets.isPending && <LoadingState>Loading the measurements…</LoadingState>}
        {sets.isError && <Alert tone="error">{sets.error.message}</Alert>}
        {sets.data && (
          <MeasurementHistory
            sets={sets.data.items}
            unit={unit}
            canEdit={owner && !c.archived}
            correctHref={(setId) => paths.fitting.href(id, setId)}
            onShowVersions={setVersionsOf}
            takeAction={takeAction}
          />
        )}
      </Card>
      <PhotosSection clientId={id} clientName={c.name} canEdit={owner && !c.archived} sets={sets.data?.items ?? []} />
      <Card title="Drafts" description="Styles drafted for this client from their block, with their state.">
        <ClientDrafts clientId={id} href={paths.draft.href} newHref={owner && !c.archived ? paths.draftNew.href(id) : null} />
      </Card>
      {owner && <ClientMailCard clientId={id} clientName={c.name} email={c.email ?? null} hasMeasurements={c.measurementSetCount > 0} />}
      <SetVersionsDialog clientId={id} set={versionsOf} unit={unit} onClose={() => setVersionsOf(null)} />
      <ConfirmDialog
        open={confirmArchive}
        title={`Archive ${c.name}?`}
        description="The client leaves the clients list; their measurements, notes and drafts are kept, and you can restore them at any time from the Archived list."
        confirmLabel={`Archive ${c.name}`}
        pending={archive.isPending}
        error={archive.error?.message ?? null}
        onConfirm={() => archive.mutate(true)}
        onCancel={() => setConfirmArchive(false)}
      />
    </div>
  );
}
