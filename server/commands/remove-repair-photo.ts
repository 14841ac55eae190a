import { inTransaction } from '../db/transaction';
import { forbidden, notFound } from '../errors';
import { Repair, RepairChange, RepairPhoto, Team } from '../models';
import type { PhotoStore } from '../photos/photo-store';
import { announceChanged } from './repair-announce';

/**
 * Removes a photo from a ticket: its uploader may, and whoever may manage repairs (403 for
 * anyone else). The row goes in the transaction with a `photo_removed` history row; the files
 * only once it committed, so a rolled-back removal never loses a photo.
 */
export async function removeRepairPhoto(
  teamId: string,
  userId: string,
  { repairId, photoId, mayRemoveAny }: { repairId: string; photoId: string; mayRemoveAny: boolean },
  store: PhotoStore,
) {
  await inTransaction(async (transaction) => {
    await Team.lockRow(teamId, transaction);
    const repair = await Repair.ofTeam(teamId, repairId, { transaction });
    const photo = await RepairPhoto.findOne({ where: { id: photoId, repairId: repair.id }, transaction });
    if (!photo) throw notFound('Photo');
    if (photo.uploadedById !== userId && !mayRemoveAny) throw forbidden();
    await photo.destroy({ transaction });
    await RepairChange.create({ repairId: repair.id, kind: 'photo_removed', changes: { photo: [photoId, null] }, byId: userId, at: new Date() }, { transaction });
    transaction.afterCommit(async () => {
      // A file left behind only takes room; the row, which serves it, is gone.
      await store.remove(photoId).catch((error: unknown) => console.warn(`Could not remove the files of photo ${photoId}:`, error));
      announceChanged(repair);
    });
  });
}
