/**
 * zod building blocks shared by the record schemas (clients, measurement sets, fabrics):
 * the unit a request is typed in, optional text, ids, versions, and lengths typed as a number
 * in that unit or as a string such as "35 1/2" or "90 cm". Every message names its field.
 */
import { z } from 'zod';
import { lengthFormat, lengthParse, lengthToMm, type LengthUnit } from '../units';

/** The units a record's lengths may be typed in. */
export const recordUnitSchema = z.enum(['in', 'cm', 'mm'], { error: 'Unit must be "in", "cm" or "mm"' });

/** A studio's display unit, sent back beside every length stored in mm. */
export type StudioUnit = 'in' | 'cm';

/** A required one-line text, trimmed, naming the field when empty or too long. */
export function requiredText(label: string, max: number) {
  return z
    .string({ error: (issue) => (issue.input === undefined ? `${label} is required` : `${label} must be text`) })
    .trim()
    .min(1, `${label} is required`)
    .max(max, `${label} must be at most ${max} characters`);
}

/** Optional text: `""` and `null` both mean "none" and come out as null. */
export function optionalText(label: string, max: number) {
  return z
    .union([z.string(), z.null()], { error: `${label} must be text` })
    .transform((v) => (v === null ? null : v.trim()))
    .pipe(z.string().max(max, `${label} must be at most ${max} characters`).nullable())
    .transform((v) => (v === '' ? null : v));
}

/** A record id in a URL, as a positive whole number. */
export function idParam(label: string) {
  return z.coerce
    .number({ error: `${label} must be a positive whole number` })
    .int(`${label} must be a positive whole number`)
    .positive(`${label} must be a positive whole number`)
    .max(4_294_967_295, `${label} is too large`);
}

/** The version of a record a change was made from (optimistic concurrency). */
export const versionField = z
  .number({ error: (issue) => (issue.input === undefined ? 'Version is required: send the version you edited' : 'Version must be a whole number') })
  .int('Version must be a whole number')
  .min(0, 'Version must be a whole number');

/** A length as typed: a number in the request's unit, or a string such as "35 1/2" or "90 cm". */
export const lengthInput = z.union([z.number(), z.string()]);

/** Accepted range of a length, in mm. */
export interface LengthLimit {
  min: number;
  max: number;
}

/** Lengths are kept to 1/100 mm: finer than any tape, and free of float noise such as 927.0999. */
export function mmRound(mm: number): number {
  return Math.round(mm * 100) / 100;
}

/** The bound shown in a message, rounded inwards so that the value shown is itself accepted. */
function boundFormat(mm: number, bound: 'min' | 'max', unit: LengthUnit): string {
  const step = unit === 'in' ? 25.4 / 8 : 1;
  const steps = mm / step;
  const rounded = (bound === 'min' ? Math.ceil(steps - 1e-9) : Math.floor(steps + 1e-9)) * step;
  return lengthFormat(rounded, unit);
}

/** "Bust girth must be between 19 3/4 in and 78 3/4 in" in the unit the user typed in. */
export function lengthRangeMessage(label: string, limit: LengthLimit, unit: LengthUnit): string {
  return `${label} must be between ${boundFormat(limit.min, 'min', unit)} and ${boundFormat(limit.max, 'max', unit)}`;
}

/**
 * Reads one typed length into mm, checking it against `limit`.
 * @returns the length in mm (to 1/100 mm), or the message naming the field
 */
export function lengthRead(
  raw: number | string,
  unit: LengthUnit,
  label: string,
  limit: LengthLimit,
): { ok: true; mm: number } | { ok: false; message: string } {
  let mm: number;
  if (typeof raw === 'number') {
    if (!Number.isFinite(raw)) return { ok: false, message: `${label} must be a finite number` };
    if (raw <= 0) return { ok: false, message: `${label} must be greater than zero` };
    mm = lengthToMm(raw, unit);
  } else {
    const parsed = lengthParse(raw, unit);
    if (!parsed.ok) return { ok: false, message: `${label}: ${parsed.reason}` };
    mm = parsed.mm;
  }
  if (mm < limit.min - 1e-6 || mm > limit.max + 1e-6) return { ok: false, message: lengthRangeMessage(label, limit, unit) };
  return { ok: true, mm: mmRound(mm) };
}

/** A date typed as YYYY-MM-DD, not in the future (one day of slack for time zones). */
export function pastDate(label: string) {
  return z
    .string({ error: (issue) => (issue.input === undefined ? `${label} is required` : `${label} must be a date like 2026-03-14`) })
    .regex(/^\d{4}-\d{2}-\d{2}$/, `${label} must be a date like 2026-03-14`)
    .refine((text) => {
      const date = new Date(`${text}T00:00:00Z`);
      return !Number.isNaN(date.getTime()) && date.toISOString().slice(0, 10) === text;
    }, `${label} is not a calendar date`)
    .refine((text) => text >= '1900-01-01', `${label} must be after 1900`)
    .refine((text) => new Date(`${text}T00:00:00Z`).getTime() <= Date.now() + 86_400_000, `${label} cannot be in the future`);
}

/** Query-string paging shared by the record lists. */
export const pageQuery = {
  page: z.coerce
    .number({ error: 'Page must be a whole number from 1' })
    .int('Page must be a whole number from 1')
    .min(1, 'Page must be a whole number from 1')
    .max(100_000, 'Page is too large')
    .default(1),
  pageSize: z.coerce
    .number({ error: 'Page size must be a whole number from 1 to 100' })
    .int('Page size must be a whole number from 1 to 100')
    .min(1, 'Page size must be a whole number from 1 to 100')
    .max(100, 'Page size must be a whole number from 1 to 100')
    .default(25),
  order: z.enum(['asc', 'desc'], { error: 'Order must be "asc" or "desc"' }).default('asc'),
  q: z.string({ error: 'Search must be text' }).trim().max(120, 'Search must be at most 120 characters').optional(),
};

/** The error option of a strict object: unknown keys named, anything else "must be an object". */
export function objectError(what: string) {
  return {
    error: (issue: { code?: string; keys?: string[] }) =>
      issue.code === 'unrecognized_keys' ? `Unknown field: ${(issue.keys ?? []).join(', ')}` : `${what} must be an object`,
  };
}

/** One page of a list. */
export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}
