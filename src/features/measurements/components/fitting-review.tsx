import { useId } from 'react';
import type { LengthUnit } from '@shared/units';
import { MEASUREMENT_FIELDS, type MeasurementKey, type MeasurementWarning } from '@shared/schemas/measurement';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { controlClasses } from '@/components/ui/field';
import type { ValuesMm } from '../lib/set-compare';
import { dateFormat } from '@/lib/dates';
import { SetComparison } from './set-comparison';

interface FittingReviewProps {
  valuesMm: ValuesMm;
  unit: LengthUnit;
  previous: { valuesMm: ValuesMm; takenAt: string; label: string } | null;
  warnings: MeasurementWarning[];
  /** Measurements that are not a length yet, or needed and missing, with why. */
  problems: { key: MeasurementKey; message: string }[];
  notes: string;
  onNotesChange: (notes: string) => void;
  onGoTo: (key: MeasurementKey) => void;
  onSave: () => void;
  saving: boolean;
  saveLabel: string;
  /** The server's answer when saving failed. */
  saveError: string | null;
}

/** The whole set before saving: values beside the previous fitting, what to check, notes. */
export function FittingReview(props: FittingReviewProps) {
  const { valuesMm, unit, previous, warnings, problems, notes, onNotesChange, onGoTo, onSave, saving, saveLabel, saveError } = props;
  const notesId = useId();
  const flagged = new Set<string>(warnings.map((w) => w.field));
  const label = (key: MeasurementKey) => MEASUREMENT_FIELDS.find((f) => f.key === key)?.label ?? key;
  return (
    <div className="flex flex-col gap-5">
      <div>
        <h2 className="text-2xl font-semibold tracking-tight">Review and save</h2>
        <p className="mt-1 text-muted">
          {previous
            ? `Compared with the fitting of ${dateFormat(previous.takenAt)}: changes are highlighted.`
            : 'This is the client’s first measurement set.'}
        </p>
      </div>
      {problems.length > 0 && (
        <Alert tone="error" title="Fix these before saving">
          <ul className="list-disc space-y-1 pl-5">
            {problems.map((p) => (
              <li key={p.key}>
                <button type="button" className="text-left underline underline-offset-2" onClick={() => onGoTo(p.key)}>
                  {p.message}
                </button>
              </li>
            ))}
          </ul>
        </Alert>
      )}
      {warnings.length > 0 && (
        <Alert tone="warn" title="Worth a second look (you can still save)">
          <ul className="list-disc space-y-1 pl-5">
            {warnings.map((w) => (
              <li key={`${w.field}-${w.code}`}>
                <button type="button" className="text-left underline underline-offset-2" onClick={() => onGoTo(w.field)}>
                  {label(w.field)}
                </button>
                : {w.message}
              </li>
            ))}
          </ul>
        </Alert>
      )}
      <SetComparison
        caption="This fitting beside the previous one"
        current={valuesMm}
        currentLabel="This fitting"
        previous={previous?.valuesMm}
        previousLabel={previous ? previous.label : ''}
        unit={unit}
        flagged={flagged}
        onFieldClick={(key) => onGoTo(key as MeasurementKey)}
      />
      <div className="flex flex-col gap-1.5">
        <label htmlFor={notesId} className="text-sm font-medium">
          Notes on this fitting <span className="font-normal text-muted">(optional)</span>
        </label>
        <textarea
          id={notesId}
          value={notes}
          onChange={(e) => onNotesChange(e.target.value)}
          rows={3}
          placeholder="What was worn, posture, anything to remember"
          className={`${controlClasses(false)} py-2`}
        />
      </div>
      {saveError && <Alert tone="error" title="Not saved">{saveError}</Alert>}
      <div className="flex justify-end">
        <Button variant="primary" onClick={onSave} pending={saving} pendingLabel="Saving…" className="min-h-14 px-8 text-lg" data-testid="fitting-save">
          {saveLabel}
        </Button>
      </div>
    </div>
  );
}
