/**
 * What the owner types at a fitting, before it is saved: one text per measurement, read in the
 * unit on screen with the shared length parser and the shared field limits, so the screen
 * rejects exactly what the server would.
 */
import { lengthFormat, lengthParse, type LengthUnit } from '@shared/units';
import { lengthRead } from '@shared/schemas/record-fields';
import { MEASUREMENT_FIELDS, type MeasurementKey, type MeasurementSetCreateInput } from '@shared/schemas/measurement';
import type { ValuesMm } from './set-compare';

/** The text typed for each measurement (missing or blank: not taken). */
export type FittingEntries = Partial<Record<MeasurementKey, string>>;

/** Typed texts read into mm, with a message naming the field for each text that is not a length. */
export interface EntriesRead {
  valuesMm: ValuesMm;
  errors: Partial<Record<MeasurementKey, string>>;
}

function blank(text: string | undefined): text is undefined {
  return text === undefined || text.trim() === '';
}

/** Reads every typed text in `unit`; blanks are simply not taken (required ones are checked on save). */
export function entriesRead(entries: FittingEntries, unit: LengthUnit): EntriesRead {
  const valuesMm: ValuesMm = {};
  const errors: Partial<Record<MeasurementKey, string>> = {};
  for (const field of MEASUREMENT_FIELDS) {
    const text = entries[field.key];
    if (blank(text)) continue;
    const read = lengthRead(text, unit, field.label, field.limitMm);
    if (read.ok) valuesMm[field.key] = read.mm;
    else errors[field.key] = read.message;
  }
  return { valuesMm, errors };
}

/** The texts to show for values in mm: "36 1/2" in inches, "92.7" in centimetres. */
export function entriesFromMm(valuesMm: ValuesMm, unit: LengthUnit): FittingEntries {
  const entries: FittingEntries = {};
  for (const field of MEASUREMENT_FIELDS) {
    const mm = valuesMm[field.key];
    if (mm !== undefined) entries[field.key] = lengthFormat(mm, unit, { withUnit: false });
  }
  return entries;
}

/**
 * The texts re-written in another unit when the owner switches unit mid-fitting. A text that is
 * not a length yet stays as typed so the owner can see and fix it.
 */
export function entriesConvert(entries: FittingEntries, from: LengthUnit, to: LengthUnit): FittingEntries {
  if (from === to) return entries;
  const next: FittingEntries = {};
  for (const field of MEASUREMENT_FIELDS) {
    const text = entries[field.key];
    if (blank(text)) continue;
    const parsed = lengthParse(text, from);
    next[field.key] = parsed.ok ? lengthFormat(parsed.mm, to, { withUnit: false }) : text;
  }
  return next;
}

/**
 * The request body of a set: the texts as typed, in the unit on screen (the server reads them
 * the same way). When correcting, a value left as it was shown goes back exactly as stored, in
 * mm, so that rounding for the screen never changes a measurement nobody touched.
 */
export function fittingPayload(
  entries: FittingEntries,
  unit: LengthUnit,
  takenAt: string,
  notes: string,
  originalMm: ValuesMm = {},
): MeasurementSetCreateInput {
  const values: Partial<Record<MeasurementKey, string>> = {};
  for (const field of MEASUREMENT_FIELDS) {
    const text = entries[field.key];
    if (blank(text)) continue;
    const original = originalMm[field.key];
    const untouched = original !== undefined && text.trim() === lengthFormat(original, unit, { withUnit: false });
    values[field.key] = untouched ? `${original} mm` : text.trim();
  }
  return { takenAt, unit, values, notes: notes.trim() === '' ? null : notes.trim() };
}

/** Required measurements with nothing typed yet, in fitting order. */
export function requiredMissing(entries: FittingEntries): MeasurementKey[] {
  return MEASUREMENT_FIELDS.filter((f) => f.requiredForTank && blank(entries[f.key])).map((f) => f.key);
}

/** Which way a swipe went, if it was a clear sideways swipe: left means "next". */
export function swipeDirection(dx: number, dy: number, minDistance = SWIPE_MIN_PX): 'next' | 'previous' | null {
  if (Math.abs(dx) < minDistance || Math.abs(dx) < Math.abs(dy) * 1.5) return null;
  return dx < 0 ? 'next' : 'previous';
}

/** How far a finger must travel sideways to change field (our choice: far enough that a tap or a scroll never counts). */
export const SWIPE_MIN_PX = 60;

/** Today's date as YYYY-MM-DD in the device's own time zone (the fitting's date). */
export function todayIso(now: Date = new Date()): string {
  const y = now.getFullYear();
  const m = String(now.getMonth() + 1).padStart(2, '0');
  const d = String(now.getDate()).padStart(2, '0');
  return `${y}-${m}-${d}`;
}
