import sharp from 'sharp';
import { AppError, Invalid } from '../lib/errors.js';
import type { ImageType } from './image-check.js';

/** Largest picture decoded, in pixels: above any phone or tablet camera (48 MP), below a decompression bomb. */
export const MAX_INPUT_PIXELS = 60_000_000;
/** Long edge of the kept full-size image, px: enough to see fit and drag lines on a large screen. */
export const FULL_EDGE_PX = 3200;
/** Long edge of a thumbnail, px: sharp on a high-density screen at the grid's tile size. */
export const THUMB_EDGE_PX = 400;
export const THUMB_CONTENT_TYPE = 'image/webp';

export interface ImageOut {
  data: Buffer;
  contentType: string;
  width: number;
  height: number;
}

export interface ProcessedImage {
  full: ImageOut;
  thumb: ImageOut;
}

function encode(image: sharp.Sharp, type: ImageType): sharp.Sharp {
  if (type === 'image/png') return image.png();
  if (type === 'image/webp') return image.webp({ quality: 85 });
  return image.jpeg({ quality: 85 });
}

/**
 * Decodes the upload and writes it again: turned upright from its EXIF orientation first
 * (`rotate()`), then encoded without any metadata — sharp drops EXIF (camera, time, GPS
 * position), XMP, IPTC and the ICC profile unless asked to keep them — plus a WebP thumbnail.
 */
export async function imageProcess(field: string, bytes: Buffer, type: ImageType): Promise<ProcessedImage> {
  try {
    const upright = sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS, failOn: 'error' }).rotate();
    const [full, thumb] = await Promise.all([
      encode(upright.clone().resize({ width: FULL_EDGE_PX, height: FULL_EDGE_PX, fit: 'inside', withoutEnlargement: true }), type).toBuffer({
        resolveWithObject: true,
      }),
      upright
        .clone()
        .resize({ width: THUMB_EDGE_PX, height: THUMB_EDGE_PX, fit: 'inside', withoutEnlargement: true })
        .webp({ quality: 75 })
        .toBuffer({ resolveWithObject: true }),
    ]);
    return {
      full: { data: full.data, contentType: type, width: full.info.width, height: full.info.height },
      thumb: { data: thumb.data, contentType: THUMB_CONTENT_TYPE, width: thumb.info.width, height: thumb.info.height },
    };
  } catch (err) {
    const message = (err as Error).message ?? '';
    if (/pixel limit/i.test(message)) {
      const text = `The picture is larger than ${MAX_INPUT_PIXELS / 1_000_000} megapixels: export it smaller and upload again.`;
      throw new AppError(413, 'too_large', text, { [field]: text });
    }
    throw new Invalid('The image could not be read.', { [field]: 'The image is damaged or incomplete and could not be read: export it again and choose the new file.' });
  }
}
