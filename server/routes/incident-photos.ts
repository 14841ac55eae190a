import { Router } from 'express';
import { can } from '../../shared/roles';
import { incidentParams, incidentPhotoParams } from '../../shared/schemas/incidents';
import { photoSizeQuery } from '../../shared/schemas/repairs';
import { authOf } from '../auth/require-auth';
import { addIncidentPhoto, assertRoomForIncidentPhoto } from '../commands/add-incident-photo';
import { removeIncidentPhoto } from '../commands/remove-incident-photo';
import { forbidden, notFound } from '../errors';
import { viewOf } from '../incidents/access';
import { readPhotoUpload } from '../middleware/photo-upload';
import { Incident, IncidentPhoto } from '../models';
import { processPhoto } from '../photos/photo-processing';
import type { PhotoStore } from '../photos/photo-store';
import { NEVER_KEEP, sendPhoto } from '../photos/send-photo';
import { authorize } from '../policies/authorize';

/** A report's photos: mounted at /api/incidents/:id/photos. The same rules as a ticket's photos. */
export function incidentPhotosRouter(store: PhotoStore) {
  const router = Router({ mergeParams: true });

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'incidents:report');
    const { id } = incidentParams.parse(req.params);
    // Before the upload is read: another team's report is 404, someone else's 403, a full one 409.
    const incident = await Incident.ofTeam(auth.membership.teamId, id);
    if (incident.reporterId !== auth.user.id && !can(auth.membership.roles, 'incidents:manage')) throw forbidden();
    await assertRoomForIncidentPhoto(incident.id);
    const photo = await processPhoto(await readPhotoUpload(req, res));
    res.status(201).json(await addIncidentPhoto(auth.membership.teamId, auth.user.id, incident.id, photo, store));
  });

  router.get('/:photoId', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'incidents:report');
    const { id, photoId } = incidentPhotoParams.parse(req.params);
    const { size } = photoSizeQuery.parse(req.query);
    const incident = await Incident.ofTeam(auth.membership.teamId, id);
    // Whoever may read the report: the safety log's readers, and its reporter.
    viewOf(auth, incident);
    const photo = await IncidentPhoto.findOne({ where: { id: photoId, incidentId: incident.id } });
    if (!photo) throw notFound('Photo');
    // People and injuries, as for the CSV: a tablet's browser cache must not show them to the next member at it.
    await sendPhoto(res, store, photo, size, NEVER_KEEP);
  });

  router.delete('/:photoId', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'incidents:manage');
    const { id, photoId } = incidentPhotoParams.parse(req.params);
    await removeIncidentPhoto(auth.membership.teamId, { incidentId: id, photoId }, store);
    res.status(204).end();
  });

  return router;
}
