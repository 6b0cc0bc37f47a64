import { Spinner } from '@/components/ui/spinner';
import { PDF_STAGES, STAGE_WORDS, type PdfStage } from '../lib/pdf-make';

/** Which step of making the PDF is running, as a bar and in words (announced politely). */
export function PrintProgress({ stage }: { stage: PdfStage }) {
  const step = PDF_STAGES.indexOf(stage) + 1;
  return (
    <div className="flex flex-col gap-2 rounded-lg border border-line bg-surface px-4 py-3" data-testid="print-progress">
      <p role="status" aria-live="polite" className="flex items-center gap-2 text-sm font-medium text-ink">
        <Spinner />
        {STAGE_WORDS[stage]} <span className="num text-muted">(step {step} of {PDF_STAGES.length})</span>
      </p>
      <progress className="h-2 w-full accent-[#1f6f66]" max={PDF_STAGES.length} value={step - 0.5} aria-label="Making the PDF" />
    </div>
  );
}
