import { inTransaction } from '../db/transaction';
import { notFound } from '../errors';
import { announceIncident } from '../incidents/announce';
import { Incident, IncidentPhoto, Team } from '../models';
import type { PhotoStore } from '../photos/photo-store';

/** Removes a photo from a report (the route lets safety captains and mentors); its files go once the removal committed. */
export async function removeIncidentPhoto(teamId: string, { incidentId, photoId }: { incidentId: string; photoId: string }, store: PhotoStore) {
  await inTransaction(async (transaction) => {
    await Team.lockRow(teamId, transaction);
    const incident = await Incident.ofTeam(teamId, incidentId, { transaction });
    const photo = await IncidentPhoto.findOne({ where: { id: photoId, incidentId: incident.id }, transaction });
    if (!photo) throw notFound('Photo');
    await photo.destroy({ transaction });
    transaction.afterCommit(async () => {
      // A file left behind only takes room; the row, which serves it, is gone.
      await store.remove(photoId).catch((error: unknown) => console.warn(`Could not remove the files of photo ${photoId}:`, error));
      announceIncident(teamId, incident.id);
    });
  });
}
