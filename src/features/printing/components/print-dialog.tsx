import { useMemo, useState } from 'react';
import { draft as engineDraft, draftToSvg, type Draft } from '@shared/engine';
import type { PdfKind } from '@shared/engine/export/pdf-options';
import type { DraftDto } from '@shared/schemas/draft-dto';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { LoadingState } from '@/components/ui/loading-state';
import { useDisplayUnit, type DisplayUnit } from '@/lib/unit';
import { usePrintDraft } from '../api/get-print-draft';
import { blobDownload, printDate, printFileName } from '../lib/file-download';
import { pdfMake, type PdfStage } from '../lib/pdf-make';
import { planSummary, printPlan } from '../lib/print-plan';
import { KIND_CHOICES, printOptions, settingsDefault, settingsForKind, type PrintFieldErrors, type PrintMeta, type PrintSettings } from '../lib/print-settings';
import { PrintAdvice } from './print-advice';
import { PrintPreview } from './print-preview';
import { PrintProgress } from './print-progress';
import { PrintSettingsForm } from './print-settings-form';
import { SegmentedChoice } from './segmented-choice';

/** The studio's name and paper, written on the pages and chosen first. */
export interface PrintStudio {
  name: string;
  defaultPaper: string;
}

export interface PrintDialogProps {
  open: boolean;
  onClose: () => void;
  draftId: number;
  /** The workspace's copy of the draft; without it the dialog reads the draft itself (the work queue). */
  draft?: DraftDto;
  /** True while the workspace shows changes not saved yet. */
  unsaved?: boolean;
  studio: PrintStudio;
  initialKind?: PdfKind;
}

const META_MAX = 120;
const clip = (s: string) => s.slice(0, META_MAX);
const UNIT_WORDS: Record<DisplayUnit, string> = { in: 'inches', cm: 'centimetres' };

function capitalised(message: string): string {
  return message.charAt(0).toUpperCase() + message.slice(1);
}

interface BodyProps {
  dto: DraftDto;
  drafted: Draft;
  studio: PrintStudio;
  initialKind: PdfKind;
  unsaved: boolean;
  onClose: () => void;
}

function PrintDialogBody({ dto, drafted, studio, initialKind, unsaved, onClose }: BodyProps) {
  const unit = useDisplayUnit();
  const pieces = drafted.pieces;
  const [settings, setSettings] = useState<PrintSettings>(() => settingsDefault(initialKind, studio.defaultPaper, unit, pieces.map((p) => p.id)));
  const [stage, setStage] = useState<PdfStage | null>(null);
  const [failed, setFailed] = useState<PrintFieldErrors | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const meta: PrintMeta = useMemo(
    () => ({ client: clip(dto.client.name), style: clip(dto.style.name), fabric: clip(dto.fabric.name), studio: clip(studio.name), date: printDate(new Date()) }),
    [dto, studio.name],
  );
  const checked = useMemo(() => printOptions(settings, unit, meta), [settings, unit, meta]);
  const plan = useMemo(() => (checked.ok ? printPlan(drafted, checked.options) : null), [checked, drafted]);
  const errors: PrintFieldErrors = { ...(checked.ok ? {} : checked.fields), ...(plan && !plan.ok ? plan.fields : {}), ...(failed ?? {}) };
  const ready = checked.ok && plan?.ok ? { options: checked.options, plan } : null;
  const busy = stage !== null;

  const change = (next: PrintSettings) => {
    setFailed(null);
    setSaved(null);
    setSettings(next);
  };

  const printPdf = async () => {
    if (!ready) return;
    setSaved(null);
    setFailed(null);
    try {
      const made = await pdfMake(drafted, ready.options, setStage);
      if (!made.ok) return setFailed(made.fields);
      const fileName = printFileName(dto.style.name, dto.client.name, settings.kind, settings.paper);
      blobDownload(made.blob, fileName);
      setSaved(`Saved ${fileName}: ${made.pageCount} ${made.pageCount === 1 ? 'page' : 'pages'}.`);
    } catch {
      setFailed({ options: 'The PDF could not be made. Check the connection (the PDF writer loads when you first print) and try again.' });
    } finally {
      setStage(null);
    }
  };

  const downloadSvg = () => {
    const svg = draftToSvg(drafted, { pieceIds: settings.pieceIds, title: `${dto.client.name} — ${dto.style.name}, revision ${dto.current.number}` });
    const fileName = printFileName(dto.style.name, dto.client.name, 'pieces', 'full-size', 'svg');
    blobDownload(new Blob([svg], { type: 'image/svg+xml' }), fileName);
    setSaved(`Saved ${fileName}: the pieces at full size (1 unit = 1 mm).`);
  };

  const summary = ready ? planSummary(ready.plan) : 'Correct the settings marked in red to see the pages.';
  return (
    <div className="flex flex-col gap-5">
      <p className="text-sm text-muted">
        {dto.approved?.revision === dto.current.number ? `Prints revision ${dto.current.number}, the approved one.` : `Prints revision ${dto.current.number} as saved.`} Lengths
        in {UNIT_WORDS[unit]}.
      </p>
      {unsaved && (
        <Alert tone="warn" title="Your latest changes are not saved">
          The pages show revision {dto.current.number} as saved. Close this, save, and print again to include your changes.
        </Alert>
      )}
      <SegmentedChoice<PdfKind>
        legend="What to print"
        value={settings.kind}
        options={KIND_CHOICES.map((k) => ({ value: k.kind, label: k.label, hint: k.hint }))}
        onChange={(kind) => change(settingsForKind(settings, kind, studio.defaultPaper))}
        withHints
        testId="print-kind"
      />
      <div className="grid gap-5 md:grid-cols-[minmax(0,20rem)_minmax(0,1fr)]">
        <PrintSettingsForm settings={settings} onChange={change} errors={errors} unit={unit} pieces={pieces} disabled={busy} />
        {ready ? (
          <PrintPreview plan={ready.plan} summary={summary} />
        ) : (
          <p className="rounded-lg border border-line bg-surface p-4 text-sm text-muted" data-testid="print-summary">
            {summary}
          </p>
        )}
      </div>
      <PrintAdvice kind={settings.kind} />
      {errors.options && <Alert tone="error">{capitalised(errors.options)}</Alert>}
      {busy && <PrintProgress stage={stage} />}
      {saved && (
        <Alert tone="success" className="num">
          {saved}
        </Alert>
      )}
      <div className="flex flex-wrap justify-end gap-3 border-t border-line pt-4">
        <Button variant="ghost" onClick={onClose} disabled={busy}>
          Close
        </Button>
        <Button onClick={downloadSvg} disabled={busy || settings.pieceIds.length === 0}>
          Download SVG
        </Button>
        <Button variant="primary" onClick={() => void printPdf()} disabled={!ready} pending={busy} pendingLabel="Making the PDF…" data-testid="print-download">
          Download PDF
        </Button>
      </div>
    </div>
  );
}

/**
 * The print dialog: tiled pages, the wide sheet or the cutting ticket; paper, orientation,
 * overlap and pieces; a preview of the page grid over the pieces with the page count (blank
 * pages hatched and left out), computed in the browser; then the PDF, made on the spot.
 */
export function PrintDialog({ open, onClose, draftId, draft: given, unsaved = false, studio, initialKind = 'tiles' }: PrintDialogProps) {
  const fetched = usePrintDraft(draftId, open && given === undefined);
  const dto = given ?? fetched.data;
  const drafted = useMemo(() => (dto ? engineDraft(dto.current.input) : null), [dto]);
  const title = dto ? `Print ${dto.client.name}, ${dto.style.name}` : 'Print';
  return (
    <Dialog open={open} onClose={onClose} title={title} className="max-w-5xl! text-base">
      {!dto && fetched.isError && (
        <Alert tone="error" title="The draft could not be loaded">
          {fetched.error.message}
        </Alert>
      )}
      {!dto && !fetched.isError && <LoadingState>Loading the draft…</LoadingState>}
      {drafted && !drafted.ok && (
        <Alert tone="error" title="This revision cannot be drawn">
          {drafted.errors.map((e) => e.message).join(' ')} Open the draft and save it again.
        </Alert>
      )}
      {dto && drafted?.ok && <PrintDialogBody dto={dto} drafted={drafted.draft} studio={studio} initialKind={initialKind} unsaved={unsaved} onClose={onClose} />}
    </Dialog>
  );
}
