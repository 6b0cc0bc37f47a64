/**
 * Styles: a studio's saved garment designs (today the knit tank top, with a racer back as an
 * option) and their default parameter values. Over the API every length is in millimetres and
 * every ease in percent; range messages quote the limits in the studio's unit.
 */
import { z } from 'zod';
import { lengthFormat, type LengthUnit } from '../units';
import { DRAFT_FIELD_LIMITS, type DraftFieldPath } from './draft-limits';
import { inRange, rangeMessage } from './draft-input';
import { idParam, requiredText, versionField } from './record-fields';
import { tankParamsSchema, type TankParams } from './tank-params';

/** Garments the engine can draft. */
export const GARMENTS = ['tank'] as const;
export type Garment = (typeof GARMENTS)[number];

export const STYLE_NAME_MAX = 120;
export const NOTES_MAX = 4000;

/**
 * The racer back's inset from the fold when a racer-back style gives none: 2 1/2 in, the middle
 * of "about 2–3 in from the fold at half the armhole depth" (trade notes, common practice).
 */
export const RACER_BACK_INSET_DEFAULT_MM = 63.5;

/** Parameter values in mm (lengths), percent (eases) or a plain ratio, as stored and sent. */
export type ParamsMm = TankParams;

/** Every parameter name, in the engine's order. */
export const PARAM_KEYS = Object.keys(tankParamsSchema.shape) as (keyof ParamsMm)[];

/** True when the parameter is a length (so it is converted between mm and the input's unit). */
export function paramIsLength(key: keyof ParamsMm): boolean {
  const limit = (DRAFT_FIELD_LIMITS as Record<string, { kind: string } | undefined>)[`params.${key}`];
  return limit?.kind === 'length';
}

/**
 * Parameter values in mm checked against the engine's ranges; an out-of-range value is
 * refused with the range quoted in `unit`.
 */
export function paramsMmSchema(unit: LengthUnit) {
  return tankParamsSchema.superRefine(
    (params, ctx) => {
      for (const key of PARAM_KEYS) {
        const value = (params as Record<string, unknown>)[key];
        if (typeof value !== 'number') continue;
        const path = `params.${key}` as DraftFieldPath;
        if (!(path in DRAFT_FIELD_LIMITS)) continue;
        if (!Number.isFinite(value) || !inRange(path, value, 'mm')) {
          ctx.addIssue({ code: 'custom', path: [key], message: rangeMessage(path, unit) });
        }
      }
    },
    // Range checks run even when another parameter has the wrong type, so every problem shows at once.
    { when: (payload) => typeof payload.value === 'object' && payload.value !== null },
  );
}

/** Free text that may be empty. */
export function notesField(label: string, max = NOTES_MAX) {
  return z
    .string({ error: `${label} must be text` })
    .trim()
    .max(max, { error: `${label} must be at most ${max} characters` });
}

/** Path parameters `{ id }` of one record. */
export function idParamsSchema(label: string) {
  return z.strictObject({ id: idParam(label) });
}

const garmentField = z.enum(GARMENTS, { error: `Garment must be one of: ${GARMENTS.join(', ')}` });

function racerBackCheck(value: { racerBack?: boolean; defaults?: ParamsMm }, ctx: z.RefinementCtx): void {
  if (value.racerBack === false && value.defaults?.racerBackInset !== undefined) {
    ctx.addIssue({
      code: 'custom',
      path: ['defaults', 'racerBackInset'],
      message: 'Racer back inset applies only to a racer-back style: turn the racer back on or remove the inset',
    });
  }
}

/** POST /api/styles. */
export function styleCreateSchema(unit: LengthUnit) {
  return z
    .strictObject({
      name: requiredText('Style name', STYLE_NAME_MAX),
      garment: garmentField.default('tank'),
      racerBack: z.boolean({ error: 'Racer back must be true or false' }).default(false),
      defaults: paramsMmSchema(unit).default({}),
      notes: notesField('Notes').default(''),
    })
    .superRefine(racerBackCheck);
}
export type StyleCreate = z.infer<ReturnType<typeof styleCreateSchema>>;

/** PATCH /api/styles/:id: any of the fields, with the version last read. */
export function styleUpdateSchema(unit: LengthUnit) {
  return z
    .strictObject({
      version: versionField,
      name: requiredText('Style name', STYLE_NAME_MAX).optional(),
      racerBack: z.boolean({ error: 'Racer back must be true or false' }).optional(),
      defaults: paramsMmSchema(unit).optional(),
      notes: notesField('Notes').optional(),
      archived: z.boolean({ error: 'Archived must be true or false' }).optional(),
    })
    .superRefine(racerBackCheck);
}
export type StyleUpdate = z.infer<ReturnType<typeof styleUpdateSchema>>;

/** GET /api/styles query. */
export const styleListQuerySchema = z.strictObject({
  archived: z.enum(['true', 'false', 'all'], { error: 'Archived must be "true", "false" or "all"' }).default('false'),
});

/** A style as the API returns it. */
export interface StyleDto {
  id: number;
  name: string;
  garment: Garment;
  racerBack: boolean;
  defaults: ParamsMm;
  notes: string;
  archived: boolean;
  version: number;
  createdAt: string;
  updatedAt: string;
}

/** A length in mm shown in the studio's unit, for messages. */
export function mmQuote(mm: number, unit: LengthUnit): string {
  return unit === 'mm' ? `${Math.round(mm)} mm` : lengthFormat(mm, unit);
}
