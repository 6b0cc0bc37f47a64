/**
 * zod helpers for lengths typed in forms: a number (in the default unit) or a string such as
 * "35 1/2", "35½", "90 cm"; the parsed value is in mm.
 */
import { z } from 'zod';
import { lengthParse, type LengthParseOptions } from './parse';
import { lengthToMm, type LengthUnit } from './units';

function numberProblem(value: number, options: LengthParseOptions): string | null {
  if (!Number.isFinite(value)) return 'enter a finite length';
  if (value < 0) return 'a length cannot be negative';
  if (value === 0 && !options.allowZero) return 'a length must be greater than zero';
  return null;
}

/**
 * A zod schema that accepts a number in `defaultUnit` or a typed length string and outputs mm.
 * Bad input fails with the parser's reason, so the form shows it beside the field.
 */
export function lengthMmSchema(defaultUnit: LengthUnit, options: LengthParseOptions = {}) {
  return z.union([z.number(), z.string()]).transform((raw, ctx): number => {
    if (typeof raw === 'number') {
      const reason = numberProblem(raw, options);
      if (reason === null) return lengthToMm(raw, defaultUnit);
      ctx.addIssue({ code: 'custom', message: reason });
      return z.NEVER;
    }
    const result = lengthParse(raw, defaultUnit, options);
    if (!result.ok) {
      ctx.addIssue({ code: 'custom', message: result.reason });
      return z.NEVER;
    }
    return result.mm;
  });
}
