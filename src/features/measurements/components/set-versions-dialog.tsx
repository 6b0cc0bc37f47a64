import { useState } from 'react';
import type { LengthUnit } from '@shared/units';
import type { MeasurementSetView } from '@shared/schemas/measurement';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { Dialog } from '@/components/ui/dialog';
import { LoadingState } from '@/components/ui/loading-state';
import { useMeasurementSet, useMeasurementSetVersion } from '../api/get-measurement-set';
import { dateFormat } from '@/lib/dates';
import { SetComparison } from './set-comparison';

interface SetVersionsDialogProps {
  clientId: number;
  /** The set whose versions to show (its current version); null when closed. */
  set: MeasurementSetView | null;
  unit: LengthUnit;
  onClose: () => void;
}

/** A corrected set's versions: pick one to read it beside the current version. */
export function SetVersionsDialog({ clientId, set, unit, onClose }: SetVersionsDialogProps) {
  const [picked, setPicked] = useState<number | null>(null);
  const detail = useMeasurementSet(clientId, set?.setId ?? null);
  const older = set ? (picked ?? Math.max(1, set.version - 1)) : null;
  const version = useMeasurementSetVersion(clientId, set?.setId ?? 0, set && older !== set.version ? older : null);

  return (
    <Dialog
      open={set !== null}
      onClose={() => {
        setPicked(null);
        onClose();
      }}
      title={set ? `Versions of the fitting of ${dateFormat(set.takenAt)}` : 'Versions'}
      description="A correction never overwrites a set: every earlier version stays readable here."
      className="max-h-[calc(100vh-2rem)] max-w-3xl! overflow-y-auto"
      footer={
        <Button
          onClick={() => {
            setPicked(null);
            onClose();
          }}
        >
          Close
        </Button>
      }
    >
      {detail.isPending && <LoadingState>Loading the versions…</LoadingState>}
      {detail.isError && <Alert tone="error">{detail.error.message}</Alert>}
      {detail.data && set && (
        <div className="flex flex-col gap-4">
          <ol className="flex flex-wrap gap-2" aria-label="Versions">
            {detail.data.versions.map((v) => (
              <li key={v.id}>
                <button
                  type="button"
                  aria-pressed={older === v.version}
                  disabled={v.version === set.version}
                  onClick={() => setPicked(v.version)}
                  className={cx(
                    'min-h-touch rounded-lg border px-3 text-left text-sm',
                    older === v.version ? 'border-accent bg-accent-soft text-accent-strong' : 'border-line bg-panel hover:bg-surface',
                    v.version === set.version && 'cursor-default opacity-80',
                  )}
                >
                  <span className="font-semibold">Version {v.version}</span>
                  {v.version === set.version && ' (current)'}
                  <span className="block text-muted">
                    {v.recordedBy.name}, {dateFormat(v.recordedAt)}
                  </span>
                </button>
              </li>
            ))}
          </ol>
          {version.isPending && older !== set.version && <LoadingState>Loading version {older}…</LoadingState>}
          {version.isError && <Alert tone="error">{version.error.message}</Alert>}
          {version.data && (
            <>
              {version.data.notes && <p className="text-sm text-muted">Notes of version {version.data.version}: {version.data.notes}</p>}
              <SetComparison
                caption={`Version ${set.version} beside version ${version.data.version}`}
                current={set.valuesMm}
                currentLabel={`Version ${set.version} (current)`}
                previous={version.data.valuesMm}
                previousLabel={`Version ${version.data.version}`}
                unit={unit}
              />
            </>
          )}
        </div>
      )}
    </Dialog>
  );
}
