import type { ComponentProps, ReactNode } from 'react';
import { cx } from './cx';

export interface TableProps {
  /** Says what the table lists; visible unless `captionHidden`. */
  caption: ReactNode;
  captionHidden?: boolean;
  children: ReactNode;
  className?: string;
}

/** A data table that scrolls sideways on narrow screens instead of squeezing its columns. */
export function Table({ caption, captionHidden = false, children, className }: TableProps) {
  return (
    // `relative` keeps visually hidden cells inside the scroller instead of widening the page.
    <div className={cx('relative overflow-x-auto rounded-lg border border-line', className)}>
      <table className="w-full border-collapse text-left text-sm">
        <caption className={cx(captionHidden ? 'sr-only' : 'px-4 py-3 text-left font-medium')}>{caption}</caption>
        {children}
      </table>
    </div>
  );
}

/** A column header (`scope="col"`, shaded) or a row header (`scope="row"`, like a cell). */
export function Th({ className, scope = 'col', ...rest }: ComponentProps<'th'>) {
  const look =
    scope === 'row'
      ? 'border-b border-line px-4 py-2 align-middle font-medium text-ink'
      : 'border-b border-line bg-surface px-4 py-3 font-semibold text-ink';
  return <th scope={scope} className={cx(look, className)} {...rest} />;
}

/** A data cell. */
export function Td({ className, ...rest }: ComponentProps<'td'>) {
  return <td className={cx('border-b border-line px-4 py-2 align-middle', className)} {...rest} />;
}
