import type { Transaction } from 'sequelize';
import { INCIDENT_PHOTOS_MAX } from '../../shared/schemas/incidents';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { announceIncident } from '../incidents/announce';
import { Incident, IncidentPhoto, Team } from '../models';
import { keepPhoto, photoRowFields } from '../photos/keep-photo';
import type { ProcessedPhoto } from '../photos/photo-processing';
import type { PhotoStore } from '../photos/photo-store';
import { presentIncidentPhoto } from '../presenters/incident';

const tooManyPhotos = () => new HttpError(409, 'too_many_photos', `A report keeps at most ${INCIDENT_PHOTOS_MAX} photos: remove one first`);

/** 409 when the report already has its photos; checked before the upload is read, and again under the team's lock. */
export async function assertRoomForIncidentPhoto(incidentId: string, transaction?: Transaction) {
  if ((await IncidentPhoto.count({ where: { incidentId }, transaction })) >= INCIDENT_PHOTOS_MAX) throw tooManyPhotos();
}

/**
 * Adds a checked photo to a report (files first, removed again if the row is refused). Like a
 * ticket's, a photo leaves the report's version alone: it never conflicts with an edit.
 */
export async function addIncidentPhoto(teamId: string, userId: string, incidentId: string, photo: ProcessedPhoto, store: PhotoStore) {
  return keepPhoto(store, photo, (photoId) =>
    inTransaction(async (transaction) => {
      await Team.lockRow(teamId, transaction);
      const incident = await Incident.ofTeam(teamId, incidentId, { transaction });
      await assertRoomForIncidentPhoto(incident.id, transaction);
      const row = await IncidentPhoto.create(
        { ...photoRowFields(photoId, userId, photo), incidentId: incident.id },
        { transaction },
      );
      transaction.afterCommit(() => announceIncident(teamId, incident.id));
      return presentIncidentPhoto(row);
    }),
  );
}
