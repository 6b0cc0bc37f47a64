/**
 * DraftInput: what the engine drafts from. Every length is in `unit`; percents are percent.
 * The same schema validates the drafting form in the client and the draft routes on the
 * server. Range messages name the field and state the range in the input's unit.
 */
import { z } from 'zod';
import { lengthFormat, lengthFromMm, lengthToMm, type LengthUnit } from '../units';
import { DRAFT_FIELD_LIMITS, type DraftFieldPath, type FieldLimit } from './draft-limits';
import { numberField } from './fields';
import { tankParamsSchema } from './tank-params';
import { tankInputCheck } from '../engine/drafting/tank-limits';


/** The units an input may be given in. */
export const lengthUnitSchema = z.enum(['in', 'cm', 'mm'], {
  error: 'Unit must be "in", "cm" or "mm"',
});

/** Body measurements (lengths in the input's unit). */
export const measurementsSchema = z.strictObject(
  {
    bust: numberField('Bust girth'),
    hip: numberField('Hip girth'),
    armholeDepth: numberField('Armhole depth'),
    waist: numberField('Waist girth').optional(),
  },
  { error: (issue) => (issue.code === 'unrecognized_keys' ? `Unknown measurement: ${issue.keys.join(', ')}` : 'Measurements are required') },
);

/** The fabric: crosswise stretch (percent) and recovery; width optional (input's unit). */
export const fabricSchema = z.strictObject(
  {
    stretch: numberField('Crosswise stretch'),
    stretchLengthwise: numberField('Lengthwise stretch').optional(),
    recovery: z.enum(['good', 'fair', 'poor'], { error: 'Recovery must be "good", "fair" or "poor"' }),
    width: numberField('Fabric width').optional(),
  },
  { error: (issue) => (issue.code === 'unrecognized_keys' ? `Unknown fabric field: ${issue.keys.join(', ')}` : 'Fabric is required') },
);

const draftInputShape = z.strictObject(
  {
    unit: lengthUnitSchema,
    measurements: measurementsSchema,
    fabric: fabricSchema,
    style: z.literal('tank', { error: 'Style must be "tank"' }),
    params: tankParamsSchema.optional(),
  },
  { error: (issue) => (issue.code === 'unrecognized_keys' ? `Unknown field: ${issue.keys.join(', ')}` : 'A draft input must be an object') },
);

type DraftInputShape = z.infer<typeof draftInputShape>;

/** The number at a dotted path, or undefined when absent or malformed (reported elsewhere). */
function valueAt(input: DraftInputShape, path: DraftFieldPath): number | undefined {
  const [group, key] = path.split('.') as [string, string];
  const record: unknown = (input as unknown as Record<string, unknown> | null)?.[group];
  if (typeof record !== 'object' || record === null) return undefined;
  const value = (record as Record<string, unknown>)[key];
  return typeof value === 'number' && Number.isFinite(value) ? value : undefined;
}

/** Formats a limit in the user's unit, rounded inwards so that the value shown is accepted. */
function limitFormat(limit: FieldLimit, bound: 'min' | 'max', unit: LengthUnit): string {
  const value = limit[bound];
  if (limit.kind === 'percent') return `${value} %`;
  if (limit.kind === 'ratio') return String(value);
  const step = unit === 'in' ? 25.4 / 8 : 1;
  const rounded = (bound === 'min' ? Math.ceil(value / step - 1e-9) : Math.floor(value / step + 1e-9)) * step;
  return lengthFormat(rounded, unit);
}

/** The message for a value outside its range, in the user's unit. */
export function rangeMessage(path: DraftFieldPath, unit: LengthUnit): string {
  const limit: FieldLimit = DRAFT_FIELD_LIMITS[path];
  return `${limit.label} must be between ${limitFormat(limit, 'min', unit)} and ${limitFormat(limit, 'max', unit)}`;
}

/** True when `value` (in `unit` for lengths) lies in the field's range. */
export function inRange(path: DraftFieldPath, value: number, unit: LengthUnit): boolean {
  const limit: FieldLimit = DRAFT_FIELD_LIMITS[path];
  const comparable = limit.kind === 'length' ? lengthToMm(value, unit) : value;
  const slack = limit.kind === 'length' ? 1e-6 : 1e-9;
  return comparable >= limit.min - slack && comparable <= limit.max + slack;
}

function rangesCheck(input: DraftInputShape, ctx: z.RefinementCtx): void {
  if (typeof input !== 'object' || input === null) return;
  const unitKnown = lengthUnitSchema.safeParse(input.unit).success;
  for (const path of Object.keys(DRAFT_FIELD_LIMITS) as DraftFieldPath[]) {
    const value = valueAt(input, path);
    if (value === undefined) continue;
    if (DRAFT_FIELD_LIMITS[path].kind === 'length' && !unitKnown) continue;
    if (inRange(path, value, input.unit)) continue;
    ctx.addIssue({ code: 'custom', path: path.split('.'), message: rangeMessage(path, input.unit) });
  }
}

/**
 * DraftInput with every field's type and range checked (not yet its consistency). Ranges are
 * checked even when another field is malformed, so that every bad field is named at once.
 */
export const draftInputRangedSchema = draftInputShape.superRefine(rangesCheck, { when: () => true });

/**
 * DraftInput fully checked: types, ranges in the input's unit, then the style's consistency
 * (a neckline deeper than the armhole allows, a strap inset wider than the shoulder, ...),
 * which is only judged once every field is well formed and in range. Use this one at every
 * boundary.
 */
export const draftInputSchema = draftInputRangedSchema.superRefine(
  (input, ctx) => {
    for (const error of tankInputCheck(input)) {
      ctx.addIssue({ code: 'custom', path: error.path.split('.'), message: error.message });
    }
  },
  { when: (payload) => payload.issues.length === 0 },
);

/** The input to the drafting engine; lengths in `unit`. */
export type DraftInput = z.infer<typeof draftInputShape>;

/** The parameters of a tank top, lengths in the input's unit. */
export type { TankParams } from './tank-params';

/** Converts a length of the input to mm (undefined stays undefined). */
export function inputLengthToMm(value: number | undefined, unit: LengthUnit): number | undefined {
  return value === undefined ? undefined : lengthToMm(value, unit);
}

/** Converts mm to a length in the input's unit. */
export function inputLengthFromMm(mm: number, unit: LengthUnit): number {
  return lengthFromMm(mm, unit);
}
