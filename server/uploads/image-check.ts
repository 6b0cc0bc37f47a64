import { fileTypeFromBuffer } from 'file-type';
import { AppError, Invalid } from '../lib/errors.js';

/** The image formats kept, by the type their bytes show, with the file-name extensions each may carry. */
export const IMAGE_TYPES = {
  'image/jpeg': { label: 'JPEG', extensions: ['jpg', 'jpeg', 'jpe', 'jfif'] },
  'image/png': { label: 'PNG', extensions: ['png'] },
  'image/webp': { label: 'WebP', extensions: ['webp'] },
} as const;

export type ImageType = keyof typeof IMAGE_TYPES;

const ACCEPTED = 'JPEG, PNG or WebP';

function isImageType(mime: string): mime is ImageType {
  return Object.hasOwn(IMAGE_TYPES, mime);
}

/** 415 naming the field: the bytes are not an image kept here, or do not match what the file claims. */
function unsupported(field: string, message: string): AppError {
  return new AppError(415, 'unsupported_media_type', message, { [field]: message });
}

/**
 * Refuses a file name that carries a folder path or control characters. The name is never used
 * to store the file; a path in it means a client that is not the app, or a crafted request.
 */
export function fileNameCheck(field: string, name: string): void {
  if (/[/\\]/.test(name) || name === '..' || name === '.') {
    throw new Invalid('The file name contains a folder path.', { [field]: `The file name "${name}" contains a folder path: send the file on its own name.` });
  }
  // eslint-disable-next-line no-control-regex
  if (/[\u0000-\u001f\u007f]/.test(name) || name.length > 255) {
    throw new Invalid('The file name is not valid.', { [field]: 'The file name contains control characters or is longer than 255 characters: rename the file.' });
  }
}

/**
 * The image type shown by the file's own bytes (its signature, read with file-type), checked
 * against the type the browser declared and the file name's extension. The name and declared
 * type are never trusted to choose the type; they only have to agree with the bytes.
 */
export async function imageTypeDetect(field: string, bytes: Buffer, name: string, declared: string): Promise<ImageType> {
  const found = await fileTypeFromBuffer(bytes);
  if (!found) {
    throw unsupported(field, `This file is not an image: choose a photo in ${ACCEPTED} format.`);
  }
  if (found.mime === 'image/heic' || found.mime === 'image/heif') {
    throw unsupported(field, `HEIC photos cannot be read here: set the camera to save JPEG ("Most Compatible") or export the photo as JPEG.`);
  }
  if (!isImageType(found.mime)) {
    throw unsupported(field, `This file is ${found.ext.toUpperCase()}, not a photo format kept here: choose a ${ACCEPTED} image.`);
  }
  const type = IMAGE_TYPES[found.mime];
  const declaredType = declared.toLowerCase().split(';')[0]?.trim() ?? '';
  const vague = declaredType === '' || declaredType === 'application/octet-stream';
  const declaredMatches = vague || declaredType === found.mime || (found.mime === 'image/jpeg' && declaredType === 'image/jpg');
  const extension = /\.([^.]+)$/.exec(name)?.[1]?.toLowerCase();
  const extensionMatches = extension === undefined || (type.extensions as readonly string[]).includes(extension);
  if (!declaredMatches || !extensionMatches) {
    const claimed = extensionMatches ? declaredType : `.${extension}`;
    throw unsupported(field, `The file's contents are ${type.label} but it is named or sent as ${claimed}: the bytes do not match. Export the photo again and choose that file.`);
  }
  return found.mime;
}
