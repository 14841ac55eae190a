import { Router } from 'express';
import { can } from '../../shared/roles';
import { photoSizeQuery, repairParams, repairPhotoParams } from '../../shared/schemas/repairs';
import { authOf } from '../auth/require-auth';
import { addRepairPhoto, assertRoomForPhoto } from '../commands/add-repair-photo';
import { removeRepairPhoto } from '../commands/remove-repair-photo';
import { notFound } from '../errors';
import { readPhotoUpload } from '../middleware/photo-upload';
import { Repair, RepairPhoto } from '../models';
import { authorize } from '../policies/authorize';
import { processPhoto } from '../photos/photo-processing';
import type { PhotoStore } from '../photos/photo-store';
import { sendPhoto } from '../photos/send-photo';

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
    await sendPhoto(res, store, photo, size);
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
