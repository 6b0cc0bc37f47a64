import { useId } from 'react';
import { cx } from '@/components/ui/cx';

export interface SegmentedChoiceProps<T extends string> {
  legend: string;
  value: T;
  options: readonly { value: T; label: string; hint?: string }[];
  onChange: (value: T) => void;
  /** Show each option's hint under its label (wider buttons). */
  withHints?: boolean;
  testId?: string;
}

/**
 * A radio group drawn as a row of large buttons: arrow keys move the choice, a screen reader
 * says which one is on, and a tap anywhere on a button picks it.
 */
export function SegmentedChoice<T extends string>({ legend, value, options, onChange, withHints = false, testId }: SegmentedChoiceProps<T>) {
  const name = useId();
  return (
    <fieldset className="flex flex-col gap-1.5" data-testid={testId}>
      <legend className="mb-1.5 text-sm font-medium text-ink">{legend}</legend>
      <div className={cx('grid gap-1 rounded-lg border border-line bg-surface p-1', withHints ? 'sm:grid-cols-3' : 'grid-cols-3')}>
        {options.map((o) => (
          <label
            key={o.value}
            className={cx(
              'relative flex min-h-touch cursor-pointer flex-col justify-center rounded-md px-3 py-1.5 text-sm',
              'has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-accent',
              value === o.value ? 'bg-accent text-white' : 'text-ink hover:bg-panel',
            )}
          >
            <input
              type="radio"
              name={name}
              value={o.value}
              checked={value === o.value}
              onChange={() => onChange(o.value)}
              className="absolute inset-0 m-0 cursor-pointer appearance-none opacity-0"
            />
            <span className="font-semibold">{o.label}</span>
            {withHints && o.hint && <span className={cx('text-xs', value === o.value ? 'text-white/90' : 'text-muted')}>{o.hint}</span>}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
