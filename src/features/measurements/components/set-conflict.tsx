import type { LengthUnit } from '@shared/units';
import type { MeasurementSetView } from '@shared/schemas/measurement';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import type { ValuesMm } from '../lib/set-compare';
import { dateFormat } from '@/lib/dates';
import { SetComparison } from './set-comparison';

interface SetConflictProps {
  mine: ValuesMm;
  current: MeasurementSetView;
  unit: LengthUnit;
  pending: boolean;
  /** Record my copy as the next version, after the one saved meanwhile. */
  onKeepMine: () => void;
  /** Leave my copy and go back to the saved one. */
  onKeepTheirs: () => void;
}

/** Someone corrected the set first: both copies side by side, so nothing is lost either way. */
export function SetConflict({ mine, current, unit, pending, onKeepMine, onKeepTheirs }: SetConflictProps) {
  return (
    <div className="flex flex-col gap-4" data-testid="set-conflict">
      <Alert tone="warn" title={`${current.recordedBy.name} saved version ${current.version} of this set while you were correcting it`}>
        Your copy is not saved yet. Compare the two below, then record yours as version {current.version + 1} or keep version{' '}
        {current.version} as it is. Either way, every version stays readable.
      </Alert>
      <SetComparison
        caption="Your copy beside the version saved meanwhile"
        current={mine}
        currentLabel="Your copy"
        previous={current.valuesMm}
        previousLabel={`Saved version ${current.version} (${dateFormat(current.recordedAt)})`}
        unit={unit}
      />
      <div className="flex flex-wrap justify-end gap-3">
        <Button onClick={onKeepTheirs} disabled={pending}>
          Keep version {current.version}
        </Button>
        <Button variant="primary" onClick={onKeepMine} pending={pending} pendingLabel="Saving…">
          Save my copy as version {current.version + 1}
        </Button>
      </div>
    </div>
  );
}
