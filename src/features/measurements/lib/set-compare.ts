/**
 * Comparing two measurement sets for the screens: what changed since the previous fitting, in
 * the unit on screen. A difference counts as a change when it still shows once rounded to the
 * unit's display step (1/8 in or 1 mm), so what is highlighted is exactly what can be read.
 */
import { lengthFormat, type LengthUnit } from '@shared/units';
import { MEASUREMENT_FIELDS, type MeasurementKey, type MeasurementField } from '@shared/schemas/measurement';

/** Measurement values in mm, any of them possibly missing. */
export type ValuesMm = Partial<Record<MeasurementKey, number>>;

/** One measurement in a comparison. */
export interface SetDifference {
  field: MeasurementField;
  currentMm: number | undefined;
  previousMm: number | undefined;
  /** current − previous in mm, when both were taken. */
  deltaMm: number | undefined;
  /** The difference shows in `unit` (it does not round to zero). */
  changed: boolean;
}

/** "35 1/2 in" for a value, "—" for one not taken. */
export function valueFormat(mm: number | undefined, unit: LengthUnit): string {
  return mm === undefined ? '—' : lengthFormat(mm, unit);
}

/** A signed difference as shown: "+1/2 in", "−1.3 cm", or "0 in" when it rounds away. */
export function deltaFormat(deltaMm: number, unit: LengthUnit): string {
  const text = lengthFormat(Math.abs(deltaMm), unit);
  if (text.startsWith('0 ')) return text;
  return `${deltaMm > 0 ? '+' : '−'}${text}`;
}

/** The same difference in words, for screen readers: "up 1/2 in", "down 1.3 cm". */
export function deltaSpoken(deltaMm: number, unit: LengthUnit): string {
  const text = lengthFormat(Math.abs(deltaMm), unit);
  if (text.startsWith('0 ')) return 'no change';
  return `${deltaMm > 0 ? 'up' : 'down'} ${text}`;
}

/** True when a difference is visible once rounded for `unit`. */
export function deltaVisible(deltaMm: number, unit: LengthUnit): boolean {
  return !lengthFormat(Math.abs(deltaMm), unit).startsWith('0 ');
}

/** Every measurement of `current` beside `previous` (when there is one), in fitting order. */
export function setDifferences(current: ValuesMm, previous: ValuesMm | undefined, unit: LengthUnit): SetDifference[] {
  return MEASUREMENT_FIELDS.map((field) => {
    const currentMm = current[field.key];
    const previousMm = previous?.[field.key];
    const deltaMm = currentMm !== undefined && previousMm !== undefined ? currentMm - previousMm : undefined;
    return { field, currentMm, previousMm, deltaMm, changed: deltaMm !== undefined && deltaVisible(deltaMm, unit) };
  });
}

/** How many measurements changed visibly. */
export function changedCount(differences: readonly SetDifference[]): number {
  return differences.filter((d) => d.changed).length;
}

/**
 * The measurements worth a row when sets are shown side by side: the tank top's required ones
 * and any taken in at least one of the sets, in fitting order.
 */
export function fieldsTaken(sets: readonly ValuesMm[]): MeasurementField[] {
  return MEASUREMENT_FIELDS.filter((f) => f.requiredForTank || sets.some((values) => values[f.key] !== undefined));
}
