/**
 * Length units and exact conversions to and from millimetres.
 * 1 in = 25.4 mm exactly (international yard and pound, 1959; NIST SP 811, appendix B).
 */

/** Units a studio or an input may use. */
export type LengthUnit = 'in' | 'cm' | 'mm';

/** Every unit, in display order. */
export const LENGTH_UNITS: readonly LengthUnit[] = ['in', 'cm', 'mm'];

/** Millimetres in one inch, exact (NIST SP 811). */
export const MM_PER_INCH = 25.4;

/** Millimetres in one centimetre, exact (SI). */
export const MM_PER_CM = 10;

/** Millimetres in one unit of `unit`. */
export function unitToMmFactor(unit: LengthUnit): number {
  if (unit === 'in') return MM_PER_INCH;
  if (unit === 'cm') return MM_PER_CM;
  return 1;
}

/** Converts a length in `unit` to mm. */
export function lengthToMm(value: number, unit: LengthUnit): number {
  return value * unitToMmFactor(unit);
}

/** Converts a length in mm to `unit`. */
export function lengthFromMm(mm: number, unit: LengthUnit): number {
  return mm / unitToMmFactor(unit);
}

/** True when `text` names a length unit. */
export function isLengthUnit(text: string): text is LengthUnit {
  return (LENGTH_UNITS as readonly string[]).includes(text);
}
