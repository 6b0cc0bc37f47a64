/**
 * Measurement sets: what a request sends (values in the unit given, or typed strings such as
 * "35 1/2") and what the API answers (values in mm with the studio's unit beside them).
 * The fitting form and the server routes validate with these same objects.
 */
import { z } from 'zod';
import type { LengthUnit } from '../units';
import {
  MEASUREMENT_FIELDS,
  type MeasurementKey,
  type MeasurementValuesMm,
} from './measurement-fields';
import type { MeasurementWarning } from './measurement-warnings';
import { idParam, lengthInput, objectError, lengthRead, optionalText, pastDate, recordUnitSchema, versionField, type StudioUnit } from './record-fields';

export * from './measurement-fields';
export * from './measurement-warnings';

/** The longest notes kept with a set (fit preferences, what was worn at the fitting). */
export const MEASUREMENT_NOTES_MAX = 4000;

function valueOrEmpty(label: string) {
  return z.union([lengthInput, z.null()], { error: `${label} must be a number or a length such as 35 1/2 or 90 cm` });
}

/** Every measurement, typed; each is checked and converted once the unit is known. */
const valuesShape = Object.fromEntries(MEASUREMENT_FIELDS.map((f) => [f.key, valueOrEmpty(f.label).optional()])) as Record<
  MeasurementKey,
  z.ZodOptional<ReturnType<typeof valueOrEmpty>>
>;

const valuesSchema = z.strictObject(valuesShape, {
  error: (issue) =>
    issue.code === 'unrecognized_keys' ? `Unknown measurement: ${issue.keys.join(', ')}` : 'Values must be an object of measurements',
});

const setShape = {
  takenAt: pastDate('Date taken'),
  unit: recordUnitSchema,
  values: valuesSchema,
  notes: optionalText('Notes', MEASUREMENT_NOTES_MAX).optional(),
};

type SetShapeOutput = z.infer<z.ZodObject<typeof setShape>>;

/** A measurement set as parsed: values converted to mm. */
export interface MeasurementSetParsed {
  takenAt: string;
  unit: LengthUnit;
  valuesMm: MeasurementValuesMm;
  notes: string | null;
}

type RawValues = Partial<Record<MeasurementKey, number | string | null | undefined>>;

/** Reads every typed value into mm; the messages name the field and quote the range in `unit`. */
function valuesRead(values: RawValues, unit: LengthUnit): { valuesMm: Partial<Record<MeasurementKey, number>>; errors: Map<MeasurementKey, string> } {
  const valuesMm: Partial<Record<MeasurementKey, number>> = {};
  const errors = new Map<MeasurementKey, string>();
  for (const field of MEASUREMENT_FIELDS) {
    const raw = values[field.key];
    const empty = raw === undefined || raw === null || (typeof raw === 'string' && raw.trim() === '');
    if (empty) {
      if (field.requiredForTank) errors.set(field.key, `${field.label} is required`);
      continue;
    }
    // A value of the wrong type already has its own issue from the object schema.
    if (typeof raw !== 'number' && typeof raw !== 'string') continue;
    const read = lengthRead(raw, unit, field.label, field.limitMm);
    if (read.ok) valuesMm[field.key] = read.mm;
    else errors.set(field.key, read.message);
  }
  return { valuesMm, errors };
}

/** Runs the value checks even when another field (the date, the notes) has failed, so every problem shows at once. */
function valuesReadable(payload: { value: unknown }): boolean {
  const input = payload.value as { unit?: unknown; values?: unknown } | null;
  return (
    typeof input === 'object' &&
    input !== null &&
    recordUnitSchema.safeParse(input.unit).success &&
    typeof input.values === 'object' &&
    input.values !== null
  );
}

function valuesCheck(input: { unit: LengthUnit; values: RawValues }, ctx: z.RefinementCtx): void {
  for (const [key, message] of valuesRead(input.values, input.unit).errors) {
    ctx.addIssue({ code: 'custom', path: ['values', key], message });
  }
}

function setConvert<T extends SetShapeOutput>(input: T): Omit<T, 'values' | 'notes'> & MeasurementSetParsed {
  const { values, notes, ...rest } = input;
  const { valuesMm } = valuesRead(values, input.unit);
  return { ...rest, valuesMm: valuesMm as MeasurementValuesMm, notes: notes ?? null };
}

/**
 * A new measurement set: `{ takenAt: "2026-03-14", unit: "in", values: { bust: 36.5, hip: "40 1/4" }, notes }`.
 * Bust, hip and armhole depth are required. Output: values in mm.
 */
export const measurementSetCreateSchema = z
  .strictObject(setShape, objectError('A measurement set'))
  .superRefine(valuesCheck, { when: valuesReadable })
  .transform(setConvert);

/**
 * A correction of a set: the whole set again plus the `version` it corrects. The old version
 * stays readable; a stale `version` answers 409 with the current one.
 */
export const measurementSetCorrectSchema = z
  .strictObject({ ...setShape, version: versionField.min(1, 'Version must be 1 or more') }, objectError('A correction'))
  .superRefine(valuesCheck, { when: valuesReadable })
  .transform(setConvert);

/** What the fitting form sends for a new set. */
export type MeasurementSetCreateInput = z.input<typeof measurementSetCreateSchema>;
/** What the form sends to correct a set. */
export type MeasurementSetCorrectInput = z.input<typeof measurementSetCorrectSchema>;
/** A new set as the service receives it. */
export type MeasurementSetCreate = z.output<typeof measurementSetCreateSchema>;
/** A correction as the service receives it. */
export type MeasurementSetCorrect = z.output<typeof measurementSetCorrectSchema>;

/** `/api/clients/:clientId/measurements/:setId[/versions/:version]` path parameters. */
export const measurementParamsSchema = z.strictObject({
  clientId: idParam('Client id'),
  setId: idParam('Measurement set id').optional(),
  version: idParam('Version').optional(),
});

/** A member named on a record; `id` is null once the member has been removed. */
export interface MemberRef {
  id: number | null;
  name: string;
}

/** One version of a measurement set as the API returns it. */
export interface MeasurementSetView {
  /** This version's own id (drafts point at the exact version they were drafted from). */
  id: number;
  /** The set's id: the same for every version of it. */
  setId: number;
  clientId: number;
  /** 1 for the set as first taken, then one more for each correction. */
  version: number;
  /** Number of versions the set has; this one is current when `version === versionCount`. */
  versionCount: number;
  isCurrent: boolean;
  takenAt: string;
  takenBy: MemberRef;
  recordedBy: MemberRef;
  recordedAt: string;
  notes: string | null;
  valuesMm: MeasurementValuesMm;
  /** The studio's display unit, for showing `valuesMm`. */
  studioUnit: StudioUnit;
  /** Plausibility warnings for these values, quoted in the studio's unit. */
  warnings: MeasurementWarning[];
}

/** A version in a set's history. */
export interface MeasurementVersionSummary {
  id: number;
  version: number;
  recordedBy: MemberRef;
  recordedAt: string;
  notes: string | null;
}

/** A set with the list of all its versions (newest first). */
export interface MeasurementSetDetail extends MeasurementSetView {
  versions: MeasurementVersionSummary[];
}

/** `GET /api/clients/:clientId/measurements`: the current version of each set, newest fitting first. */
export interface MeasurementSetList {
  items: MeasurementSetView[];
  studioUnit: StudioUnit;
}
