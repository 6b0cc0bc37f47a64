/**
 * Formatting lengths for people: inches as mixed fractions to 1/8 in, centimetres to 1 mm,
 * millimetres whole. Rational arithmetic through fraction.js.
 */
import Fraction from 'fraction.js';
import { lengthFromMm, type LengthUnit } from './units';

/** The finest fraction of an inch shown: 1/8 in (common practice for tape measures and patterns). */
export const INCH_FRACTION_DENOMINATOR = 8;

/** Options for {@link lengthFormat}. */
export interface LengthFormatOptions {
  /** Append the unit symbol (default true). */
  withUnit?: boolean;
}

/**
 * Inches as a mixed number rounded to the nearest 1/8 in, e.g. 901.7 mm → "35 1/2".
 * @param mm length in mm
 */
export function inchesFormat(mm: number): string {
  const eighths = Math.round(lengthFromMm(mm, 'in') * INCH_FRACTION_DENOMINATOR);
  if (eighths === 0) return '0';
  return new Fraction(eighths, INCH_FRACTION_DENOMINATOR).toFraction(true);
}

/**
 * Centimetres to one decimal place (1 mm), without trailing ".0", e.g. 902 mm → "90.2".
 * @param mm length in mm
 */
export function centimetresFormat(mm: number): string {
  const tenths = Math.round(mm);
  const text = (tenths / 10).toFixed(1);
  return text.endsWith('.0') ? text.slice(0, -2) : text;
}

/**
 * A length for display in `unit`: "35 1/2 in", "90.2 cm", "902 mm".
 * @param mm length in mm
 */
export function lengthFormat(mm: number, unit: LengthUnit, options: LengthFormatOptions = {}): string {
  const withUnit = options.withUnit ?? true;
  let text: string;
  if (unit === 'in') text = inchesFormat(mm);
  else if (unit === 'cm') text = centimetresFormat(mm);
  else text = String(Math.round(mm));
  if (text === '-0') text = '0';
  return withUnit ? `${text} ${unit}` : text;
}
