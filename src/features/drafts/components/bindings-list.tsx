import type { Binding } from '@shared/engine';
import { lengthFormat, type LengthUnit } from '@shared/units';

export interface BindingsListProps {
  bindings: Binding[];
  unit: LengthUnit;
}

/** Each opening's length and the strip to cut for it: length × width, how many, where the join goes. */
export function BindingsList({ bindings, unit }: BindingsListProps) {
  return (
    <ul className="space-y-3" data-testid="bindings">
      {bindings.map((b) => (
        <li key={b.id} className="text-sm">
          <p className="flex items-baseline justify-between gap-2">
            <span className="font-medium text-ink">{b.opening === 'neck' ? 'Neckline' : 'Armhole'} opening</span>
            <span className="num font-semibold text-ink">{lengthFormat(b.openingLength, unit)}</span>
          </p>
          <p className="num text-muted">
            Cut {b.count} {b.name.toLowerCase()}
            {b.count > 1 ? 's' : ''}: <span className="font-semibold text-ink">{lengthFormat(b.cutLength, unit)}</span> ×{' '}
            {lengthFormat(b.cutWidth, unit)}
          </p>
          <p className="text-xs text-muted">
            ratio {b.ratio.toFixed(2)} + {lengthFormat(b.joinAllowance, unit)} join at each end · join at {b.joinAt}
          </p>
        </li>
      ))}
    </ul>
  );
}
