import type { ComponentProps, ReactNode } from 'react';
import { controlClasses, Field } from './field';
import { cx } from './cx';

export interface TextFieldProps extends Omit<ComponentProps<'input'>, 'children'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  optional?: boolean;
  /** A unit or word shown after the input, e.g. "in". */
  suffix?: ReactNode;
  /** Classes for the wrapper (layout), not the input. */
  className?: string;
  inputClassName?: string;
}

/**
 * A labelled input with its hint and error. Spread react-hook-form's `register(...)` into it:
 * `ref` is an ordinary prop in React 19.
 */
export function TextField({ label, hint, error, optional, suffix, id, className, inputClassName, ...input }: TextFieldProps) {
  return (
    <Field label={label} hint={hint} error={error} optional={optional} id={id} className={className}>
      {(ids) => {
        const control = (
          <input
            id={ids.id}
            aria-invalid={ids.invalid || undefined}
            aria-describedby={ids.describedBy}
            className={cx(controlClasses(ids.invalid), inputClassName)}
            {...input}
          />
        );
        if (!suffix) return control;
        return (
          <div className="flex items-center gap-2">
            {control}
            <span className="shrink-0 text-sm text-muted">{suffix}</span>
          </div>
        );
      }}
    </Field>
  );
}
