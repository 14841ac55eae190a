import { pipeline } from 'node:stream/promises';
import type { Response } from 'express';
import { HttpError, notFound } from '../errors';
import type { PhotoSize, PhotoStore } from './photo-store';

/** What serving a photo needs of its row, in any area. */
export interface StoredPhoto {
  id: string;
  contentType: string;
  hasThumb: boolean;
}

/** A photo id never changes content: the browser may keep it for good, for this user only. */
const KEEP_PRIVATELY = 'private, max-age=31536000, immutable';
/** Shown, never kept: what the next person at a shared tablet must not find in its cache. */
export const NEVER_KEEP = 'private, no-store';

/**
 * Streams a photo (or its thumbnail) the caller may see: the type read from its content when it
 * was stored, inline, with the caching its area allows.
 */
export async function sendPhoto(res: Response, store: PhotoStore, photo: StoredPhoto, size: PhotoSize, cacheControl = KEEP_PRIVATELY) {
  if (size === 'thumb' && !photo.hasThumb) throw new HttpError(404, 'no_thumbnail', 'This photo has no thumbnail: open the photo itself');
  const file = await store.open(photo.id, size);
  if (!file) throw notFound('Photo');
  let length: number;
  try {
    length = (await file.stat()).size;
  } catch (error) {
    await file.close();
    throw error;
  }
  res.set({
    // helmet adds X-Content-Type-Options: nosniff.
    'Content-Type': size === 'thumb' ? 'image/webp' : photo.contentType,
    'Content-Length': String(length),
    'Content-Disposition': 'inline',
    'Cache-Control': cacheControl,
  });
  // A tablet that leaves mid-download is not a server fault.
  await pipeline(file.createReadStream(), res).catch(() => undefined);
}
