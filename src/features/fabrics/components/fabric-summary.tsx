import { lengthFormat, type LengthUnit } from '@shared/units';
import type { FabricView } from '@shared/schemas/fabric';
import { Card } from '@/components/ui/card';
import { percentFormat } from '../lib/stretch-test';

const RECOVERY_LABEL = { good: 'Good', fair: 'Fair', poor: 'Poor' } as const;

/** A fabric read-only, for cutters. */
export function FabricSummary({ fabric, unit }: { fabric: FabricView; unit: LengthUnit }) {
  const rows: [string, string, boolean][] = [
    ['Fibre content', fabric.fibreContent ?? '—', false],
    ['Width', fabric.widthMm === null ? '—' : lengthFormat(fabric.widthMm, unit), true],
    ['Weight', fabric.weightGsm === null ? '—' : `${fabric.weightGsm} g/m²`, true],
    ['Crosswise stretch', `${percentFormat(fabric.stretchCrosswise)} %`, true],
    ['Lengthwise stretch', fabric.stretchLengthwise === null ? '—' : `${percentFormat(fabric.stretchLengthwise)} %`, true],
    ['Recovery', RECOVERY_LABEL[fabric.recovery], false],
  ];
  return (
    <Card title="Details">
      <dl className="grid gap-4 sm:grid-cols-2">
        {rows.map(([label, value, numeric]) => (
          <div key={label}>
            <dt className="text-sm font-medium text-muted">{label}</dt>
            <dd className={`mt-1 text-lg ${numeric ? 'num font-semibold' : ''}`}>{value}</dd>
          </div>
        ))}
        <div className="sm:col-span-2">
          <dt className="text-sm font-medium text-muted">Notes</dt>
          <dd className="mt-1 whitespace-pre-wrap">{fabric.notes ?? 'No notes'}</dd>
        </div>
      </dl>
    </Card>
  );
}
