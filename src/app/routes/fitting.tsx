import { useRef, useState } from 'react';
import { useNavigate, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import type { MeasurementSetCreateInput, MeasurementSetView } from '@shared/schemas/measurement';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { LoadingState } from '@/components/ui/loading-state';
import { paths } from '@/config/paths';
import { OwnersOnly } from '@/features/auth/components/owners-only';
import { clientKeys } from '@/features/clients/api/client-keys';
import { clientQueryOptions, useClient } from '@/features/clients/api/get-client';
import { dateFormat } from '@/lib/dates';
import { setConflictCurrent, useCorrectMeasurementSet } from '@/features/measurements/api/correct-measurement-set';
import { useCreateMeasurementSet } from '@/features/measurements/api/create-measurement-set';
import { measurementSetQueryOptions, useMeasurementSet } from '@/features/measurements/api/get-measurement-set';
import { measurementSetsQueryOptions, useMeasurementSets } from '@/features/measurements/api/get-measurement-sets';
import { FittingMode, type FittingPrevious } from '@/features/measurements/components/fitting-mode';
import { SetConflict } from '@/features/measurements/components/set-conflict';
import { entriesRead } from '@/features/measurements/lib/fitting-entries';
import { UnitSwitch } from '@/features/units/components/unit-switch';
import { ApiError } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';
import { useDisplayUnit } from '@/lib/unit';
import { clientIdParam } from './client';

function correctParam(search: URLSearchParams): number | null {
  const id = Number(search.get('correct'));
  return Number.isInteger(id) && id > 0 ? id : null;
}

export async function fittingLoader({ params, request }: LoaderFunctionArgs) {
  const id = clientIdParam(params.clientId);
  const correct = correctParam(new URL(request.url).searchParams);
  await Promise.all([
    queryClient.ensureQueryData(clientQueryOptions(id)),
    queryClient.ensureQueryData(measurementSetsQueryOptions(id)),
    correct ? queryClient.ensureQueryData(measurementSetQueryOptions(id, correct)) : null,
  ]);
  return null;
}

/** The server's refusal in words: its message plus each field's reason. */
function errorText(error: unknown): string {
  if (!(error instanceof ApiError)) return 'Something went wrong. Try again.';
  return [error.message, ...Object.values(error.fields)].join(' ');
}

export function FittingRoute() {
  return (
    <OwnersOnly what="Taking and correcting measurements">
      <Fitting />
    </OwnersOnly>
  );
}

function Fitting() {
  const id = clientIdParam(useParams().clientId);
  const [search] = useSearchParams();
  const correct = correctParam(search);
  const unit = useDisplayUnit();
  const navigate = useNavigate();
  const client = useClient(id);
  const sets = useMeasurementSets(id);
  const corrected = useMeasurementSet(id, correct);
  const [pendingPayload, setPendingPayload] = useState<MeasurementSetCreateInput | null>(null);
  const [conflict, setConflict] = useState<MeasurementSetView | null>(null);

  const saved = useRef(false);
  const done = async (set: MeasurementSetView, verb: string) => {
    saved.current = true;
    // The client's fitting count and latest date change with every set.
    await queryClient.invalidateQueries({ queryKey: clientKeys.all });
    await navigate(paths.client.href(id), { state: { saved: `Measurement set of ${dateFormat(set.takenAt)} ${verb}.` } });
  };
  const create = useCreateMeasurementSet(id, { onSuccess: (set) => void done(set, 'saved') });
  const correction = useCorrectMeasurementSet(id, correct ?? 0, { onSuccess: (set) => void done(set, `saved as version ${set.version}`) });

  if (client.isPending || sets.isPending || (correct && corrected.isPending)) return <LoadingState>Loading the fitting…</LoadingState>;
  const loadError = client.error ?? sets.error ?? corrected.error;
  if (loadError || !client.data || !sets.data) {
    return (
      <Alert tone="error" title="The fitting could not be opened">
        {loadError?.message ?? 'Reload the page to try again.'}
      </Alert>
    );
  }

  const base = correct ? corrected.data : undefined;
  const latest = sets.data.items[0];
  const previous: FittingPrevious | null = base
    ? { valuesMm: base.valuesMm, takenAt: base.takenAt, label: `Version ${base.version} as recorded` }
    : latest
      ? { valuesMm: latest.valuesMm, takenAt: latest.takenAt, label: 'Last fitting' }
      : null;

  const save = (payload: MeasurementSetCreateInput, version?: number) => {
    setPendingPayload(payload);
    if (!base) {
      create.mutate(payload);
      return;
    }
    correction.mutate(
      { ...payload, version: version ?? base.version },
      {
        onError: (error) => {
          const current = setConflictCurrent(error);
          if (current) setConflict(current);
        },
      },
    );
  };

  const saving = create.isPending || correction.isPending;
  const failure = create.error ?? (correction.error && !setConflictCurrent(correction.error) ? correction.error : null);
  const tools = (
    <>
      <UnitSwitch />
      <ButtonLink to={paths.client.href(id)} compact>
        {base ? 'Cancel the correction' : 'Leave without saving'}
      </ButtonLink>
    </>
  );

  if (conflict && pendingPayload) {
    return (
      <div className="flex flex-col gap-4">
        <h1 className="text-2xl font-semibold tracking-tight">Correcting {client.data.name}&rsquo;s fitting</h1>
        <SetConflict
          mine={entriesRead(pendingPayloadEntries(pendingPayload), pendingPayload.unit).valuesMm}
          current={conflict}
          unit={unit}
          pending={correction.isPending}
          onKeepMine={() => {
            const version = conflict.version;
            setConflict(null);
            save(pendingPayload, version);
          }}
          onKeepTheirs={() => void navigate(paths.client.href(id))}
        />
      </div>
    );
  }

  return (
    <FittingMode
      key={correct ?? 'new'}
      title={base ? `Correcting ${client.data.name}’s fitting of ${dateFormat(base.takenAt)}` : `Fitting: ${client.data.name}`}
      unit={unit}
      tools={tools}
      previous={previous}
      initialValuesMm={base?.valuesMm}
      initialTakenAt={base?.takenAt}
      initialNotes={base?.notes ?? undefined}
      saveLabel={base ? `Save as version ${base.version + 1}` : 'Save measurement set'}
      saving={saving}
      saveError={failure ? errorText(failure) : null}
      onSave={(payload) => save(payload)}
      saved={() => saved.current}
    />
  );
}

/** The typed texts of a payload, to read them back into mm for the comparison. */
function pendingPayloadEntries(payload: MeasurementSetCreateInput) {
  const entries: Record<string, string> = {};
  for (const [key, value] of Object.entries(payload.values ?? {})) if (value !== null && value !== undefined) entries[key] = String(value);
  return entries;
}
