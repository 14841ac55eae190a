import { randomUUID } from 'node:crypto';
import type { ProcessedPhoto } from './photo-processing';
import type { PhotoStore } from './photo-store';

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
