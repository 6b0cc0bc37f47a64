/**
 * Images for the upload suites, made with sharp (a general-purpose image library) so that each
 * carries exactly the metadata a test asks about, and a reader of the EXIF GPS pointer.
 */
import sharp from 'sharp';

/** A JPEG as a phone writes it: camera make, a GPS position and an orientation of 6 (turned 90°). */
export async function jpegFromPhone(width = 1200, height = 900): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: { r: 176, g: 96, b: 120 } } })
    .jpeg({ quality: 80 })
    .withExif({
      IFD0: { Make: 'Fernhill Test Camera', Model: 'Fitting Tablet' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '53/1 20/1 1/1', GPSLongitudeRef: 'W', GPSLongitude: '6/1 15/1 2/1' },
    })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

export async function pngSwatch(width = 300, height = 200): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: { r: 40, g: 110, b: 90 } } }).png().toBuffer();
}

export async function webpSwatch(): Promise<Buffer> {
  return sharp({ create: { width: 240, height: 240, channels: 3, background: { r: 220, g: 200, b: 60 } } }).webp().toBuffer();
}

/**
 * Whether an EXIF block (TIFF structure, as sharp's `metadata().exif` returns it) has a GPS IFD:
 * IFD0 entry with tag 0x8825 "GPSInfoIFDPointer" (CIPA DC-008-2019 "Exif 2.32", §4.6.3 and
 * Table 4; TIFF 6.0 §2 for the header and IFD layout).
 */
export function exifHasGps(exif: Buffer | undefined): boolean {
  if (!exif) return false;
  // sharp's exif buffer starts with "Exif\0\0" before the TIFF header.
  const tiff = exif.subarray(0, 6).toString('latin1') === 'Exif\0\0' ? exif.subarray(6) : exif;
  const little = tiff.toString('latin1', 0, 2) === 'II';
  const u16 = (o: number) => (little ? tiff.readUInt16LE(o) : tiff.readUInt16BE(o));
  const u32 = (o: number) => (little ? tiff.readUInt32LE(o) : tiff.readUInt32BE(o));
  if (u16(2) !== 42) throw new Error('not a TIFF structure');
  const ifd0 = u32(4);
  const count = u16(ifd0);
  for (let i = 0; i < count; i += 1) if (u16(ifd0 + 2 + i * 12) === 0x8825) return true;
  return false;
}

/** Just over the 10 MB limit, starting like a JPEG so only its size is wrong. */
export function oversizedJpeg(): Buffer {
  const bytes = Buffer.alloc(10 * 1024 * 1024 + 1, 0x41);
  Buffer.from([0xff, 0xd8, 0xff, 0xe0]).copy(bytes);
  return bytes;
}

/** The start of an ISO base media file with the "heic" brand, as an iPhone writes by default (ISO/IEC 23008-12 §B.4). */
export function heicStart(): Buffer {
  const box = Buffer.alloc(64);
  box.writeUInt32BE(24, 0);
  box.write('ftypheic', 4, 'latin1');
  box.writeUInt32BE(0, 12);
  box.write('mif1heic', 16, 'latin1');
  return box;
}
