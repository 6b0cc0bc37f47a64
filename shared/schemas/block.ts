/**
 * Blocks: a client's fitted base, one measurement set plus the fit corrections found at
 * fittings ("+1 cm at hip", "armhole 1/4 in higher", "bust ease 2 % more negative"). Lengths in
 * mm, eases in percentage points; range messages quote the studio's unit.
 */
import { z } from 'zod';
import type { LengthUnit } from '../units';
import { idParam, requiredText, versionField } from './record-fields';
import { mmQuote, notesField } from './style';

/** What a correction adjusts: a body measurement (before ease) or a parameter in effect. */
export const CORRECTION_TARGETS = {
  bust: { label: 'Bust girth', kind: 'length', applies: 'measurements' },
  waist: { label: 'Waist girth', kind: 'length', applies: 'measurements' },
  hip: { label: 'Hip girth', kind: 'length', applies: 'measurements' },
  armholeDepth: { label: 'Armhole depth', kind: 'length', applies: 'measurements' },
  length: { label: 'Length', kind: 'length', applies: 'params' },
  bustEase: { label: 'Bust ease', kind: 'percent', applies: 'params' },
  hipEase: { label: 'Hip ease', kind: 'percent', applies: 'params' },
  frontNeckDepth: { label: 'Front neck depth', kind: 'length', applies: 'params' },
  backNeckDepth: { label: 'Back neck depth', kind: 'length', applies: 'params' },
  strapInset: { label: 'Strap inset', kind: 'length', applies: 'params' },
  strapWidth: { label: 'Strap width', kind: 'length', applies: 'params' },
  shoulderSlope: { label: 'Shoulder slope', kind: 'length', applies: 'params' },
} as const;

export type CorrectionTarget = keyof typeof CORRECTION_TARGETS;
export const CORRECTION_TARGET_NAMES = Object.keys(CORRECTION_TARGETS) as CorrectionTarget[];

/**
 * The largest single correction: 15 cm for a length, 20 percentage points for an ease. A fit
 * correction is a small adjustment; anything larger is a new fitting (our limit).
 */
export const CORRECTION_MAX_MM = 150;
export const CORRECTION_MAX_PERCENT = 20;
export const CORRECTIONS_MAX = 40;
export const BLOCK_NAME_MAX = 120;
export const CORRECTION_NOTE_MAX = 500;

/** A calendar date "YYYY-MM-DD". */
export function dateField(label: string) {
  return z.iso.date({ error: `${label} must be a date like 2026-03-14` });
}

/** One fit correction, amount in mm (lengths) or percentage points (eases). */
export function correctionSchema(unit: LengthUnit) {
  return z
    .strictObject({
      target: z.enum(CORRECTION_TARGET_NAMES, {
        error: `Correction target must be one of: ${CORRECTION_TARGET_NAMES.join(', ')}`,
      }),
      amount: z
        .number({ error: (i) => (i.input === undefined ? 'Amount is required' : 'Amount must be a number') })
        .refine(Number.isFinite, { error: 'Amount must be a finite number' })
        .refine((n) => n !== 0, { error: 'Amount must not be zero: a correction changes something' }),
      note: requiredText('Note', CORRECTION_NOTE_MAX),
      notedOn: dateField('Date'),
    })
    .superRefine((c, ctx) => {
      const target = CORRECTION_TARGETS[c.target];
      const max = target.kind === 'length' ? CORRECTION_MAX_MM : CORRECTION_MAX_PERCENT;
      if (Math.abs(c.amount) <= max) return;
      const shown = target.kind === 'length' ? mmQuote(max, unit) : `${max} %`;
      ctx.addIssue({
        code: 'custom',
        path: ['amount'],
        message: `A ${target.label.toLowerCase()} correction must be within ±${shown}; for more, take a new measurement set`,
      });
    });
}
export type CorrectionCreate = z.infer<ReturnType<typeof correctionSchema>>;

/** POST /api/clients/:clientId/blocks. */
export function blockCreateSchema(unit: LengthUnit) {
  return z.strictObject({
    measurementSetId: idParam('Measurement set'),
    name: notesField('Block name', BLOCK_NAME_MAX).default(''),
    notes: notesField('Notes').default(''),
    corrections: z
      .array(correctionSchema(unit), { error: 'Corrections must be a list' })
      .max(CORRECTIONS_MAX, { error: `A block holds at most ${CORRECTIONS_MAX} corrections` })
      .default([]),
  });
}
export type BlockCreate = z.infer<ReturnType<typeof blockCreateSchema>>;

/** PATCH /api/clients/:clientId/blocks/:blockId. */
export const blockUpdateSchema = z.strictObject({
  version: versionField,
  measurementSetId: idParam('Measurement set').optional(),
  name: notesField('Block name', BLOCK_NAME_MAX).optional(),
  notes: notesField('Notes').optional(),
});
export type BlockUpdate = z.infer<typeof blockUpdateSchema>;

/** Path parameters of the block routes. */
export const clientParamsSchema = z.strictObject({ clientId: idParam('Client') });
export const blockParamsSchema = z.strictObject({ clientId: idParam('Client'), blockId: idParam('Block') });
export const correctionParamsSchema = z.strictObject({
  clientId: idParam('Client'),
  blockId: idParam('Block'),
  correctionId: idParam('Correction'),
});

/** Someone who did something, as the API names them. */
export interface PersonDto {
  id: number;
  name: string;
}

/** A correction as the API returns it. */
export interface CorrectionDto {
  id: number;
  target: CorrectionTarget;
  amount: number;
  note: string;
  notedOn: string;
  createdAt: string;
  createdBy: PersonDto | null;
}

/** The body measurements a tank top needs, mm, as read from the block's measurement set. */
export interface BlockMeasurementsMm {
  bust: number;
  hip: number;
  armholeDepth: number;
  waist?: number;
}

/** A block as the API returns it. */
export interface BlockDto {
  id: number;
  clientId: number;
  measurementSetId: number;
  /** When the set was taken ("YYYY-MM-DD"). */
  measuredOn: string | null;
  /**
   * The id of a newer version of the same set when the block's version has since been
   * corrected (PATCH measurementSetId to move the block onto it), else null.
   */
  newerSetVersionId: number | null;
  /** The set's values the engine uses, mm, before corrections. */
  measurements: BlockMeasurementsMm;
  name: string;
  notes: string;
  corrections: CorrectionDto[];
  /** When a draft last started from or saved with this block. */
  lastUsedAt: string | null;
  version: number;
  createdAt: string;
  updatedAt: string;
}
