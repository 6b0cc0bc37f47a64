import { useId, type ReactNode } from 'react';
import { cx } from './cx';

export interface CardProps {
  /** The card's heading; the section is labelled by it. */
  title?: ReactNode;
  /** Heading level in the page outline (default 2). */
  level?: 2 | 3;
  description?: ReactNode;
  /** Buttons or links shown at the right of the heading. */
  actions?: ReactNode;
  className?: string;
  children?: ReactNode;
}

/** A white panel on the neutral page: a section with an optional heading. */
export function Card({ title, level = 2, description, actions, className, children }: CardProps) {
  const headingId = useId();
  const Heading = level === 2 ? 'h2' : 'h3';
  return (
    <section aria-labelledby={title ? headingId : undefined} className={cx('rounded-xl border border-line bg-panel p-5 sm:p-6', className)}>
      {(title || actions) && (
        <div className="mb-4 flex flex-wrap items-start justify-between gap-3">
          <div className="min-w-0">
            {title && (
              <Heading id={headingId} className="text-lg font-semibold tracking-tight">
                {title}
              </Heading>
            )}
            {description && <p className="mt-1 text-sm text-muted">{description}</p>}
          </div>
          {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
        </div>
      )}
      {children}
    </section>
  );
}
