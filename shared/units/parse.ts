/**
 * Parsing lengths typed by people: "35 1/2", "35.5", "35½", "90 cm", "900 mm", "35 1/2 in".
 * A number without a unit is read in the default unit given. Rational arithmetic through
 * fraction.js so that "35 1/2" is exactly 35.5 before conversion.
 */
import Fraction from 'fraction.js';
import { lengthToMm, type LengthUnit } from './units';

/** The outcome of parsing: the length in mm and the unit it was read in, or why it failed. */
export type LengthParseResult =
  | { ok: true; mm: number; value: number; unit: LengthUnit }
  | { ok: false; reason: string };

/** Options for {@link lengthParse}. */
export interface LengthParseOptions {
  /** Accept 0 (default false: a body measurement or a width is never zero). */
  allowZero?: boolean;
}

const VULGAR_FRACTIONS: Record<string, string> = {
  '½': '1/2',
  '¼': '1/4',
  '¾': '3/4',
  '⅛': '1/8',
  '⅜': '3/8',
  '⅝': '5/8',
  '⅞': '7/8',
  '⅓': '1/3',
  '⅔': '2/3',
  '⅕': '1/5',
  '⅖': '2/5',
  '⅗': '3/5',
  '⅘': '4/5',
  '⅙': '1/6',
  '⅚': '5/6',
  '⅟': '1/',
};

const UNIT_WORDS: Record<string, LengthUnit> = {
  in: 'in',
  inch: 'in',
  inches: 'in',
  '"': 'in',
  '″': 'in',
  cm: 'cm',
  mm: 'mm',
};

const UNIT_PATTERN = /^(.*?)\s*(inches|inch|in|"|″|cm|mm)$/;
const DECIMAL_PATTERN = /^(\d+(?:[.,]\d*)?|[.,]\d+)$/;
const MIXED_PATTERN = /^(\d+)\s+(\d+)\s*\/\s*(\d+)$/;
const FRACTION_PATTERN = /^(\d+)\s*\/\s*(\d+)$/;

function fail(reason: string): LengthParseResult {
  return { ok: false, reason };
}

function fractionRead(numerator: string, denominator: string): Fraction | string {
  if (Number(denominator) === 0) return `the fraction ${numerator}/${denominator} divides by zero`;
  return new Fraction(Number(numerator), Number(denominator));
}

function numberRead(text: string): Fraction | string {
  const decimal = DECIMAL_PATTERN.exec(text);
  if (decimal?.[1] !== undefined) return new Fraction(decimal[1].replace(',', '.'));
  const mixed = MIXED_PATTERN.exec(text);
  if (mixed && mixed[1] !== undefined && mixed[2] !== undefined && mixed[3] !== undefined) {
    const part = fractionRead(mixed[2], mixed[3]);
    if (typeof part === 'string') return part;
    if (part.gte(1)) return `the fraction ${mixed[2]}/${mixed[3]} in a mixed number must be less than 1`;
    return new Fraction(Number(mixed[1])).add(part);
  }
  const fraction = FRACTION_PATTERN.exec(text);
  if (fraction && fraction[1] !== undefined && fraction[2] !== undefined) {
    return fractionRead(fraction[1], fraction[2]);
  }
  return `"${text}" is not a length; type it like 35 1/2, 35.5, 90 cm or 900 mm`;
}

/**
 * Reads a length typed by a person and returns it in mm.
 * @param text what was typed
 * @param defaultUnit the unit of a bare number (the studio's unit)
 */
export function lengthParse(
  text: string,
  defaultUnit: LengthUnit,
  options: LengthParseOptions = {},
): LengthParseResult {
  let body = text
    .trim()
    .toLowerCase()
    .replace(/\u2044/g, '/');
  if (body === '') return fail('enter a length');
  for (const [glyph, spelled] of Object.entries(VULGAR_FRACTIONS)) {
    body = body.split(glyph).join(` ${spelled}`);
  }
  body = body.replace(/\s+/g, ' ').trim();
  let unit = defaultUnit;
  const withUnit = UNIT_PATTERN.exec(body);
  if (withUnit?.[1] !== undefined && withUnit[2] !== undefined) {
    unit = UNIT_WORDS[withUnit[2]] ?? defaultUnit;
    body = withUnit[1].trim();
  }
  if (body.startsWith('-') || body.startsWith('−')) return fail('a length cannot be negative');
  if (body.startsWith('+')) body = body.slice(1).trim();
  if (body === '') return fail('enter a number before the unit');
  const read = numberRead(body);
  if (typeof read === 'string') return fail(read);
  const value = read.valueOf();
  if (!Number.isFinite(value)) return fail('the number is too large');
  if (value === 0 && !options.allowZero) return fail('a length must be greater than zero');
  return { ok: true, mm: lengthToMm(value, unit), value, unit };
}
