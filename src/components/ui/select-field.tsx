import type { ComponentProps, ReactNode } from 'react';
import { controlClasses, Field } from './field';
import { cx } from './cx';

export interface SelectOption {
  value: string;
  label: string;
  disabled?: boolean;
}

export interface SelectFieldProps extends Omit<ComponentProps<'select'>, 'children'> {
  label: ReactNode;
  options: readonly SelectOption[];
  hint?: ReactNode;
  error?: string;
  optional?: boolean;
  className?: string;
  selectClassName?: string;
}

/** A labelled native select (keyboard and touch friendly everywhere) with its hint and error. */
export function SelectField({ label, options, hint, error, optional, id, className, selectClassName, ...select }: SelectFieldProps) {
  return (
    <Field label={label} hint={hint} error={error} optional={optional} id={id} className={className}>
      {(ids) => (
        <select
          id={ids.id}
          aria-invalid={ids.invalid || undefined}
          aria-describedby={ids.describedBy}
          className={cx(controlClasses(ids.invalid), 'pr-8', selectClassName)}
          {...select}
        >
          {options.map((o) => (
            <option key={o.value} value={o.value} disabled={o.disabled}>
              {o.label}
            </option>
          ))}
        </select>
      )}
    </Field>
  );
}
