import type { ComponentProps, ReactNode } from 'react';
import { Link, type LinkProps } from 'react-router';
import { cx } from './cx';
import { Spinner } from './spinner';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'ghost' | 'danger-ghost';

export interface ButtonLook {
  variant?: ButtonVariant;
  /** Stretch to the width of the container (forms on a phone). */
  block?: boolean;
  /** Less padding; the height stays a full touch target. */
  compact?: boolean;
}

const VARIANTS: Record<ButtonVariant, string> = {
  primary: 'bg-accent text-white hover:bg-accent-strong border border-transparent',
  secondary: 'bg-panel text-ink border border-line hover:bg-surface',
  danger: 'bg-danger text-white border border-transparent hover:brightness-90',
  ghost: 'bg-transparent text-ink border border-transparent hover:bg-surface',
  /** A quiet destructive action in a row of buttons; the confirmation uses `danger`. */
  'danger-ghost': 'bg-transparent text-danger border border-transparent hover:bg-danger/5',
};

/** The classes of a button, for links and other elements that must look like one. */
export function buttonClasses({ variant = 'secondary', block = false, compact = false }: ButtonLook = {}): string {
  return cx(
    'inline-flex min-h-touch min-w-touch items-center justify-center gap-2 rounded-lg font-medium transition-colors',
    'disabled:cursor-not-allowed disabled:opacity-60',
    compact ? 'px-3 text-sm' : 'px-5',
    block && 'w-full',
    VARIANTS[variant],
  );
}

export interface ButtonProps extends ComponentProps<'button'>, ButtonLook {
  /** While true the button is disabled, marked busy and shows a spinner with `pendingLabel`. */
  pending?: boolean;
  /** What the button says while pending, e.g. "Saving…" (defaults to its children). */
  pendingLabel?: ReactNode;
}

/** A button with a full touch target; `type` defaults to "button" so it never submits by accident. */
export function Button({
  variant,
  block,
  compact,
  pending = false,
  pendingLabel,
  disabled,
  className,
  children,
  type = 'button',
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      className={cx(buttonClasses({ variant, block, compact }), className)}
      {...rest}
    >
      {pending && <Spinner />}
      {pending ? (pendingLabel ?? children) : children}
    </button>
  );
}

export interface ButtonLinkProps extends LinkProps, ButtonLook {}

/** A router link that looks like a button (navigation, not an action). */
export function ButtonLink({ variant, block, compact, className, ...rest }: ButtonLinkProps) {
  return <Link className={cx(buttonClasses({ variant, block, compact }), className)} {...rest} />;
}
