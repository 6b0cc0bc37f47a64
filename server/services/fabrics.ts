import { ForeignKeyConstraintError, literal, Op, type Transaction, type WhereOptions } from 'sequelize';
import type { FabricCreate, FabricListQuery, FabricPage, FabricUpdate, FabricView } from '../../shared/schemas/fabric.js';
import { Conflict, NotFound } from '../lib/errors.js';
import { Fabric } from '../models/index.js';
import { likeContains, ownerRequire, recordsDb } from './clients.js';
import type { ServiceContext } from './context.js';
import { versionCheck, versionedWrite } from './versioned.js';

/** A fabric as the API returns it: width in mm with the studio's unit beside it. */
export function fabricView(fabric: Fabric, ctx: ServiceContext): FabricView {
  return {
    id: fabric.id,
    name: fabric.name,
    fibreContent: fabric.fibreContent,
    widthMm: fabric.widthMm === null ? null : Number(fabric.widthMm),
    weightGsm: fabric.weightGsm,
    stretchCrosswise: fabric.stretchCrosswise,
    stretchLengthwise: fabric.stretchLengthwise,
    recovery: fabric.recovery,
    notes: fabric.notes,
    version: fabric.version,
    createdAt: fabric.createdAt.toISOString(),
    updatedAt: fabric.updatedAt.toISOString(),
    studioUnit: ctx.unit,
  };
}

/** The studio's fabric `id` (locked when inside a transaction), or 404. */
async function fabricFind(ctx: ServiceContext, id: number, transaction?: Transaction): Promise<Fabric> {
  const fabric = await Fabric.findOne({
    where: { id, studioId: ctx.studioId },
    transaction,
    lock: transaction ? transaction.LOCK.UPDATE : undefined,
  });
  if (!fabric) throw new NotFound('fabric');
  return fabric;
}

/** One page of the studio's fabrics, searched by name or fibre content. */
export async function fabricList(ctx: ServiceContext, query: FabricListQuery): Promise<FabricPage> {
  const where: WhereOptions<Fabric>[] = [{ studioId: ctx.studioId }];
  const bind: Record<string, string> = {};
  if (query.q) {
    bind.q = likeContains(query.q);
    const match = { [Op.like]: literal('$q') };
    where.push({ [Op.or]: [{ name: match }, { fibreContent: match }] });
  }
  const direction = query.order === 'desc' ? 'DESC' : 'ASC';
  const filter = { [Op.and]: where };
  const { count: total, rows } = await Fabric.findAndCountAll({
      where: filter,
      bind,
      order: [
        [query.sort, direction],
        ['id', direction],
      ],
      limit: query.pageSize,
      offset: (query.page - 1) * query.pageSize,
    });
  return { items: rows.map((f) => fabricView(f, ctx)), total, page: query.page, pageSize: query.pageSize };
}

/** One fabric of the studio. */
export async function fabricGet(ctx: ServiceContext, id: number): Promise<FabricView> {
  return fabricView(await fabricFind(ctx, id), ctx);
}

/** Adds a fabric to the studio. */
export async function fabricCreate(ctx: ServiceContext, input: FabricCreate): Promise<FabricView> {
  ownerRequire(ctx);
  const fabric = await Fabric.create({
    studioId: ctx.studioId,
    name: input.name,
    fibreContent: input.fibreContent ?? null,
    widthMm: input.widthMm ?? null,
    weightGsm: input.weightGsm ?? null,
    stretchCrosswise: input.stretchCrosswise,
    stretchLengthwise: input.stretchLengthwise ?? null,
    recovery: input.recovery,
    notes: input.notes ?? null,
  });
  return fabricGet(ctx, fabric.id);
}

const STALE_FABRIC = 'Someone else changed this fabric since you opened it. Compare the current details with yours and save again.';

/** Changes a fabric, provided nobody has changed it since `input.version`. */
export async function fabricUpdate(ctx: ServiceContext, id: number, input: FabricUpdate): Promise<FabricView> {
  ownerRequire(ctx);
  await versionedWrite(
    recordsDb(),
    async (transaction) => {
      const fabric = await fabricFind(ctx, id, transaction);
      versionCheck(fabric, input.version);
      const { version: _version, ...changes } = input;
      fabric.set(changes);
      await fabric.save({ transaction });
    },
    { message: STALE_FABRIC, current: () => fabricGet(ctx, id) },
  );
  return fabricGet(ctx, id);
}

/** Deletes a fabric that no draft uses (the database's foreign keys refuse the rest). */
export async function fabricDelete(ctx: ServiceContext, id: number): Promise<void> {
  ownerRequire(ctx);
  try {
    await recordsDb().transaction(async (transaction) => {
      const fabric = await fabricFind(ctx, id, transaction);
      await fabric.destroy({ transaction });
    });
  } catch (err) {
    if (err instanceof ForeignKeyConstraintError) {
      throw new Conflict('Drafts use this fabric, so it cannot be deleted.', await fabricGet(ctx, id));
    }
    throw err;
  }
}
