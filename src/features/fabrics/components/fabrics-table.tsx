import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { lengthFormat, type LengthUnit } from '@shared/units';
import { negativeEaseRecommend, type FabricView } from '@shared/schemas/fabric';
import { Table, Td, Th } from '@/components/ui/table';
import { percentFormat } from '../lib/stretch-test';

interface FabricsTableProps {
  fabrics: FabricView[];
  unit: LengthUnit;
  fabricHref: (id: number) => string;
  /** A small swatch picture shown before the name (the screen supplies it). */
  swatch?: (fabric: FabricView) => ReactNode;
}

const RECOVERY_LABEL = { good: 'Good', fair: 'Fair', poor: 'Poor' } as const;

/** The studio's knits with their stretch and the negative ease each suits. */
export function FabricsTable({ fabrics, unit, fabricHref, swatch }: FabricsTableProps) {
  return (
    <Table caption="Fabrics" captionHidden className="bg-panel">
      <thead>
        <tr>
          <Th>Name</Th>
          <Th>Fibre content</Th>
          <Th className="text-right">Width</Th>
          <Th className="text-right">Weight</Th>
          <Th className="text-right">Crosswise stretch</Th>
          <Th className="text-right">Lengthwise stretch</Th>
          <Th>Recovery</Th>
          <Th className="text-right">Negative ease</Th>
        </tr>
      </thead>
      <tbody>
        {fabrics.map((f) => {
          const ease = negativeEaseRecommend(f.stretchCrosswise, f.recovery);
          return (
            <tr key={f.id} className="hover:bg-surface/60">
              <Td>
                <Link to={fabricHref(f.id)} className="inline-flex min-h-touch items-center gap-3 font-semibold underline-offset-4 hover:underline">
                  {swatch?.(f)}
                  {f.name}
                </Link>
              </Td>
              <Td className="text-muted">{f.fibreContent ?? '—'}</Td>
              <Td className="num whitespace-nowrap text-right">{f.widthMm === null ? '—' : lengthFormat(f.widthMm, unit)}</Td>
              <Td className="num whitespace-nowrap text-right">{f.weightGsm === null ? '—' : `${f.weightGsm} g/m²`}</Td>
              <Td className="num whitespace-nowrap text-right text-base font-semibold">{percentFormat(f.stretchCrosswise)} %</Td>
              <Td className="num whitespace-nowrap text-right">{f.stretchLengthwise === null ? '—' : `${percentFormat(f.stretchLengthwise)} %`}</Td>
              <Td>{RECOVERY_LABEL[f.recovery]}</Td>
              <Td className="num whitespace-nowrap text-right font-semibold">{ease.stable ? 'none (stable)' : `−${percentFormat(ease.negativeEasePct)} %`}</Td>
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}
