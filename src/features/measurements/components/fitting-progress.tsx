import type { MeasurementField } from '@shared/schemas/measurement';
import { cx } from '@/components/ui/cx';

export interface FittingStepState {
  filled: boolean;
  error: boolean;
  warning: boolean;
}

interface FittingProgressProps {
  fields: readonly MeasurementField[];
  states: FittingStepState[];
  /** The step on screen; `fields.length` is the review step. */
  current: number;
  onGo: (step: number) => void;
}

function stepStatus(field: MeasurementField, state: FittingStepState | undefined): string {
  if (state?.error) return 'not a length yet';
  if (state?.filled) return state.warning ? 'taken, check the warning' : 'taken';
  return field.requiredForTank ? 'needed, not taken yet' : 'optional, not taken';
}

/** Every measurement as a numbered step: taken, needed, or to check. Tap one to go to it. */
export function FittingProgress({ fields, states, current, onGo }: FittingProgressProps) {
  return (
    <nav aria-label="Measurements in this fitting">
      <ol className="flex flex-wrap gap-1.5">
        {fields.map((field, i) => {
          const state = states[i];
          const here = i === current;
          return (
            <li key={field.key}>
              <button
                type="button"
                onClick={() => onGo(i)}
                aria-current={here ? 'step' : undefined}
                aria-label={`${i + 1}. ${field.label}: ${stepStatus(field, state)}`}
                title={field.label}
                className={cx(
                  'num relative flex h-11 w-11 items-center justify-center rounded-lg border text-sm font-semibold',
                  here ? 'border-accent bg-accent text-white' : state?.filled ? 'border-ink/25 bg-surface text-ink' : 'border-line bg-panel text-ink',
                  state?.error && !here && 'border-danger text-danger',
                )}
              >
                {i + 1}
                {state?.filled && !state.error && (
                  <span aria-hidden className={cx('absolute left-1 top-0 text-xs', here ? 'text-white' : 'text-ink')}>
                    ✓
                  </span>
                )}
                {field.requiredForTank && !state?.filled && (
                  <span aria-hidden className={cx('absolute right-1 top-0.5 text-xs', here ? 'text-white' : 'text-ink')}>
                    *
                  </span>
                )}
                {(state?.error || state?.warning) && (
                  <span aria-hidden className={cx('absolute bottom-0 right-1 text-xs font-bold', state.error ? 'text-danger' : 'text-warn', here && 'text-white')}>
                    !
                  </span>
                )}
              </button>
            </li>
          );
        })}
        <li>
          <button
            type="button"
            onClick={() => onGo(fields.length)}
            aria-current={current === fields.length ? 'step' : undefined}
            className={cx(
              'flex h-11 items-center rounded-lg border px-4 text-sm font-semibold',
              current === fields.length ? 'border-accent bg-accent text-white' : 'border-line bg-panel text-ink',
            )}
          >
            Review and save
          </button>
        </li>
      </ol>
    </nav>
  );
}
