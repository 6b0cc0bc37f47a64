/**
 * Drafts: one style drafted for one block with one fabric, its parameter values, due date and
 * notes; every save is a revision; states drafting → approved → cut → sewn → delivered.
 * Lengths over the API are mm; the engine's input is built in the draft's unit by
 * `draftInputBuild` (shared/schemas/draft-input-build.ts) on both sides.
 */
import { z } from 'zod';
import type { LengthUnit } from '../units';
import { dateField } from './block';
import { idParam, versionField } from './record-fields';
import { idParamsSchema, notesField, paramsMmSchema } from './style';

export const DRAFT_STATES = ['drafting', 'approved', 'cut', 'sewn', 'delivered'] as const;
export type DraftState = (typeof DRAFT_STATES)[number];

/** The state each state may move to. Reopening (approved → drafting) is the only way back. */
export const DRAFT_TRANSITIONS: Record<DraftState, readonly DraftState[]> = {
  drafting: ['approved'],
  approved: ['drafting', 'cut'],
  cut: ['sewn'],
  sewn: ['delivered'],
  delivered: [],
};

/** Who may move a draft into each state (reopen = into drafting). */
export const TRANSITION_ROLES: Record<DraftState, readonly ('owner' | 'cutter')[]> = {
  drafting: ['owner'],
  approved: ['owner'],
  cut: ['owner', 'cutter'],
  sewn: ['owner', 'cutter'],
  delivered: ['owner', 'cutter'],
};

const stateField = z.enum(DRAFT_STATES, { error: `State must be one of: ${DRAFT_STATES.join(', ')}` });

/**
 * POST /api/drafts. Give `blockId`, or only `clientId` to start from the block the client's
 * last draft used (else their newest block), corrections included.
 */
export function draftCreateSchema(unit: LengthUnit) {
  return z
    .strictObject({
      clientId: idParam('Client').optional(),
      blockId: idParam('Block').optional(),
      styleId: idParam('Style'),
      fabricId: idParam('Fabric'),
      params: paramsMmSchema(unit).default({}),
      dueOn: dateField('Due date').nullable().default(null),
      notes: notesField('Notes').default(''),
    })
    .superRefine((v, ctx) => {
      if (v.blockId === undefined && v.clientId === undefined) {
        ctx.addIssue({ code: 'custom', path: ['blockId'], message: 'Block is required (or give the client to start from their block)' });
      }
    });
}
export type DraftCreate = z.infer<ReturnType<typeof draftCreateSchema>>;

/**
 * PATCH /api/drafts/:id: a save. `params` replaces the draft's parameter values as a whole
 * (a parameter left out falls back to the style's default).
 */
export function draftUpdateSchema(unit: LengthUnit) {
  return z.strictObject({
    version: versionField,
    blockId: idParam('Block').optional(),
    styleId: idParam('Style').optional(),
    fabricId: idParam('Fabric').optional(),
    params: paramsMmSchema(unit).optional(),
    dueOn: dateField('Due date').nullable().optional(),
    notes: notesField('Notes').optional(),
  });
}
export type DraftUpdate = z.infer<ReturnType<typeof draftUpdateSchema>>;

const statesQuery = z
  .string({ error: 'State must be text' })
  .transform((s) => s.split(',').map((p) => p.trim()).filter(Boolean))
  .pipe(z.array(stateField).min(1, { error: 'State must name at least one state' }));

/** GET /api/drafts query: filters, sort and page. */
export const draftListQuerySchema = z.strictObject({
  clientId: idParam('Client').optional(),
  blockId: idParam('Block').optional(),
  styleId: idParam('Style').optional(),
  fabricId: idParam('Fabric').optional(),
  state: statesQuery.optional(),
  sort: z
    .enum(['updated', 'created', 'due'], { error: 'Sort must be "updated", "created" or "due"' })
    .default('updated'),
  page: z.coerce.number({ error: 'Page must be a number' }).int({ error: 'Page must be a whole number' }).min(1, { error: 'Page starts at 1' }).default(1),
  pageSize: z.coerce
    .number({ error: 'Page size must be a number' })
    .int({ error: 'Page size must be a whole number' })
    .min(1, { error: 'Page size must be between 1 and 100' })
    .max(100, { error: 'Page size must be between 1 and 100' })
    .default(25),
});
export type DraftListQuery = z.infer<typeof draftListQuerySchema>;

const stateNote = notesField('Note', 1000).default('');

/** POST /api/drafts/:id/state: the move, with the version last read. */
export const draftStateSchema = z.discriminatedUnion(
  'to',
  [
    z.strictObject({ to: z.literal('approved'), version: versionField, note: stateNote }),
    z.strictObject({ to: z.literal('drafting'), version: versionField, note: stateNote }),
    z.strictObject({ to: z.literal('cut'), version: versionField, fabricId: idParam('Fabric used'), note: stateNote }),
    z.strictObject({ to: z.literal('sewn'), version: versionField, note: stateNote }),
    z.strictObject({ to: z.literal('delivered'), version: versionField, note: stateNote }),
  ],
  { error: 'To must be one of: drafting (reopen), approved, cut, sewn, delivered' },
);
export type DraftStateChange = z.infer<typeof draftStateSchema>;

/** POST /api/drafts/:id/revisions/:rev/restore. */
export const revisionRestoreSchema = z.strictObject({ version: versionField });

/** GET /api/queue: approved drafts waiting to be cut by default; later states on request. */
export const queueQuerySchema = z.strictObject({
  state: z.enum(['approved', 'cut', 'sewn'], { error: 'State must be "approved", "cut" or "sewn"' }).default('approved'),
});

export const draftParamsSchema = idParamsSchema('Draft');
export const revisionParamsSchema = z.strictObject({
  id: idParam('Draft'),
  rev: z.coerce
    .number({ error: 'Revision must be a revision number' })
    .int({ error: 'Revision must be a revision number' })
    .positive({ error: 'Revision must be a revision number' }),
});
