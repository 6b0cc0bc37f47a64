import type { LengthUnit } from '@shared/units';
import { MEASUREMENT_FIELDS } from '@shared/schemas/measurement';
import { cx } from '@/components/ui/cx';
import { deltaFormat, deltaSpoken, fieldsTaken, setDifferences, valueFormat, type ValuesMm } from '../lib/set-compare';

interface SetComparisonProps {
  caption: string;
  current: ValuesMm;
  currentLabel: string;
  previous: ValuesMm | undefined;
  previousLabel: string;
  unit: LengthUnit;
  /** Fields with something to check, marked in their row. */
  flagged?: ReadonlySet<string>;
  onFieldClick?: (key: string) => void;
}

/** Two sets side by side, every visible difference highlighted and spelled out. */
export function SetComparison({ caption, current, currentLabel, previous, previousLabel, unit, flagged, onFieldClick }: SetComparisonProps) {
  const shown = new Set(fieldsTaken(previous ? [current, previous] : [current]).map((f) => f.key));
  const rows = setDifferences(current, previous, unit).filter((row) => shown.has(row.field.key));
  const left = MEASUREMENT_FIELDS.length - rows.length;
  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-panel">
      <table className="w-full border-collapse text-left" data-testid="set-comparison">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="bg-surface text-sm">
            <th scope="col" className="px-4 py-2 font-semibold">
              Measurement
            </th>
            <th scope="col" className="px-4 py-2 text-right font-semibold">
              {currentLabel}
            </th>
            {previous && (
              <>
                <th scope="col" className="px-4 py-2 text-right font-semibold">
                  {previousLabel}
                </th>
                <th scope="col" className="px-4 py-2 text-right font-semibold">
                  Difference
                </th>
              </>
            )}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.field.key} className={cx('border-t border-line', row.changed && 'bg-warn/5')} data-changed={row.changed || undefined}>
              <th scope="row" className="px-4 py-1.5 text-sm font-medium">
                {onFieldClick ? (
                  <button type="button" onClick={() => onFieldClick(row.field.key)} className="min-h-touch text-left underline-offset-4 hover:underline">
                    {row.field.label}
                  </button>
                ) : (
                  row.field.label
                )}
                {row.field.requiredForTank && <span className="ml-1 text-muted">(needed)</span>}
                {flagged?.has(row.field.key) && <span className="ml-2 text-xs font-semibold text-warn">check</span>}
              </th>
              <td className="num px-4 py-1.5 text-right text-lg font-semibold" data-field={row.field.key}>
                {valueFormat(row.currentMm, unit)}
              </td>
              {previous && (
                <>
                  <td className="num px-4 py-1.5 text-right text-muted">{valueFormat(row.previousMm, unit)}</td>
                  <td className="num px-4 py-1.5 text-right">
                    {row.deltaMm === undefined ? (
                      <span className="text-muted">—</span>
                    ) : row.changed ? (
                      <span className="rounded-md bg-warn/10 px-2 py-0.5 font-semibold text-warn" data-testid="delta">
                        <span aria-hidden>{deltaFormat(row.deltaMm, unit)}</span>
                        <span className="sr-only">{deltaSpoken(row.deltaMm, unit)}</span>
                      </span>
                    ) : (
                      <span className="text-muted">no change</span>
                    )}
                  </td>
                </>
              )}
            </tr>
          ))}
        </tbody>
      </table>
      {left > 0 && (
        <p className="border-t border-line px-4 py-2 text-sm text-muted">
          {left} optional {left === 1 ? 'measurement' : 'measurements'} not taken{previous ? ' in either set' : ''} left out.
        </p>
      )}
    </div>
  );
}
