import type { Transaction } from 'sequelize';
import type { ImageSize, PhotoFields, PhotoView } from '../../shared/schemas/photo.js';
import { Invalid, NotFound } from '../lib/errors.js';
import { MeasurementSet, Photo, User } from '../models/index.js';
import { imageFilesDelete, imageFilesWrite, imageSend, type UploadDeps } from '../uploads/image-files.js';
import { THUMB_CONTENT_TYPE, type ProcessedImage } from '../uploads/image-process.js';
import type { Response } from 'express';
import { clientFind, clientWritableRequire, ownerRequire, recordsDb } from './clients.js';
import type { ServiceContext } from './context.js';

/** A photo as the API returns it, with the authorised addresses of its two sizes. */
export function photoView(photo: Photo): PhotoView {
  return {
    id: photo.id,
    clientId: photo.clientId,
    kind: photo.kind,
    takenOn: photo.takenOn,
    measurementSetId: photo.measurementSetId,
    contentType: photo.contentType,
    width: photo.width,
    height: photo.height,
    bytes: photo.bytes,
    thumbWidth: photo.thumbWidth,
    thumbHeight: photo.thumbHeight,
    uploadedBy: { id: photo.uploadedById, name: photo.uploadedByName },
    uploadedAt: photo.createdAt.toISOString(),
    fullUrl: `/api/photos/${photo.id}/full`,
    thumbUrl: `/api/photos/${photo.id}/thumb`,
  };
}

/** The member's name, kept on the record so it reads the same after they leave the studio. */
export async function memberName(ctx: ServiceContext, transaction?: Transaction): Promise<string> {
  const user = await User.findOne({ where: { id: ctx.userId, studioId: ctx.studioId }, transaction });
  return user?.name ?? 'A former member';
}

/**
 * Refuses an upload before its body is read: only an owner adds photos, to a client of their
 * studio (404 for any other) that is not archived (409).
 */
export async function photoUploadAllowed(ctx: ServiceContext, clientId: number): Promise<void> {
  ownerRequire(ctx);
  const client = await clientFind(ctx, clientId);
  await clientWritableRequire(ctx, client);
}

/** A client's photos, latest fitting first. */
export async function photoList(ctx: ServiceContext, clientId: number): Promise<PhotoView[]> {
  await clientFind(ctx, clientId);
  const rows = await Photo.findAll({
    where: { studioId: ctx.studioId, clientId },
    order: [
      ['takenOn', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return rows.map(photoView);
}

/** The measurement set `setId` of this client, checked inside the transaction that saves the photo. */
async function setCheck(ctx: ServiceContext, clientId: number, setId: number, transaction: Transaction): Promise<void> {
  const set = await MeasurementSet.findOne({ where: { id: setId, setId, clientId, studioId: ctx.studioId }, transaction });
  if (!set) {
    throw new Invalid('The measurement set was not found.', { measurementSetId: 'Choose one of this client’s measurement sets, or none.' });
  }
}

/**
 * Stores a fitting photo: the files first, then the row in a transaction that checks the client
 * (still the studio's, not archived) and the measurement set; a failure removes the files.
 */
export async function photoCreate(deps: UploadDeps, ctx: ServiceContext, clientId: number, fields: PhotoFields, image: ProcessedImage): Promise<PhotoView> {
  ownerRequire(ctx);
  const photo = await imageFilesWrite(deps, `photos/${ctx.studioId}`, image, (_keys, columns) =>
    recordsDb().transaction(async (transaction) => {
      const client = await clientFind(ctx, clientId, transaction, true);
      await clientWritableRequire(ctx, client);
      if (fields.measurementSetId !== null) await setCheck(ctx, clientId, fields.measurementSetId, transaction);
      return Photo.create(
        {
          studioId: ctx.studioId,
          clientId,
          kind: fields.kind,
          takenOn: fields.takenOn,
          measurementSetId: fields.measurementSetId,
          ...columns,
          uploadedById: ctx.userId,
          uploadedByName: await memberName(ctx, transaction),
        },
        { transaction },
      );
    }),
  );
  return photoView(photo);
}

async function photoFind(ctx: ServiceContext, id: number, transaction?: Transaction): Promise<Photo> {
  const photo = await Photo.findOne({
    where: { id, studioId: ctx.studioId },
    transaction,
    lock: transaction ? transaction.LOCK.UPDATE : undefined,
  });
  if (!photo) throw new NotFound('photo');
  return photo;
}

/** Streams one size of a photo of the studio (404 for another studio's). */
export async function photoSend(deps: UploadDeps, ctx: ServiceContext, id: number, size: ImageSize, res: Response): Promise<void> {
  const photo = await photoFind(ctx, id);
  const [key, type] = size === 'full' ? [photo.fullKey, photo.contentType] : [photo.thumbKey, THUMB_CONTENT_TYPE];
  await imageSend(res, deps.storage, key, type, 'photo');
}

/** Deletes a photo: the row in a transaction, then, once that has committed, its two files. */
export async function photoDelete(deps: UploadDeps, ctx: ServiceContext, id: number): Promise<void> {
  ownerRequire(ctx);
  const keys = await recordsDb().transaction(async (transaction) => {
    const photo = await photoFind(ctx, id, transaction);
    await clientWritableRequire(ctx, await clientFind(ctx, photo.clientId, transaction));
    await photo.destroy({ transaction });
    return [photo.fullKey, photo.thumbKey];
  });
  await imageFilesDelete(deps, keys);
}
