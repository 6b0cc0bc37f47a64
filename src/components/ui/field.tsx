import { useId, type ReactNode } from 'react';
import { cx } from './cx';

/** The ids a control needs to point at its label, hint and error. */
export interface FieldIds {
  id: string;
  describedBy: string | undefined;
  invalid: boolean;
}

export interface FieldProps {
  label: ReactNode;
  /** Shown under the control (so side-by-side fields stay aligned); read with the control. */
  hint?: ReactNode;
  /** Shown under the control in the danger colour; marks the control invalid. */
  error?: string;
  /** Marks the label "optional" so required fields need no asterisk. */
  optional?: boolean;
  /** Use an id of your own (otherwise one is made). */
  id?: string;
  className?: string;
  /** Draws the control with the ids to put on it. */
  children: (ids: FieldIds) => ReactNode;
}

/** Label, control, error and hint, wired together for screen readers. */
export function Field({ label, hint, error, optional, id, className, children }: FieldProps) {
  const autoId = useId();
  const controlId = id ?? `field-${autoId}`;
  const hintId = hint ? `${controlId}-hint` : undefined;
  const errorId = error ? `${controlId}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <div className={cx('flex flex-col gap-1.5', className)}>
      <label htmlFor={controlId} className="text-sm font-medium text-ink">
        {label}
        {optional && <span className="ml-1 font-normal text-muted">(optional)</span>}
      </label>
      {children({ id: controlId, describedBy, invalid: Boolean(error) })}
      {error && (
        <p id={errorId} className="flex items-start gap-1.5 text-sm font-medium text-danger">
          <svg aria-hidden="true" viewBox="0 0 16 16" className="mt-0.5 h-4 w-4 shrink-0" fill="currentColor">
            <path d="M8 1a7 7 0 1 0 0 14A7 7 0 0 0 8 1Zm-.75 3.5h1.5v5h-1.5v-5Zm0 6.25h1.5v1.5h-1.5v-1.5Z" />
          </svg>
          <span>{error}</span>
        </p>
      )}
      {hint && (
        <p id={hintId} className="text-sm text-muted">
          {hint}
        </p>
      )}
    </div>
  );
}

/** The look shared by text inputs and selects; red border when invalid. */
export function controlClasses(invalid: boolean): string {
  return cx(
    'min-h-touch w-full rounded-lg border bg-panel px-3 text-base text-ink placeholder:text-muted/70',
    'disabled:cursor-not-allowed disabled:bg-surface disabled:text-muted',
    invalid ? 'border-danger' : 'border-line hover:border-muted',
  );
}
