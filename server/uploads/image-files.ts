import { randomUUID } from 'node:crypto';
import { pipeline } from 'node:stream/promises';
import type { Response } from 'express';
import type { Logger } from 'pino';
import type { StoredImageAttributes } from '../models/stored-image.js';
import { NotFound } from '../lib/errors.js';
import { StorageMissing, type StorageAdapter } from '../storage/storage.js';
import { IMAGE_TYPES, type ImageType } from './image-check.js';
import type { ProcessedImage } from './image-process.js';

/** What the upload services need beside the request: where files go, and where to report a file left behind. */
export interface UploadDeps {
  storage: StorageAdapter;
  logger: Logger;
}

export type ImageKeys = Pick<StoredImageAttributes, 'fullKey' | 'thumbKey'>;

/** Removes stored files; a failure is logged (the record is already gone) rather than thrown. */
export async function imageFilesDelete(deps: UploadDeps, keys: string[]): Promise<void> {
  const results = await Promise.allSettled(keys.map((key) => deps.storage.delete(key)));
  results.forEach((result, i) => {
    if (result.status === 'rejected') deps.logger.error({ err: result.reason, key: keys[i] }, 'stored file could not be removed');
  });
}

/**
 * Writes the two files of an image under fresh keys, then runs `record` (which saves the row in
 * a transaction). When writing the second file or the record fails, the files already written
 * are removed, so a failed upload leaves neither a row nor a file.
 */
export async function imageFilesWrite<T>(
  deps: UploadDeps,
  folder: string,
  image: ProcessedImage,
  record: (keys: ImageKeys, columns: Omit<StoredImageAttributes, 'uploadedById' | 'uploadedByName'>) => Promise<T>,
): Promise<T> {
  const base = `${folder}/${randomUUID()}`;
  const fullKey = `${base}.${IMAGE_TYPES[image.full.contentType as ImageType].extensions[0]}`;
  const thumbKey = `${base}-thumb.webp`;
  const written: string[] = [];
  try {
    await deps.storage.put(fullKey, image.full.data, image.full.contentType);
    written.push(fullKey);
    await deps.storage.put(thumbKey, image.thumb.data, image.thumb.contentType);
    written.push(thumbKey);
    return await record(
      { fullKey, thumbKey },
      {
        fullKey,
        thumbKey,
        contentType: image.full.contentType,
        width: image.full.width,
        height: image.full.height,
        bytes: image.full.data.length,
        thumbWidth: image.thumb.width,
        thumbHeight: image.thumb.height,
      },
    );
  } catch (err) {
    // The put that failed may have left a partial object behind on some stores: remove it too.
    const attempted = written.length === 0 ? [fullKey] : written.length === 1 ? [fullKey, thumbKey] : written;
    await imageFilesDelete(deps, attempted);
    throw err;
  }
}

/**
 * Streams a stored image to the browser: its own content type, no sniffing, kept only in the
 * member's private browser cache, never by a shared cache.
 */
export async function imageSend(res: Response, storage: StorageAdapter, key: string, contentType: string, what: string): Promise<void> {
  let file;
  try {
    file = await storage.get(key);
  } catch (err) {
    if (err instanceof StorageMissing) throw new NotFound(`${what} file`);
    throw err;
  }
  res.setHeader('Content-Type', contentType);
  res.setHeader('X-Content-Type-Options', 'nosniff');
  res.setHeader('Cache-Control', 'private, max-age=3600');
  res.setHeader('Content-Disposition', 'inline');
  if (file.length !== undefined) res.setHeader('Content-Length', String(file.length));
  try {
    await pipeline(file.body, res);
  } catch (err) {
    // A browser that goes away mid-image ends the stream; nothing is left to answer.
    if (!res.headersSent) throw err;
    res.destroy();
  }
}
