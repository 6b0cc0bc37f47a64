import type { RequestHandler } from 'express';
import multer, { MulterError } from 'multer';
import { AppError, Invalid } from '../lib/errors.js';

/** Largest upload accepted, bytes (10 MB: a full-resolution phone photo is 2–8 MB). */
export const UPLOAD_MAX_BYTES = 10 * 1024 * 1024;
const FIELD_MAX_BYTES = 1024;

const upload = multer({
  storage: multer.memoryStorage(),
  // Keep the path a browser or crafted request puts in the name, so it can be refused, not silently cut off.
  preservePath: true,
  limits: { fileSize: UPLOAD_MAX_BYTES, files: 1, fields: 10, fieldSize: FIELD_MAX_BYTES, fieldNameSize: 100, parts: 12 },
});

function uploadError(err: MulterError, field: string): AppError {
  const name = err.field ?? field;
  switch (err.code) {
    case 'LIMIT_FILE_SIZE': {
      const text = `The file is larger than ${UPLOAD_MAX_BYTES / 1024 / 1024} MB: export the photo smaller (or choose a lower camera resolution) and upload again.`;
      return new AppError(413, 'too_large', text, { [name]: text });
    }
    case 'LIMIT_FILE_COUNT':
      return new Invalid('Send one file at a time.', { [field]: 'Send one file at a time.' });
    case 'LIMIT_UNEXPECTED_FILE':
      return new Invalid(`Unexpected file field "${name}".`, { [name]: `Send the image in the "${field}" field.` });
    case 'LIMIT_FIELD_VALUE':
      return new Invalid('A field is too long.', { [name]: `${name} is too long.` });
    default:
      return new Invalid('The upload could not be read.', { [field]: `The upload could not be read (${err.message}). Try again.` });
  }
}

/**
 * Reads one multipart file from `field` into memory (never to a temporary file), with limits;
 * the other parts become `req.body`. Limit breaches become 400/413 answers naming the field.
 */
export function singleImageUpload(field: string): RequestHandler {
  const handler = upload.single(field);
  return (req, res, next) => {
    handler(req, res, (err?: unknown) => {
      if (err instanceof MulterError) return next(uploadError(err, field));
      if (err) return next(new Invalid('The upload could not be read.', { [field]: 'The upload was cut off or malformed. Try again.' }));
      next();
    });
  };
}

/** The uploaded file of `field`, or 400 naming the field when none was sent. */
export function uploadedFile(file: Express.Multer.File | undefined, field: string): Express.Multer.File {
  if (!file || file.size === 0) {
    throw new Invalid('Choose an image to upload.', { [field]: 'Choose an image file (JPEG, PNG or WebP) to upload.' });
  }
  return file;
}
