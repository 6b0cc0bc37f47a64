import type { ReactNode } from 'react';

export interface PageHeaderProps {
  title: ReactNode;
  /** One or two sentences under the title. */
  description?: ReactNode;
  /** A small line above the title, e.g. the studio's name. */
  eyebrow?: ReactNode;
  actions?: ReactNode;
}

/** The page's one h1, with its introduction and main actions. */
export function PageHeader({ title, description, eyebrow, actions }: PageHeaderProps) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div className="min-w-0">
        {eyebrow && <p className="text-sm font-medium text-muted">{eyebrow}</p>}
        <h1 className="text-2xl font-semibold tracking-tight sm:text-3xl">{title}</h1>
        {description && <p className="mt-2 max-w-2xl text-muted">{description}</p>}
      </div>
      {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
    </div>
  );
}
