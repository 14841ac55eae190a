import fs from 'node:fs/promises';
import path from 'node:path';

export type PhotoSize = 'full' | 'thumb';

// Names are ours alone: a UUID, never anything from the upload.
const PHOTO_ID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The areas that keep photos, each in a folder of its own. */
export type PhotoArea = 'repairs' | 'incidents';

/**
 * Where an area's photos live: `<uploadsDir>/<area>/<photoId>` and its `<photoId>.thumb.webp`,
 * outside the folder the client is served from, so they are read only through their route.
 */
export function photoStore(uploadsDir: string, area: PhotoArea) {
  const dir = path.join(uploadsDir, area);
  const fileOf = (photoId: string, size: PhotoSize) => {
    if (!PHOTO_ID.test(photoId)) throw new Error(`Not a photo id: ${photoId}`);
    return path.join(dir, size === 'thumb' ? `${photoId}.thumb.webp` : photoId);
  };

  return {
    dir,
    fileOf,
    /** Writes a new photo's files; refuses to overwrite (`wx`), and leaves nothing behind when it fails. */
    async write(photoId: string, original: Buffer, thumb: Buffer | null) {
      await fs.mkdir(dir, { recursive: true });
      try {
        await fs.writeFile(fileOf(photoId, 'full'), original, { flag: 'wx' });
        if (thumb) await fs.writeFile(fileOf(photoId, 'thumb'), thumb, { flag: 'wx' });
      } catch (error) {
        await this.remove(photoId);
        throw error;
      }
    },
    /** The open file, or null when it is not there. */
    async open(photoId: string, size: PhotoSize) {
      try {
        return await fs.open(fileOf(photoId, size), 'r');
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
        throw error;
      }
    },
    /** Removes both files; a file already gone is fine. */
    async remove(photoId: string) {
      await Promise.all([fs.rm(fileOf(photoId, 'full'), { force: true }), fs.rm(fileOf(photoId, 'thumb'), { force: true })]);
    },
  };
}

export type PhotoStore = ReturnType<typeof photoStore>;
