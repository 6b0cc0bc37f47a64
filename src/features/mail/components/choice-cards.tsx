import { useId } from 'react';
import { cx } from '@/components/ui/cx';

export interface ChoiceCard<T extends string> {
  value: T;
  label: string;
  /** Said under the label; for a disabled choice, why it cannot be chosen. */
  hint: string;
  disabled?: boolean;
}

export interface ChoiceCardsProps<T extends string> {
  legend: string;
  value: T;
  options: readonly ChoiceCard<T>[];
  onChange: (value: T) => void;
  /** Shown under the group and read with its choices. */
  error?: string;
  columns?: 2 | 3;
  testId?: string;
}

/**
 * A radio group drawn as large cards, each with a line of explanation: arrow keys move the
 * choice, a disabled card says why, and an error is read with every choice.
 */
export function ChoiceCards<T extends string>({ legend, value, options, onChange, error, columns = 3, testId }: ChoiceCardsProps<T>) {
  const name = useId();
  const errorId = `${name}-error`;
  return (
    <fieldset className="flex flex-col gap-1.5" data-testid={testId}>
      <legend className="mb-1.5 text-sm font-medium text-ink">{legend}</legend>
      <div className={cx('grid gap-2', columns === 3 ? 'sm:grid-cols-3' : 'sm:grid-cols-2')}>
        {options.map((o) => {
          const on = value === o.value;
          return (
            <label
              key={o.value}
              className={cx(
                'flex min-h-touch items-start gap-3 rounded-lg border px-3 py-2.5 text-sm',
                'has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-accent',
                o.disabled ? 'cursor-not-allowed border-line bg-surface' : 'cursor-pointer hover:border-muted',
                on ? 'border-accent bg-accent-soft' : 'border-line bg-panel',
              )}
            >
              <input
                type="radio"
                name={name}
                value={o.value}
                checked={on}
                disabled={o.disabled}
                onChange={() => onChange(o.value)}
                aria-describedby={error ? errorId : undefined}
                className="mt-0.5 h-5 w-5 shrink-0 accent-[#1f6f66]"
              />
              <span className="min-w-0">
                <span className={cx('block font-semibold', o.disabled ? 'text-muted' : 'text-ink')}>{o.label}</span>
                <span className="block break-words text-muted">{o.hint}</span>
              </span>
            </label>
          );
        })}
      </div>
      {error && (
        <p id={errorId} className="text-sm font-medium text-danger">
          {error}
        </p>
      )}
    </fieldset>
  );
}
