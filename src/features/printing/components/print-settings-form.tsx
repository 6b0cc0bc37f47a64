import { PAPERS_FOR_KIND } from '@shared/engine/export/pdf-options';
import type { PaperId } from '@shared/engine/layout/tiling-paper';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import type { DisplayUnit } from '@/lib/unit';
import { ORIENTATION_CHOICES, paperLabel, type PrintFieldErrors, type PrintOrientation, type PrintSettings } from '../lib/print-settings';
import { SegmentedChoice } from './segmented-choice';

export interface PrintSettingsFormProps {
  settings: PrintSettings;
  onChange: (next: PrintSettings) => void;
  errors: PrintFieldErrors;
  unit: DisplayUnit;
  pieces: readonly { id: string; name: string; cutNote: string }[];
  disabled: boolean;
}

const OVERLAP_HINT: Record<DisplayUnit, string> = {
  in: 'Strip shared by neighbouring pages, to trim and tape: 1/4 in or more, e.g. 1/2 or 3/4 in.',
  cm: 'Strip shared by neighbouring pages, to trim and tape: 6.4 mm or more, e.g. 1.3 cm or 2 cm.',
};

/** Paper, orientation, overlap (tiles only) and the pieces to print. */
export function PrintSettingsForm({ settings, onChange, errors, unit, pieces, disabled }: PrintSettingsFormProps) {
  const set = (patch: Partial<PrintSettings>) => onChange({ ...settings, ...patch });
  const togglePiece = (id: string, on: boolean) => {
    const chosen = new Set(settings.pieceIds);
    if (on) chosen.add(id);
    else chosen.delete(id);
    // Keep the draft's order of pieces, whatever order they were ticked in.
    set({ pieceIds: pieces.map((p) => p.id).filter((p) => chosen.has(p)) });
  };
  return (
    <fieldset disabled={disabled} className="flex flex-col gap-4">
      <legend className="sr-only">Print settings</legend>
      <SelectField
        label="Paper"
        value={settings.paper}
        onChange={(e) => set({ paper: e.target.value as PaperId })}
        options={PAPERS_FOR_KIND[settings.kind].map((id) => ({ value: id, label: paperLabel(id) }))}
        error={errors.paper}
        data-testid="print-paper"
      />
      {settings.kind !== 'ticket' && (
        <SegmentedChoice<PrintOrientation>
          legend="Orientation"
          value={settings.orientation}
          options={ORIENTATION_CHOICES}
          onChange={(orientation) => set({ orientation })}
          testId="print-orientation"
        />
      )}
      {errors.orientation && <p className="text-sm font-medium text-danger">{errors.orientation}</p>}
      {settings.kind === 'tiles' && (
        <TextField
          label="Overlap"
          value={settings.overlap}
          onChange={(e) => set({ overlap: e.target.value })}
          hint={OVERLAP_HINT[unit]}
          error={errors.overlap}
          inputMode="decimal"
          autoComplete="off"
          data-testid="print-overlap"
        />
      )}
      <fieldset className="flex flex-col gap-1.5">
        <legend className="mb-1.5 text-sm font-medium text-ink">Pieces</legend>
        <div className="flex flex-wrap gap-2">
          {pieces.map((p) => (
            <label
              key={p.id}
              className="flex min-h-touch cursor-pointer items-center gap-2 rounded-lg border border-line bg-panel px-3 text-sm has-[:checked]:border-accent has-[:checked]:bg-accent-soft"
            >
              <input
                type="checkbox"
                className="h-5 w-5 accent-[#1f6f66]"
                checked={settings.pieceIds.includes(p.id)}
                onChange={(e) => togglePiece(p.id, e.target.checked)}
                aria-describedby={errors.pieceIds ? 'print-pieces-error' : undefined}
                data-testid={`print-piece-${p.id}`}
              />
              <span className="font-medium">{p.name}</span>
              <span className="text-muted">{p.cutNote}</span>
            </label>
          ))}
        </div>
        {errors.pieceIds && (
          <p id="print-pieces-error" className="text-sm font-medium text-danger">
            {errors.pieceIds}
          </p>
        )}
      </fieldset>
    </fieldset>
  );
}
