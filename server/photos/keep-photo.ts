import { randomUUID } from 'node:crypto';
import type { ProcessedPhoto } from './photo-processing';
import type { PhotoStore } from './photo-store';

/** The columns every area's photo row shares, from the checked photo and the id its files were written under. */
export function photoRowFields(photoId: string, userId: string, photo: ProcessedPhoto) {
  return {
    id: photoId,
    uploadedById: userId,
    contentType: photo.contentType,
    byteSize: photo.original.length,
    width: photo.width,
    height: photo.height,
    hasThumb: photo.thumb !== null,
  };
}

/**
 * Writes a checked photo's files under a new id, then runs `record` (the transaction that adds
 * its row); when that fails, the files go again, so a refused photo leaves nothing on disk.
 */
export async function keepPhoto<T>(store: PhotoStore, photo: ProcessedPhoto, record: (photoId: string) => Promise<T>): Promise<T> {
  const photoId = randomUUID();
  await store.write(photoId, photo.original, photo.thumb);
  try {
    return await record(photoId);
  } catch (error) {
    await store.remove(photoId);
    throw error;
  }
}
