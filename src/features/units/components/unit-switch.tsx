import { useId } from 'react';
import { cx } from '@/components/ui/cx';
import { DISPLAY_UNITS, displayUnitSet, useDisplayUnit, type DisplayUnit } from '@/lib/unit';

const NAMES: Record<DisplayUnit, string> = { in: 'Inches', cm: 'Centimetres' };

interface UnitSwitchProps {
  className?: string;
}

/**
 * Switches every length on every screen between inches and centimetres. A radio group, so
 * arrow keys move between the two and a screen reader says which one is on.
 */
export function UnitSwitch({ className }: UnitSwitchProps) {
  const unit = useDisplayUnit();
  const name = useId();
  return (
    <fieldset className={cx('inline-flex items-center gap-2', className)}>
      <legend className="sr-only">Show lengths in</legend>
      <span aria-hidden className="text-sm text-muted">
        Units
      </span>
      <div className="inline-flex rounded-lg border border-line bg-panel p-0.5">
        {DISPLAY_UNITS.map((u) => (
          <label
            key={u}
            className={cx(
              'relative flex min-h-touch min-w-touch cursor-pointer items-center justify-center rounded-md px-3 text-sm font-semibold',
              'has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-accent',
              unit === u ? 'bg-accent text-white' : 'text-ink hover:bg-surface',
            )}
          >
            <input
              type="radio"
              name={name}
              value={u}
              checked={unit === u}
              onChange={() => displayUnitSet(u)}
              // Invisible but covering the label, so a tap anywhere on it picks the unit.
              className="absolute inset-0 m-0 cursor-pointer appearance-none opacity-0"
              data-testid={`unit-${u}`}
            />
            <span aria-hidden>{u}</span>
            <span className="sr-only">{NAMES[u]}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
