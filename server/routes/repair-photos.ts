import { pipeline } from 'node:stream/promises';
import { Router } from 'express';
import { can } from '../../shared/roles';
import { photoSizeQuery, repairParams, repairPhotoParams } from '../../shared/schemas/repairs';
import { authOf } from '../auth/require-auth';
import { addRepairPhoto, assertRoomForPhoto } from '../commands/add-repair-photo';
import { removeRepairPhoto } from '../commands/remove-repair-photo';
import { HttpError, notFound } from '../errors';
import { readPhotoUpload } from '../middleware/photo-upload';
import { Repair, RepairPhoto } from '../models';
import { authorize } from '../policies/authorize';
import { processPhoto } from '../repairs/photo-processing';
import type { PhotoStore } from '../repairs/photo-store';

/** A ticket's photos: mounted at /api/repairs/:id/photos. */
export function repairPhotosRouter(store: PhotoStore) {
  const router = Router({ mergeParams: true });

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'repairs:work');
    const { id } = repairParams.parse(req.params);
    // Before the upload is read: another team's ticket is 404, a full one 409, whatever was sent.
    const repair = await Repair.ofTeam(auth.membership.teamId, id);
    await assertRoomForPhoto(repair.id);
    const photo = await processPhoto(await readPhotoUpload(req, res));
    res.status(201).json(await addRepairPhoto(auth.membership.teamId, auth.user.id, repair.id, photo, store));
  });

  router.get('/:photoId', async (req, res) => {
    const auth = authOf(req);
    // Photos show people and the robot's insides: members who read tickets, not viewers.
    authorize(auth, 'repairs:read');
    const { id, photoId } = repairPhotoParams.parse(req.params);
    const { size } = photoSizeQuery.parse(req.query);
    const repair = await Repair.ofTeam(auth.membership.teamId, id);
    const photo = await RepairPhoto.findOne({ where: { id: photoId, repairId: repair.id } });
    if (!photo) throw notFound('Photo');
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
      // The type read from the content when it was stored; helmet adds X-Content-Type-Options: nosniff.
      'Content-Type': size === 'thumb' ? 'image/webp' : photo.contentType,
      'Content-Length': String(length),
      'Content-Disposition': 'inline',
      // A photo's bytes never change under its id; only the team's members may keep a copy.
      'Cache-Control': 'private, max-age=31536000, immutable',
    });
    // A tablet that leaves mid-download is not a server fault.
    await pipeline(file.createReadStream(), res).catch(() => undefined);
  });

  router.delete('/:photoId', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'repairs:work');
    const { id, photoId } = repairPhotoParams.parse(req.params);
    const mayRemoveAny = can(auth.membership.roles, 'repairs:manage');
    await removeRepairPhoto(auth.membership.teamId, auth.user.id, { repairId: id, photoId, mayRemoveAny }, store);
    res.status(204).end();
  });

  return router;
}
