import type { ReactNode } from 'react';

export interface BigFigureProps {
  label: string;
  value: string;
  /** Smaller lines under the figure (body girth, ease). */
  detail?: ReactNode;
  testId?: string;
}

/** A figure that matters: large, tabular, with its unit. */
export function BigFigure({ label, value, detail, testId }: BigFigureProps) {
  return (
    <div className="min-w-0">
      <dt className="text-xs font-semibold tracking-wide text-muted uppercase">{label}</dt>
      <dd className="num text-2xl font-semibold text-ink" data-testid={testId}>
        {value}
      </dd>
      {detail && <dd className="num text-sm text-muted">{detail}</dd>}
    </div>
  );
}
