import type { Transaction } from 'sequelize';
import { REPAIR_PHOTOS_MAX } from '../../shared/schemas/repairs';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { Repair, RepairChange, RepairPhoto, Team } from '../models';
import { presentOnePhoto } from '../presenters/repair';
import { keepPhoto, photoRowFields } from '../photos/keep-photo';
import type { ProcessedPhoto } from '../photos/photo-processing';
import type { PhotoStore } from '../photos/photo-store';
import { announceChanged } from './repair-announce';

const tooManyPhotos = () => new HttpError(409, 'too_many_photos', `A ticket keeps at most ${REPAIR_PHOTOS_MAX} photos: remove one first`);

/** 409 when the ticket already has its photos; checked before the upload is read, and again under the team's lock when one is added. */
export async function assertRoomForPhoto(repairId: string, transaction?: Transaction) {
  if ((await RepairPhoto.count({ where: { repairId }, transaction })) >= REPAIR_PHOTOS_MAX) throw tooManyPhotos();
}

/**
 * Adds a checked photo to a ticket. Its files are written under a new id first, then the row
 * and a `photo_added` history row; when the transaction fails, the files go again. A photo does
 * not change the ticket's version: it never conflicts with an edit of its fields.
 */
export async function addRepairPhoto(teamId: string, userId: string, repairId: string, photo: ProcessedPhoto, store: PhotoStore) {
  return keepPhoto(store, photo, (photoId) =>
    inTransaction(async (transaction) => {
      await Team.lockRow(teamId, transaction);
      const repair = await Repair.ofTeam(teamId, repairId, { transaction });
      // Under the lock: two uploads of the 6th photo at once cannot both pass.
      await assertRoomForPhoto(repair.id, transaction);
      const now = new Date();
      const row = await RepairPhoto.create(
        { ...photoRowFields(photoId, userId, photo), repairId: repair.id, createdAt: now },
        { transaction },
      );
      await RepairChange.create({ repairId: repair.id, kind: 'photo_added', changes: { photo: [null, photoId] }, byId: userId, at: now }, { transaction });
      transaction.afterCommit(() => announceChanged(repair));
      return presentOnePhoto(row, transaction);
    }),
  );
}
