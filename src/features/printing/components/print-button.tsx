import { lazy, Suspense, useState } from 'react';
import type { PdfKind } from '@shared/engine/export/pdf-options';
import type { DraftDto } from '@shared/schemas/draft-dto';
import { Button, type ButtonVariant } from '@/components/ui/button';
import type { PrintStudio } from './print-dialog';

// The dialog (and the tiling it previews with) loads on the first click; jsPDF only when printing.
const PrintDialog = lazy(() => import('./print-dialog').then((m) => ({ default: m.PrintDialog })));

export interface PrintButtonProps {
  draftId: number;
  /** The workspace's copy of the draft, when it has one. */
  draft?: DraftDto;
  /** True while the workspace shows changes not saved yet (the dialog prints what is saved). */
  unsaved?: boolean;
  studio: PrintStudio;
  /** Which document the dialog opens on. */
  kind?: PdfKind;
  label?: string;
  /** Accessible name when the label alone is ambiguous (a row of the work queue). */
  ariaLabel?: string;
  variant?: ButtonVariant;
  compact?: boolean;
}

/** Opens the print dialog for one draft. */
export function PrintButton({ draftId, draft, unsaved = false, studio, kind = 'tiles', label = 'Print…', ariaLabel, variant, compact = true }: PrintButtonProps) {
  const [open, setOpen] = useState(false);
  const [opened, setOpened] = useState(false);
  return (
    <>
      <Button
        compact={compact}
        variant={variant}
        aria-label={ariaLabel}
        aria-haspopup="dialog"
        onClick={() => {
          setOpened(true);
          setOpen(true);
        }}
      >
        {label}
      </Button>
      {opened && (
        <Suspense fallback={<span role="status" className="sr-only">Opening the print dialog…</span>}>
          <PrintDialog open={open} onClose={() => setOpen(false)} draftId={draftId} draft={draft} unsaved={unsaved} studio={studio} initialKind={kind} />
        </Suspense>
      )}
    </>
  );
}
