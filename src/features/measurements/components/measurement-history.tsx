import { useState, type ReactNode } from 'react';
import type { LengthUnit } from '@shared/units';
import { MEASUREMENT_FIELDS, measurementWarnings, type MeasurementSetView } from '@shared/schemas/measurement';
import { Badge } from '@/components/ui/badge';
import { Button, ButtonLink } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { deltaFormat, deltaSpoken, deltaVisible, fieldsTaken, valueFormat } from '../lib/set-compare';
import { dateFormat } from '@/lib/dates';

interface MeasurementHistoryProps {
  sets: MeasurementSetView[];
  unit: LengthUnit;
  canEdit: boolean;
  /** Where to correct a set (fitting mode prefilled with it). */
  correctHref: (setId: number) => string;
  onShowVersions: (set: MeasurementSetView) => void;
  /** The "Take measurements" action for the empty state. */
  takeAction: ReactNode;
}

/** Sets shown side by side before "Show older fittings". */
const RECENT_SETS = 4;

/**
 * Every fitting as a column, newest first; each value shows how it differs from the fitting
 * before it, highlighted when the difference is visible in the unit on screen.
 */
export function MeasurementHistory({ sets, unit, canEdit, correctHref, onShowVersions, takeAction }: MeasurementHistoryProps) {
  const [showAll, setShowAll] = useState(false);
  const [allFields, setAllFields] = useState(false);
  if (sets.length === 0) {
    return (
      <div className="rounded-xl border border-dashed border-line px-6 py-10 text-center" data-testid="measurements-empty">
        <h3 className="text-lg font-semibold">No measurements yet</h3>
        <p className="mx-auto mt-2 max-w-md text-muted">
          {canEdit ? 'Take the first set at the fitting: bust, hip and armhole depth are enough to draft a tank top.' : 'An owner takes the measurements at a fitting; they will appear here.'}
        </p>
        {canEdit && <div className="mt-6 flex justify-center">{takeAction}</div>}
      </div>
    );
  }
  const shown = showAll ? sets : sets.slice(0, RECENT_SETS);
  const fields = allFields ? MEASUREMENT_FIELDS : fieldsTaken(shown.map((s) => s.valuesMm));
  // Worked out here rather than taken from the server so the lengths quoted follow the unit on screen.
  const latestWarnings = sets[0] ? measurementWarnings(sets[0].valuesMm, unit) : [];
  return (
    <div>
      <div className="overflow-x-auto rounded-lg border border-line">
        <table className="w-full border-collapse text-left" data-testid="measurement-history">
          <caption className="sr-only">Measurement sets, newest fitting first, with the difference from the fitting before each</caption>
          <thead>
            <tr className="bg-surface align-top">
              <th scope="col" className="min-w-44 px-4 py-3 text-sm font-semibold">
                Measurement
              </th>
              {shown.map((set, i) => (
                <th key={set.setId} scope="col" className="min-w-40 border-l border-line px-4 py-3 text-right text-sm font-normal" data-testid="set-column">
                  <span className="num block text-base font-semibold">{dateFormat(set.takenAt)}</span>
                  <span className="block text-muted">by {set.takenBy.name}</span>
                  <span className="mt-1 flex flex-wrap justify-end gap-1">
                    {i === 0 && <Badge>Latest</Badge>}
                    {set.versionCount > 1 && <Badge>Corrected: version {set.version}</Badge>}
                  </span>
                  <span className="mt-2 flex flex-wrap justify-end gap-1">
                    {set.versionCount > 1 && (
                      <Button compact variant="ghost" onClick={() => onShowVersions(set)}>
                        Versions<span className="sr-only"> of the fitting of {dateFormat(set.takenAt)}</span>
                      </Button>
                    )}
                    {canEdit && (
                      <ButtonLink compact to={correctHref(set.setId)} data-testid="correct-set">
                        Correct<span className="sr-only"> the fitting of {dateFormat(set.takenAt)}</span>
                      </ButtonLink>
                    )}
                  </span>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {fields.map((field) => (
              <tr key={field.key} className="border-t border-line">
                <th scope="row" className="px-4 py-2 text-sm font-medium">
                  {field.label}
                </th>
                {shown.map((set, i) => {
                  const mm = set.valuesMm[field.key];
                  const before = sets[sets.indexOf(set) + 1]?.valuesMm[field.key];
                  const delta = mm !== undefined && before !== undefined ? mm - before : undefined;
                  const changed = delta !== undefined && deltaVisible(delta, unit);
                  return (
                    <td
                      key={set.setId}
                      className={cx('num border-l border-line px-4 py-2 text-right', changed && 'bg-warn/5')}
                      data-field={field.key}
                      data-changed={changed || undefined}
                    >
                      <span className={cx(i === 0 ? 'text-lg font-semibold' : 'text-base', mm === undefined && 'text-muted')}>{valueFormat(mm, unit)}</span>
                      {changed && delta !== undefined && (
                        <span className="ml-2 rounded-md bg-warn/10 px-1.5 py-0.5 text-sm font-semibold text-warn" data-testid="delta">
                          <span aria-hidden>{deltaFormat(delta, unit)}</span>
                          <span className="sr-only">, {deltaSpoken(delta, unit)} since the fitting before</span>
                        </span>
                      )}
                    </td>
                  );
                })}
              </tr>
            ))}
            <tr className="border-t border-line align-top">
              <th scope="row" className="px-4 py-2 text-sm font-medium">
                Notes
              </th>
              {shown.map((set) => (
                <td key={set.setId} className="max-w-56 border-l border-line px-4 py-2 text-right text-sm text-muted">
                  {set.notes ?? '—'}
                </td>
              ))}
            </tr>
          </tbody>
        </table>
      </div>
      <div className="mt-3 flex flex-wrap justify-end gap-2">
        {fields.length < MEASUREMENT_FIELDS.length || allFields ? (
          <Button compact onClick={() => setAllFields((v) => !v)}>
            {allFields ? 'Show the measurements taken only' : `Show all ${MEASUREMENT_FIELDS.length} measurements`}
          </Button>
        ) : null}
        {sets.length > RECENT_SETS && (
          <Button compact onClick={() => setShowAll((v) => !v)}>
            {showAll ? 'Show the latest fittings only' : `Show all ${sets.length} fittings`}
          </Button>
        )}
      </div>
      {latestWarnings.length > 0 && (
        <div className="mt-4 rounded-lg border border-warn/40 bg-warn/5 px-4 py-3 text-sm" role="note" data-testid="history-warnings">
          <p className="font-semibold text-warn">Worth a second look at the next fitting</p>
          <ul className="mt-1 list-disc space-y-1 pl-5 text-ink">
            {latestWarnings.map((w) => (
              <li key={`${w.field}-${w.code}`}>{w.message}</li>
            ))}
          </ul>
        </div>
      )}
      <p className="mt-3 text-sm text-muted">
        A highlighted value changed since the fitting before it; the change is shown beside it (+ larger, − smaller).
      </p>
    </div>
  );
}
