import { useEffect, useId, useRef, type ReactNode } from 'react';
import { cx } from './cx';

export interface DialogProps {
  open: boolean;
  /** Called on Escape, on the backdrop, and by the caller's own cancel button. */
  onClose: () => void;
  title: ReactNode;
  description?: ReactNode;
  children?: ReactNode;
  /** Buttons, right-aligned under the content. */
  footer?: ReactNode;
  className?: string;
}

/**
 * A modal on the native <dialog> element: the browser traps focus, makes the page behind
 * inert, closes on Escape and returns focus to the control that opened it.
 */
export function Dialog({ open, onClose, title, description, children, footer, className }: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const descriptionId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      aria-describedby={description ? descriptionId : undefined}
      onCancel={(event) => {
        event.preventDefault();
        onClose();
      }}
      onClick={(event) => {
        // A click on the backdrop lands on the dialog element itself.
        if (event.target === ref.current) onClose();
      }}
      className={cx(
        'm-auto w-[calc(100%-2rem)] max-w-lg rounded-xl border border-line bg-panel p-0 text-ink shadow-xl backdrop:bg-ink/40',
        className,
      )}
    >
      {open && (
        <div className="p-6">
          <h2 id={titleId} className="text-lg font-semibold tracking-tight">
            {title}
          </h2>
          {description && (
            <div id={descriptionId} className="mt-2 text-muted">
              {description}
            </div>
          )}
          {children && <div className="mt-4">{children}</div>}
          {footer && <div className="mt-6 flex flex-wrap justify-end gap-3">{footer}</div>}
        </div>
      )}
    </dialog>
  );
}
