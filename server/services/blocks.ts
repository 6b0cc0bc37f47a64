import { QueryTypes, type Transaction } from 'sequelize';
import type { BlockCreate, BlockDto, BlockUpdate, CorrectionCreate, CorrectionDto, PersonDto } from '../../shared/schemas/block.js';
import { Invalid, NotFound } from '../lib/errors.js';
import { Block, BlockCorrection } from '../models/index.js';
import type { ServiceContext } from './context.js';
import { clientWritableRequire } from './clients.js';
import { clientFind, measurementSetRead, peopleByIds, type MeasurementSetRead } from './draft-records.js';
import { versionCheck, versionedWrite } from './versioned.js';

function correctionDto(c: BlockCorrection, people: Map<number, PersonDto>): CorrectionDto {
  return {
    id: c.id,
    target: c.target,
    amount: c.amount,
    note: c.note,
    notedOn: c.notedOn,
    createdAt: c.createdAt.toISOString(),
    createdBy: c.createdBy === null ? null : (people.get(c.createdBy) ?? null),
  };
}

/** When each block was last used by a draft (the draft's last save or move). */
async function blocksLastUsed(c: ServiceContext, ids: number[], transaction?: Transaction): Promise<Map<number, string>> {
  if (ids.length === 0) return new Map();
  const rows = await Block.sequelize!.query<{ blockId: number; at: Date }>(
    'SELECT block_id AS blockId, MAX(updated_at) AS at FROM drafts WHERE studio_id = ? AND block_id IN (?) GROUP BY block_id',
    { replacements: [c.studioId, ids], type: QueryTypes.SELECT, transaction },
  );
  return new Map(rows.map((r) => [Number(r.blockId), new Date(r.at).toISOString()]));
}

/** Blocks with their corrections, sets and last use, as the API shows them. */
export async function blockDtos(c: ServiceContext, blocks: Block[], transaction?: Transaction): Promise<BlockDto[]> {
  const ids = blocks.map((b) => b.id);
  const corrections = ids.length
    ? await BlockCorrection.findAll({ where: { blockId: ids, studioId: c.studioId }, order: [['notedOn', 'ASC'], ['id', 'ASC']], transaction })
    : [];
  const people = await peopleByIds(c, corrections.map((k) => k.createdBy), transaction);
  const lastUsed = await blocksLastUsed(c, ids, transaction);
  const sets = new Map<number, MeasurementSetRead | null>();
  for (const b of blocks) {
    if (!sets.has(b.measurementSetId)) sets.set(b.measurementSetId, await measurementSetRead(c, b.clientId, b.measurementSetId, transaction));
  }
  return blocks.map((b) => {
    const set = sets.get(b.measurementSetId);
    if (!set) throw new Error(`block ${b.id}: measurement set ${b.measurementSetId} is missing`);
    return {
      id: b.id,
      clientId: b.clientId,
      measurementSetId: b.measurementSetId,
      measuredOn: set.takenOn,
      newerSetVersionId: set.newerVersionId,
      measurements: set.measurements,
      name: b.name,
      notes: b.notes,
      corrections: corrections.filter((k) => k.blockId === b.id).map((k) => correctionDto(k, people)),
      lastUsedAt: lastUsed.get(b.id) ?? null,
      version: b.version,
      createdAt: b.createdAt.toISOString(),
      updatedAt: b.updatedAt.toISOString(),
    };
  });
}

export async function blockDto(c: ServiceContext, block: Block, transaction?: Transaction): Promise<BlockDto> {
  const [dto] = await blockDtos(c, [block], transaction);
  return dto!;
}

/** A block of the caller's studio (and of `clientId` when given), or 404. */
export async function blockFind(c: ServiceContext, id: number, clientId?: number, transaction?: Transaction): Promise<Block> {
  const where = clientId === undefined ? { id, studioId: c.studioId } : { id, studioId: c.studioId, clientId };
  const block = await Block.findOne({ where, transaction });
  if (!block) throw new NotFound('block');
  return block;
}

/** A set of this client that a tank top can be drafted from, or a 400 naming `measurementSetId`. */
async function setUsable(c: ServiceContext, clientId: number, setId: number, transaction: Transaction): Promise<MeasurementSetRead> {
  const set = await measurementSetRead(c, clientId, setId, transaction);
  if (!set) throw new Invalid('Some fields need attention.', { measurementSetId: 'No such measurement set for this client' });
  return set;
}

export async function blockList(c: ServiceContext, clientId: number): Promise<{ items: BlockDto[] }> {
  await clientFind(c, clientId);
  const blocks = await Block.findAll({ where: { studioId: c.studioId, clientId }, order: [['id', 'DESC']] });
  const items = await blockDtos(c, blocks);
  // Most recently used first; never-used blocks after, newest first.
  items.sort((a, b) => (b.lastUsedAt ?? '').localeCompare(a.lastUsedAt ?? '') || b.id - a.id);
  return { items };
}

export async function blockGet(c: ServiceContext, clientId: number, blockId: number): Promise<BlockDto> {
  return blockDto(c, await blockFind(c, blockId, clientId));
}

/**
 * The block a new draft for this client starts from: the one their last draft used, with its
 * corrections; else their newest block.
 */
export async function blockToUseFind(c: ServiceContext, clientId: number, transaction?: Transaction): Promise<{ block: Block | null; reason: 'last-used' | 'newest' | 'none' }> {
  const rows = await Block.sequelize!.query<{ blockId: number }>(
    'SELECT block_id AS blockId FROM drafts WHERE studio_id = ? AND client_id = ? ORDER BY updated_at DESC, id DESC LIMIT 1',
    { replacements: [c.studioId, clientId], type: QueryTypes.SELECT, transaction },
  );
  const lastId = rows[0]?.blockId;
  if (lastId !== undefined) {
    const block = await Block.findOne({ where: { id: Number(lastId), studioId: c.studioId, clientId }, transaction });
    if (block) return { block, reason: 'last-used' };
  }
  const newest = await Block.findOne({ where: { studioId: c.studioId, clientId }, order: [['id', 'DESC']], transaction });
  return newest ? { block: newest, reason: 'newest' } : { block: null, reason: 'none' };
}

export async function blockToUse(c: ServiceContext, clientId: number): Promise<{ block: BlockDto | null; reason: 'last-used' | 'newest' | 'none' }> {
  await clientFind(c, clientId);
  const found = await blockToUseFind(c, clientId);
  return { block: found.block ? await blockDto(c, found.block) : null, reason: found.reason };
}

/** An archived client's records are read-only until the client is restored (409). */
async function clientWritable(c: ServiceContext, clientId: number, transaction?: Transaction): Promise<void> {
  await clientWritableRequire(c, await clientFind(c, clientId, transaction));
}

export async function blockCreate(c: ServiceContext, clientId: number, input: BlockCreate): Promise<BlockDto> {
  await clientWritable(c, clientId);
  return Block.sequelize!.transaction(async (transaction) => {
    const set = await setUsable(c, clientId, input.measurementSetId, transaction);
    const block = await Block.create(
      {
        studioId: c.studioId,
        clientId,
        measurementSetId: input.measurementSetId,
        name: input.name || `Block from the fitting of ${set.takenOn}`,
        notes: input.notes,
        createdBy: c.userId,
      },
      { transaction },
    );
    for (const k of input.corrections) {
      await BlockCorrection.create({ studioId: c.studioId, blockId: block.id, ...k, createdBy: c.userId }, { transaction });
    }
    return blockDto(c, block, transaction);
  });
}

const STALE_BLOCK = 'This block was changed by someone else since you opened it. Reload it to see their changes, then apply yours again.';

export async function blockUpdate(c: ServiceContext, clientId: number, blockId: number, input: BlockUpdate): Promise<BlockDto> {
  const { version, ...changes } = input;
  return versionedWrite(
    Block.sequelize!,
    async (transaction) => {
      const block = await blockFind(c, blockId, clientId, transaction);
      await clientWritable(c, clientId, transaction);
      versionCheck(block, version);
      if (changes.measurementSetId !== undefined) await setUsable(c, clientId, changes.measurementSetId, transaction);
      block.set(changes);
      if (block.changed()) await block.save({ transaction });
      return blockDto(c, block, transaction);
    },
    { message: STALE_BLOCK, current: async () => blockDto(c, await blockFind(c, blockId, clientId)) },
  );
}

/** Adds a fit correction. Corrections are dated entries, so two people adding at once both keep theirs. */
export async function correctionAdd(c: ServiceContext, clientId: number, blockId: number, input: CorrectionCreate): Promise<BlockDto> {
  return Block.sequelize!.transaction(async (transaction) => {
    const block = await blockFind(c, blockId, clientId, transaction);
    await clientWritable(c, clientId, transaction);
    await BlockCorrection.create({ studioId: c.studioId, blockId: block.id, ...input, createdBy: c.userId }, { transaction });
    return blockDto(c, block, transaction);
  });
}

export async function correctionRemove(c: ServiceContext, clientId: number, blockId: number, correctionId: number): Promise<BlockDto> {
  return Block.sequelize!.transaction(async (transaction) => {
    const block = await blockFind(c, blockId, clientId, transaction);
    await clientWritable(c, clientId, transaction);
    const correction = await BlockCorrection.findOne({ where: { id: correctionId, blockId: block.id, studioId: c.studioId }, transaction });
    if (!correction) throw new NotFound('correction');
    await correction.destroy({ transaction });
    return blockDto(c, block, transaction);
  });
}
