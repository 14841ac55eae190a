import { Router } from 'express';
import { eventParams, fieldProgressSchema } from '../../shared/schemas/schedule';
import { authOf } from '../auth/require-auth';
import { recordFieldMark } from '../commands/record-field-mark';
import { undoFieldMark } from '../commands/undo-field-mark';
import { authorize } from '../policies/authorize';

/** "On the field now" marks of one event: mounted at /api/events/:eventId/field-progress. */
export function fieldProgressRouter() {
  const router = Router({ mergeParams: true });

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'field:progress');
    const { eventId } = eventParams.parse(req.params);
    const input = fieldProgressSchema.parse(req.body);
    res.status(201).json(await recordFieldMark(auth.membership.teamId, eventId, auth.user.id, input));
  });

  router.delete('/latest', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'field:progress');
    const { eventId } = eventParams.parse(req.params);
    res.json(await undoFieldMark(auth.membership.teamId, eventId, auth.user.id));
  });

  return router;
}
