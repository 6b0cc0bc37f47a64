import { useEffect, useId, useRef, type KeyboardEvent } from 'react';
import { lengthFormat, type LengthUnit } from '@shared/units';
import type { MeasurementField, MeasurementWarning } from '@shared/schemas/measurement';
import { Badge } from '@/components/ui/badge';
import { cx } from '@/components/ui/cx';
import { FRACTION_KEYS, fractionApply } from '../lib/fraction-keys';
import { deltaFormat, deltaSpoken, deltaVisible } from '../lib/set-compare';
import { dateFormat } from '@/lib/dates';

interface FittingFieldProps {
  field: MeasurementField;
  index: number;
  count: number;
  text: string;
  unit: LengthUnit;
  /** The typed text read into mm, when it is a length. */
  valueMm: number | undefined;
  /** Why the text is not an acceptable length (names the field). */
  error: string | undefined;
  /** Show the error now (after leaving the field or trying to save). */
  showError: boolean;
  warnings: MeasurementWarning[];
  previous: { mm: number | undefined; takenAt: string; label: string } | null;
  onTextChange: (text: string) => void;
  onNext: () => void;
  onPrevious: () => void;
}

/** One measurement at a time, in large type: what it is, the typed value, and how it compares. */
export function FittingField(props: FittingFieldProps) {
  const { field, index, count, text, unit, valueMm, error, showError, warnings, previous, onTextChange, onNext, onPrevious } = props;
  const inputRef = useRef<HTMLInputElement>(null);
  const inputId = useId();
  const definitionId = useId();
  const feedbackId = useId();

  useEffect(() => {
    inputRef.current?.focus({ preventScroll: true });
  }, [field.key]);

  const onKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    if ((event.key === 'Enter' && !event.shiftKey) || event.key === 'ArrowDown' || event.key === 'PageDown') {
      event.preventDefault();
      onNext();
    } else if ((event.key === 'Enter' && event.shiftKey) || event.key === 'ArrowUp' || event.key === 'PageUp') {
      event.preventDefault();
      onPrevious();
    }
  };

  const delta = valueMm !== undefined && previous?.mm !== undefined ? valueMm - previous.mm : undefined;
  const other: LengthUnit = unit === 'in' ? 'cm' : 'in';

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center gap-3">
        <span className="num text-sm font-medium text-muted">
          Measurement {index + 1} of {count}
        </span>
        {field.requiredForTank ? <Badge tone="neutral">Needed for a tank top</Badge> : <Badge>Optional</Badge>}
        <Badge>{field.kind === 'girth' ? 'Girth: round the body' : 'Length: along the body'}</Badge>
      </div>
      <div>
        <label htmlFor={inputId} className="text-3xl font-semibold tracking-tight">
          {field.label}
        </label>
        <p id={definitionId} className="mt-1.5 text-base text-ink">
          {field.definition}
        </p>
        <p className="mt-1 text-sm text-muted">{field.isoTerm ? `ISO 8559-1 term: ${field.isoTerm}` : 'Pattern-making measurement'}</p>
      </div>
      <div className="flex items-stretch gap-3">
        <input
          ref={inputRef}
          id={inputId}
          value={text}
          onChange={(e) => onTextChange(e.target.value)}
          onKeyDown={onKeyDown}
          inputMode="decimal"
          autoComplete="off"
          autoCorrect="off"
          spellCheck={false}
          enterKeyHint={index + 1 < count ? 'next' : 'done'}
          aria-invalid={(showError && Boolean(error)) || undefined}
          aria-describedby={`${definitionId} ${feedbackId}`}
          placeholder={unit === 'in' ? 'e.g. 36 1/2' : 'e.g. 92.5'}
          data-testid="fitting-input"
          className={cx(
            'num h-20 min-w-0 flex-1 rounded-xl border-2 bg-panel px-5 text-5xl font-semibold text-ink placeholder:text-2xl placeholder:font-normal placeholder:text-muted/60',
            showError && error ? 'border-danger' : 'border-line focus:border-accent',
          )}
        />
        <span className="flex items-center text-3xl font-medium text-muted" aria-hidden>
          {unit}
        </span>
      </div>
      {unit === 'in' && (
        <div className="flex flex-wrap gap-2" role="group" aria-label="Add a fraction of an inch">
          {FRACTION_KEYS.map((key) => (
            <button
              key={key.glyph}
              type="button"
              aria-label={`Add ${key.spoken}`}
              onClick={() => {
                onTextChange(fractionApply(text, key.glyph));
                inputRef.current?.focus();
              }}
              className="min-h-touch min-w-14 rounded-lg border border-line bg-panel text-xl font-medium hover:bg-surface"
            >
              {key.glyph}
            </button>
          ))}
        </div>
      )}
      <div id={feedbackId} aria-live="polite" className="flex flex-col gap-2">
        {showError && error ? (
          <p className="text-base font-medium text-danger" data-testid="fitting-error">
            {error}
          </p>
        ) : valueMm !== undefined ? (
          <p className="text-base text-muted">
            Reads as <span className="num font-semibold text-ink">{lengthFormat(valueMm, unit)}</span> ={' '}
            <span className="num">{lengthFormat(valueMm, other)}</span>
          </p>
        ) : null}
        {previous && (
          <p className="text-base text-muted" data-testid="fitting-previous">
            {previous.label} ({dateFormat(previous.takenAt)}):{' '}
            <span className="num font-semibold text-ink">{previous.mm === undefined ? 'not taken' : lengthFormat(previous.mm, unit)}</span>
            {delta !== undefined && (
              <span
                className={cx('num ml-2 rounded-md px-2 py-0.5 font-semibold', deltaVisible(delta, unit) ? 'bg-warn/10 text-warn' : 'text-muted')}
              >
                <span aria-hidden>{deltaVisible(delta, unit) ? deltaFormat(delta, unit) : 'no change'}</span>
                <span className="sr-only">{deltaSpoken(delta, unit)}</span>
              </span>
            )}
          </p>
        )}
        {warnings.map((w) => (
          <p key={w.code} role="status" className="rounded-lg border border-warn/40 bg-warn/5 px-3 py-2 text-sm text-ink" data-testid="fitting-warning">
            <span className="font-semibold text-warn">Check: </span>
            {w.message} You can still save it.
          </p>
        ))}
      </div>
    </div>
  );
}
