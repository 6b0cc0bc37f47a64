import { lengthFormat, type LengthUnit } from '@shared/units';
import type { FabricView } from '@shared/schemas/fabric';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import type { FabricFormValues } from './fabric-form';

interface FabricConflictProps {
  mine: FabricFormValues;
  current: FabricView;
  unit: LengthUnit;
  pending: boolean;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
}

const text = (v: unknown) => (v === null || v === undefined || v === '' ? '—' : String(v));

/** Someone saved the fabric while it was being edited: both copies, so nothing is lost. */
export function FabricConflict({ mine, current, unit, pending, onKeepMine, onTakeTheirs }: FabricConflictProps) {
  const rows: [string, string, string][] = [
    ['Name', text(mine.name), current.name],
    ['Fibre content', text(mine.fibreContent), text(current.fibreContent)],
    ['Width', mine.width ? `${text(mine.width)} ${/[a-z"″]\s*$/i.test(String(mine.width)) ? '' : unit}`.trim() : '—', current.widthMm === null ? '—' : lengthFormat(current.widthMm, unit)],
    ['Weight (g/m²)', text(mine.weightGsm), text(current.weightGsm)],
    ['Crosswise stretch (%)', text(mine.stretchCrosswise), String(current.stretchCrosswise)],
    ['Lengthwise stretch (%)', text(mine.stretchLengthwise), text(current.stretchLengthwise)],
    ['Recovery', text(mine.recovery), current.recovery],
    ['Notes', text(mine.notes), text(current.notes)],
  ];
  return (
    <Alert tone="warn" title="Someone else saved this fabric while you were editing">
      <p>Your changes are not saved yet. Compare the two copies and choose which to keep.</p>
      <table className="mt-3 w-full border-collapse text-left text-sm" data-testid="fabric-conflict">
        <thead>
          <tr>
            <th scope="col" className="py-1 pr-3 font-medium text-muted">Field</th>
            <th scope="col" className="py-1 pr-3 font-semibold">Your copy</th>
            <th scope="col" className="py-1 font-semibold">Saved copy</th>
          </tr>
        </thead>
        <tbody>
          {rows.map(([label, a, b]) => (
            <tr key={label} className={cx('border-t border-line align-top', a !== b && 'bg-warn/5')}>
              <th scope="row" className="py-2 pr-3 font-medium">{label}</th>
              <td className="num whitespace-pre-wrap py-2 pr-3">{a}</td>
              <td className="num whitespace-pre-wrap py-2">{b}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <div className="mt-4 flex flex-wrap gap-3">
        <Button variant="primary" onClick={onKeepMine} pending={pending} pendingLabel="Saving…">Save my copy</Button>
        <Button onClick={onTakeTheirs} disabled={pending}>Use the saved copy</Button>
      </div>
    </Alert>
  );
}
