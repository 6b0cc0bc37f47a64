import type { ReactNode } from 'react';
import { cx } from './cx';

export type BadgeTone = 'neutral' | 'accent' | 'danger' | 'warn';

export interface BadgeProps {
  tone?: BadgeTone;
  children: ReactNode;
  className?: string;
}

const TONES: Record<BadgeTone, string> = {
  neutral: 'border-line bg-surface text-ink',
  accent: 'border-accent/30 bg-accent-soft text-accent-strong',
  danger: 'border-danger/30 bg-danger/5 text-danger',
  warn: 'border-warn/30 bg-warn/5 text-warn',
};

/** A short label such as a role or a state; its text says what it means. */
export function Badge({ tone = 'neutral', children, className }: BadgeProps) {
  return (
    <span className={cx('inline-flex items-center rounded-full border px-2.5 py-0.5 text-xs font-medium', TONES[tone], className)}>
      {children}
    </span>
  );
}
