import { Router } from 'express';
import { batteryParams, chargingSessionParams, endChargingSchema, startChargingSchema } from '../../shared/schemas/batteries';
import { authOf } from '../auth/require-auth';
import { endCharging } from '../commands/end-charging';
import { startCharging } from '../commands/start-charging';
import { authorize } from '../policies/authorize';

/** Putting a battery on a charger bay: mounted at /api/batteries/:id/charging. */
export function batteryChargingRouter() {
  const router = Router({ mergeParams: true });

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'batteries:manage');
    const { id } = batteryParams.parse(req.params);
    const input = startChargingSchema.parse(req.body);
    const { session, created } = await startCharging(auth.membership.teamId, auth.user.id, id, input);
    res.status(created ? 201 : 200).json(session);
  });

  return router;
}

/** A charging session by its id (taking the battery off): mounted at /api/charging-sessions. */
export function chargingSessionsRouter() {
  const router = Router();

  router.patch('/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'batteries:manage');
    const { id } = chargingSessionParams.parse(req.params);
    const input = endChargingSchema.parse(req.body);
    res.json(await endCharging(auth.membership.teamId, auth.user.id, id, input));
  });

  return router;
}
