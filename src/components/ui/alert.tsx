import type { ReactNode } from 'react';
import { cx } from './cx';

export type AlertTone = 'error' | 'success' | 'info' | 'warn';

export interface AlertProps {
  tone?: AlertTone;
  title?: ReactNode;
  children?: ReactNode;
  className?: string;
  /** Set false when the alert sits inside a live region of its own (default true). */
  announce?: boolean;
}

const TONES: Record<AlertTone, string> = {
  error: 'border-danger/40 bg-danger/5 text-danger',
  success: 'border-accent/40 bg-accent-soft text-accent-strong',
  info: 'border-line bg-surface text-ink',
  warn: 'border-warn/40 bg-warn/5 text-warn',
};

/**
 * A message box. Errors are announced at once (role="alert"); other tones politely
 * (role="status"). Tone is also carried by the words, never by colour alone.
 */
export function Alert({ tone = 'info', title, children, className, announce = true }: AlertProps) {
  return (
    <div role={announce ? (tone === 'error' ? 'alert' : 'status') : undefined} className={cx('rounded-lg border px-4 py-3 text-sm', TONES[tone], className)}>
      {title && <p className="font-semibold">{title}</p>}
      {children && <div className={cx(Boolean(title) && 'mt-1', 'text-ink')}>{children}</div>}
    </div>
  );
}
