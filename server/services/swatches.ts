import type { Response } from 'express';
import type { Transaction } from 'sequelize';
import type { ImageSize, SwatchView } from '../../shared/schemas/photo.js';
import { NotFound } from '../lib/errors.js';
import { Fabric, Swatch } from '../models/index.js';
import { imageFilesDelete, imageFilesWrite, imageSend, type UploadDeps } from '../uploads/image-files.js';
import { THUMB_CONTENT_TYPE, type ProcessedImage } from '../uploads/image-process.js';
import { ownerRequire, recordsDb } from './clients.js';
import type { ServiceContext } from './context.js';
import { memberName } from './photos.js';

/**
 * A swatch as the API returns it. The addresses carry the random name of the current files, so
 * a browser never shows a replaced swatch from its cache.
 */
export function swatchView(swatch: Swatch): SwatchView {
  const v = swatch.fullKey.slice(swatch.fullKey.lastIndexOf('/') + 1).replace(/\.[a-z]+$/, '');
  return {
    fabricId: swatch.fabricId,
    contentType: swatch.contentType,
    width: swatch.width,
    height: swatch.height,
    bytes: swatch.bytes,
    thumbWidth: swatch.thumbWidth,
    thumbHeight: swatch.thumbHeight,
    uploadedBy: { id: swatch.uploadedById, name: swatch.uploadedByName },
    uploadedAt: swatch.updatedAt.toISOString(),
    fullUrl: `/api/fabrics/${swatch.fabricId}/swatch/full?v=${v}`,
    thumbUrl: `/api/fabrics/${swatch.fabricId}/swatch/thumb?v=${v}`,
  };
}

/** The studio's fabric `id` (locked inside a transaction), or 404. */
async function fabricFind(ctx: ServiceContext, id: number, transaction?: Transaction): Promise<Fabric> {
  const fabric = await Fabric.findOne({ where: { id, studioId: ctx.studioId }, transaction, lock: transaction ? transaction.LOCK.UPDATE : undefined });
  if (!fabric) throw new NotFound('fabric');
  return fabric;
}

/** Refuses a swatch upload before its body is read: owners only (403), the studio's fabric only (404). */
export async function swatchUploadAllowed(ctx: ServiceContext, fabricId: number): Promise<void> {
  ownerRequire(ctx);
  await fabricFind(ctx, fabricId);
}

/** The fabric's swatch, or null. */
export async function swatchGet(ctx: ServiceContext, fabricId: number): Promise<SwatchView | null> {
  await fabricFind(ctx, fabricId);
  const swatch = await Swatch.findOne({ where: { studioId: ctx.studioId, fabricId } });
  return swatch ? swatchView(swatch) : null;
}

/** Every swatch of the studio (a studio keeps tens of fabrics, not thousands). */
export async function swatchList(ctx: ServiceContext): Promise<SwatchView[]> {
  const rows = await Swatch.findAll({ where: { studioId: ctx.studioId }, order: [['fabricId', 'ASC']] });
  return rows.map(swatchView);
}

/**
 * Sets or replaces a fabric's swatch: the new files first, then the row in a transaction; the
 * replaced files are removed only after that commits, and the new ones if it fails.
 */
export async function swatchPut(deps: UploadDeps, ctx: ServiceContext, fabricId: number, image: ProcessedImage): Promise<SwatchView> {
  ownerRequire(ctx);
  const { swatch, replaced } = await imageFilesWrite(deps, `swatches/${ctx.studioId}`, image, (_keys, columns) =>
    recordsDb().transaction(async (transaction) => {
      await fabricFind(ctx, fabricId, transaction);
      const uploadedByName = await memberName(ctx, transaction);
      const existing = await Swatch.findOne({ where: { studioId: ctx.studioId, fabricId }, transaction, lock: transaction.LOCK.UPDATE });
      const fields = { ...columns, uploadedById: ctx.userId, uploadedByName };
      if (!existing) {
        return { swatch: await Swatch.create({ studioId: ctx.studioId, fabricId, ...fields }, { transaction }), replaced: [] as string[] };
      }
      const old = [existing.fullKey, existing.thumbKey];
      existing.set(fields);
      existing.changed('updatedAt', true);
      return { swatch: await existing.save({ transaction }), replaced: old };
    }),
  );
  await imageFilesDelete(deps, replaced);
  return swatchView(swatch);
}

/** Streams one size of a fabric's swatch (404 when the fabric or its swatch is not the studio's). */
export async function swatchSend(deps: UploadDeps, ctx: ServiceContext, fabricId: number, size: ImageSize, res: Response): Promise<void> {
  await fabricFind(ctx, fabricId);
  const swatch = await Swatch.findOne({ where: { studioId: ctx.studioId, fabricId } });
  if (!swatch) throw new NotFound('swatch');
  const [key, type] = size === 'full' ? [swatch.fullKey, swatch.contentType] : [swatch.thumbKey, THUMB_CONTENT_TYPE];
  await imageSend(res, deps.storage, key, type, 'swatch');
}

/** Removes a fabric's swatch: the row, then its files once that has committed. */
export async function swatchDelete(deps: UploadDeps, ctx: ServiceContext, fabricId: number): Promise<void> {
  ownerRequire(ctx);
  const keys = await recordsDb().transaction(async (transaction) => {
    await fabricFind(ctx, fabricId, transaction);
    const swatch = await Swatch.findOne({ where: { studioId: ctx.studioId, fabricId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!swatch) throw new NotFound('swatch');
    await swatch.destroy({ transaction });
    return [swatch.fullKey, swatch.thumbKey];
  });
  await imageFilesDelete(deps, keys);
}
