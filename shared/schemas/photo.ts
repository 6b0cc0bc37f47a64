/**
 * Fitting photos and fabric swatches. The upload form sends these fields as multipart text
 * beside the file; the /api/clients/:id/photos route validates them with this same object.
 */
import { z } from 'zod';
import { idParam, pastDate } from './record-fields';

export const PHOTO_KINDS = ['front', 'side', 'back', 'other'] as const;
export type PhotoKind = (typeof PHOTO_KINDS)[number];

/** The multipart field that carries the image, for photos and swatches alike. */
export const PHOTO_FIELD = 'photo';
/** Largest upload, bytes (the server refuses more with 413). */
export const PHOTO_MAX_BYTES = 10 * 1024 * 1024;
/** What the pickers offer; the server decides by the file's bytes, not by this list. */
export const PHOTO_ACCEPT = { 'image/jpeg': ['.jpg', '.jpeg'], 'image/png': ['.png'], 'image/webp': ['.webp'] } as const;

/** The text fields of a photo upload (all arrive as strings). */
export const photoFieldsSchema = z.strictObject(
  {
    kind: z.enum(PHOTO_KINDS, { error: 'View must be front, side, back or other' }),
    takenOn: pastDate('Date taken'),
    measurementSetId: z
      .union([z.literal(''), idParam('Measurement set')])
      .optional()
      .transform((v) => (v === '' || v === undefined ? null : v)),
  },
  { error: (issue) => (issue.code === 'unrecognized_keys' ? `Unknown field: ${issue.keys.join(', ')}` : undefined) },
);
export type PhotoFieldsInput = z.input<typeof photoFieldsSchema>;
export type PhotoFields = z.output<typeof photoFieldsSchema>;

/** A swatch upload carries the file only. */
export const swatchFieldsSchema = z.strictObject(
  {},
  { error: (issue) => (issue.code === 'unrecognized_keys' ? `Unknown field: ${issue.keys.join(', ')}` : 'Send the swatch file only') },
);

export const photoParamsSchema = z.strictObject({ id: idParam('Photo id') });
export const photoClientParamsSchema = z.strictObject({ id: idParam('Client id') });
export const swatchParamsSchema = z.strictObject({ id: idParam('Fabric id') });

/** The two sizes every stored image is kept in. */
export const IMAGE_SIZES = ['full', 'thumb'] as const;
export type ImageSize = (typeof IMAGE_SIZES)[number];

interface StoredImageView {
  /** Of the full-size image (the thumbnail is always WebP). */
  contentType: string;
  width: number;
  height: number;
  bytes: number;
  thumbWidth: number;
  thumbHeight: number;
  uploadedBy: { id: number | null; name: string };
  uploadedAt: string;
  /** Authorised addresses of the two sizes (same origin, session cookie). */
  fullUrl: string;
  thumbUrl: string;
}

export interface PhotoView extends StoredImageView {
  id: number;
  clientId: number;
  kind: PhotoKind;
  takenOn: string;
  measurementSetId: number | null;
}

export interface PhotoList {
  items: PhotoView[];
}

export interface SwatchView extends StoredImageView {
  fabricId: number;
}

/** `GET /api/fabrics/:id/swatch`: the fabric's swatch, or null when it has none. */
export interface SwatchOne {
  swatch: SwatchView | null;
}

/** `GET /api/swatches`: every swatch of the studio, for the fabrics list. */
export interface SwatchList {
  items: SwatchView[];
}
