import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { REPAIR_PHOTO_TYPES, type RepairPhotoType } from '../../shared/schemas/repairs';
import { HttpError } from '../errors';

/** A thumbnail (a ticket's card, a report's photo strip) fits inside this square. */
export const THUMB_SIZE = 320;
// A phone photo is 12–50 megapixels; a 10 MB file claiming far more is a decompression bomb.
export const PHOTO_MAX_PIXELS = 100_000_000;

export const unsupportedType = () =>
  new HttpError(415, 'unsupported_type', 'This file is not a photo the board takes', { fields: { photo: 'Send a JPEG, PNG, WebP or HEIC photo' } });
const tooManyPixels = () =>
  new HttpError(413, 'too_large', `The photo has more than ${PHOTO_MAX_PIXELS / 1_000_000} megapixels`, {
    fields: { photo: 'Send a smaller photo' },
  });

export interface ProcessedPhoto {
  contentType: RepairPhotoType;
  /** What is stored and served: re-encoded without metadata, except a HEIC (kept as sent). */
  original: Buffer;
  thumb: Buffer | null;
  width: number | null;
  height: number | null;
}

const isPhotoType = (mime: string): mime is RepairPhotoType => (REPAIR_PHOTO_TYPES as readonly string[]).includes(mime);
const isHeif = (type: RepairPhotoType) => type === 'image/heic' || type === 'image/heif';

// Upright by the EXIF orientation; a fresh pipeline per output.
// `failOn: 'error'` takes photos that decode with a warning (some cameras write odd markers).
const open = (upload: Buffer) => sharp(upload, { limitInputPixels: PHOTO_MAX_PIXELS, failOn: 'error' }).rotate();

const thumbnailOf = (upload: Buffer) =>
  open(upload).resize(THUMB_SIZE, THUMB_SIZE, { fit: 'inside', withoutEnlargement: true }).webp({ quality: 75 }).toBuffer();

/**
 * Checks an upload by its content (magic bytes; its name and declared type are never read) and
 * makes what is stored. JPEG, PNG and WebP are re-encoded upright (`rotate()` reads the EXIF
 * orientation) and so lose their metadata, GPS position included. A HEIC is kept as sent: when
 * this server's sharp cannot decode it (HEVC), it has no thumbnail and no size.
 */
export async function processPhoto(upload: Buffer): Promise<ProcessedPhoto> {
  // A parser tripping over a malformed file means the same as no match: not a photo.
  const detected = await fileTypeFromBuffer(upload).catch(() => undefined);
  if (!detected || !isPhotoType(detected.mime)) throw unsupportedType();
  const contentType = detected.mime;

  if (isHeif(contentType)) {
    try {
      const thumb = await thumbnailOf(upload);
      const metadata = await sharp(upload).metadata();
      const { width, height } = metadata.autoOrient ?? metadata;
      return { contentType, original: upload, thumb, width: width ?? null, height: height ?? null };
    } catch {
      return { contentType, original: upload, thumb: null, width: null, height: null };
    }
  }

  try {
    const image = open(upload);
    const encoded = contentType === 'image/jpeg' ? image.jpeg({ quality: 90 }) : contentType === 'image/png' ? image.png() : image.webp({ quality: 90 });
    const [{ data, info }, thumb] = await Promise.all([encoded.toBuffer({ resolveWithObject: true }), thumbnailOf(upload)]);
    return { contentType, original: data, thumb, width: info.width, height: info.height };
  } catch (error) {
    if (error instanceof Error && /pixel limit/i.test(error.message)) throw tooManyPixels();
    // Right magic bytes, unreadable body (cut short, corrupt): not a photo the board can show.
    throw unsupportedType();
  }
}
