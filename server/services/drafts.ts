import { literal, type OrderItem, type Transaction, type WhereOptions } from 'sequelize';
import type { DraftCreate, DraftListQuery, DraftUpdate } from '../../shared/schemas/draft.js';
import type { DraftChange, DraftDto, DraftSnapshot, DraftSummaryDto, RevisionDto, RevisionKind, RevisionSummaryDto } from '../../shared/schemas/draft-dto.js';
import { draftInputBuild } from '../../shared/schemas/draft-input-build.js';
import { PARAM_KEYS } from '../../shared/schemas/style.js';
import { Invalid } from '../lib/errors.js';
import { Block, Draft, DraftRevision, Style } from '../models/index.js';
import { blockDto, blockToUseFind } from './blocks.js';
import { clientWritableRequire } from './clients.js';
import type { ServiceContext } from './context.js';
import { draftCompute } from './draft-engine.js';
import { clientFind, fabricRead, peopleByIds } from './draft-records.js';
import { draftDto, draftFind, draftSummaries, partsOf, type DraftPreload, revisionDto, revisionFind, revisionSummary, snapshotOf } from './draft-view.js';
import { styleDto } from './styles.js';
import { versionCheck, versionedWrite, WriteConflict } from './versioned.js';

const FIX = 'Some fields need attention.';
export const STALE_DRAFT =
  'This draft was saved by someone else since you opened it. Reload it to see their version, or keep yours as a new revision by saving it again on top.';
export const READ_ONLY = 'This draft is approved and read-only: reopen it to change it.';

/** The fields that differ between two snapshots, parameters one by one. */
export function snapshotDiff(before: DraftSnapshot, after: DraftSnapshot): DraftChange[] {
  const changes: DraftChange[] = [];
  for (const field of ['blockId', 'styleId', 'fabricId', 'dueOn', 'notes'] as const) {
    if (before[field] !== after[field]) changes.push({ field, from: before[field], to: after[field] });
  }
  for (const key of PARAM_KEYS) {
    const from = before.params[key] ?? null;
    const to = after.params[key] ?? null;
    if (from !== to) changes.push({ field: `params.${key}`, from, to });
  }
  return changes;
}

/**
 * Checks the snapshot's records (this studio's, the block of this client), builds the engine
 * input and runs the engine. Bad references and refusals are 400s naming the field.
 */
async function snapshotCompute(c: ServiceContext, unit: Draft['unit'], clientId: number, s: DraftSnapshot, transaction: Transaction) {
  const fields: Record<string, string> = {};
  const block = await Block.findOne({ where: { id: s.blockId, studioId: c.studioId }, transaction });
  if (!block) fields.blockId = 'No such block in this studio';
  else if (block.clientId !== clientId) fields.blockId = "This block is another client's: pick one of this client's blocks";
  const style = await Style.findOne({ where: { id: s.styleId, studioId: c.studioId }, transaction });
  if (!style) fields.styleId = 'No such style in this studio';
  const fabric = await fabricRead(c, s.fabricId, transaction);
  if (!fabric) fields.fabricId = 'No such fabric in this studio';
  if (style && !style.racerBack && s.params.racerBackInset !== undefined) {
    fields['params.racerBackInset'] = 'Racer back inset applies only to a racer-back style';
  }
  if (!block || !style || !fabric || Object.keys(fields).length) throw new Invalid(FIX, fields);
  const loaded = { block: await blockDto(c, block, transaction), style: styleDto(style), fabric };
  const input = draftInputBuild(partsOf(unit, loaded.block, loaded.style, loaded.fabric), s.params);
  const result = draftCompute(input);
  if (!result.ok) throw new Invalid('The engine cannot draft these values.', result.fields);
  return { input, computed: result.computed, engineVersion: result.engineVersion, loaded };
}

async function revisionWrite(
  c: ServiceContext,
  draft: Draft,
  s: DraftSnapshot,
  kind: RevisionKind,
  changes: DraftChange[],
  transaction: Transaction,
  restoredFrom: number | null = null,
): Promise<DraftPreload> {
  const { input, computed, engineVersion, loaded } = await snapshotCompute(c, draft.unit, draft.clientId, s, transaction);
  draft.set({ ...s, revision: draft.revision + 1 });
  // Saved first: a concurrent writer fails the version check here, before a revision is written.
  await draft.save({ transaction });
  const current = await DraftRevision.create(
    { studioId: c.studioId, draftId: draft.id, number: draft.revision, kind, restoredFrom, userId: c.userId, snapshot: s, changes, input, computed, engineVersion },
    { transaction },
  );
  return { ...loaded, current };
}

/** Starts a draft from a block (or the client's block to use): revision 1. */
export async function draftCreate(c: ServiceContext, body: DraftCreate): Promise<DraftDto> {
  return Draft.sequelize!.transaction(async (transaction) => {
    let blockId = body.blockId;
    if (blockId === undefined) {
      await clientFind(c, body.clientId!, transaction);
      const found = await blockToUseFind(c, body.clientId!, transaction);
      if (!found.block) throw new Invalid(FIX, { blockId: 'This client has no block yet: make one from a measurement set first' });
      blockId = found.block.id;
    }
    const block = await Block.findOne({ where: { id: blockId, studioId: c.studioId }, transaction });
    if (!block) throw new Invalid(FIX, { blockId: 'No such block in this studio' });
    if (body.clientId !== undefined && block.clientId !== body.clientId) {
      throw new Invalid(FIX, { blockId: "This block is another client's: pick one of this client's blocks" });
    }
    await clientWritableRequire(c, await clientFind(c, block.clientId, transaction));
    const style = await Style.findOne({ where: { id: body.styleId, studioId: c.studioId }, transaction });
    if (style?.archived) throw new Invalid(FIX, { styleId: 'This style is archived: restore it (or pick another) to start a draft' });
    const snapshot: DraftSnapshot = { blockId, styleId: body.styleId, fabricId: body.fabricId, params: body.params, dueOn: body.dueOn, notes: body.notes };
    const unit = c.unit;
    const { input, computed, engineVersion, loaded } = await snapshotCompute(c, unit, block.clientId, snapshot, transaction);
    const draft = await Draft.create(
      { studioId: c.studioId, clientId: block.clientId, unit, ...snapshot, state: 'drafting', stateChangedAt: new Date(), revision: 1, createdBy: c.userId },
      { transaction },
    );
    const current = await DraftRevision.create(
      { studioId: c.studioId, draftId: draft.id, number: 1, kind: 'created', restoredFrom: null, userId: c.userId, snapshot, changes: [], input, computed, engineVersion },
      { transaction },
    );
    return draftDto(c, draft, transaction, { ...loaded, current });
  });
}

export async function draftGet(c: ServiceContext, id: number): Promise<DraftDto> {
  return draftDto(c, await draftFind(c, id));
}

const current = (c: ServiceContext, id: number) => async () => draftDto(c, await draftFind(c, id));

/** A save: a new revision when anything changed. Approved drafts and stale versions answer 409. */
export async function draftUpdate(c: ServiceContext, id: number, body: DraftUpdate): Promise<DraftDto> {
  const { version, ...fields } = body;
  return versionedWrite(
    Draft.sequelize!,
    async (transaction) => {
      const draft = await draftFind(c, id, transaction, true);
      versionCheck(draft, version);
      if (draft.state !== 'drafting') throw new WriteConflict(READ_ONLY);
      const before = snapshotOf(draft);
      const after: DraftSnapshot = { ...before, ...Object.fromEntries(Object.entries(fields).filter(([, v]) => v !== undefined)) };
      const changes = snapshotDiff(before, after);
      if (changes.length === 0) return draftDto(c, draft, transaction);
      return draftDto(c, draft, transaction, await revisionWrite(c, draft, after, 'saved', changes, transaction));
    },
    { message: STALE_DRAFT, current: current(c, id) },
  );
}

/** Restores an earlier revision as a new one, recomputed by the current engine. */
export async function revisionRestore(c: ServiceContext, id: number, number: number, version: number): Promise<DraftDto> {
  return versionedWrite(
    Draft.sequelize!,
    async (transaction) => {
      const draft = await draftFind(c, id, transaction, true);
      const old = await revisionFind(c, draft.id, number, transaction);
      versionCheck(draft, version);
      if (draft.state !== 'drafting') throw new WriteConflict(READ_ONLY);
      const changes = snapshotDiff(snapshotOf(draft), old.snapshot);
      return draftDto(c, draft, transaction, await revisionWrite(c, draft, old.snapshot, 'restored', changes, transaction, old.number));
    },
    { message: STALE_DRAFT, current: current(c, id) },
  );
}

/** Reopening writes the draft's snapshot again as a new revision, drawn by the current engine. */
export async function reopenRevisionWrite(c: ServiceContext, draft: Draft, transaction: Transaction): Promise<DraftPreload> {
  return revisionWrite(c, draft, snapshotOf(draft), 'reopened', [], transaction);
}

export async function draftList(c: ServiceContext, q: DraftListQuery): Promise<{ items: DraftSummaryDto[]; total: number; page: number; pageSize: number }> {
  const where: WhereOptions<Draft> = { studioId: c.studioId };
  if (q.clientId !== undefined) Object.assign(where, { clientId: q.clientId });
  if (q.blockId !== undefined) Object.assign(where, { blockId: q.blockId });
  if (q.styleId !== undefined) Object.assign(where, { styleId: q.styleId });
  if (q.fabricId !== undefined) Object.assign(where, { fabricId: q.fabricId });
  if (q.state !== undefined) Object.assign(where, { state: q.state });
  // By due date, drafts without one come last.
  const order: OrderItem[] =
    q.sort === 'due'
      ? [[literal('due_on IS NULL'), 'ASC'], ['dueOn', 'ASC'], ['id', 'ASC']]
      : q.sort === 'created'
        ? [['createdAt', 'DESC'], ['id', 'DESC']]
        : [['updatedAt', 'DESC'], ['id', 'DESC']];
  const { rows, count } = await Draft.findAndCountAll({ where, order, limit: q.pageSize, offset: (q.page - 1) * q.pageSize });
  return { items: await draftSummaries(c, rows), total: count, page: q.page, pageSize: q.pageSize };
}

export async function revisionList(c: ServiceContext, id: number): Promise<{ items: RevisionSummaryDto[] }> {
  const draft = await draftFind(c, id);
  const rows = await DraftRevision.findAll({
    where: { draftId: draft.id, studioId: c.studioId },
    attributes: ['id', 'number', 'kind', 'restoredFrom', 'userId', 'changes', 'engineVersion', 'createdAt'],
    order: [['number', 'DESC']],
  });
  const people = await peopleByIds(c, rows.map((r) => r.userId));
  return { items: rows.map((r) => revisionSummary(r, people)) };
}

export async function revisionGet(c: ServiceContext, id: number, number: number): Promise<RevisionDto> {
  const draft = await draftFind(c, id);
  const revision = await revisionFind(c, draft.id, number);
  return revisionDto(revision, await peopleByIds(c, [revision.userId]));
}
