import { Router } from 'express';
import { batteryParams, createUseSchema, endUseSchema, useParams } from '../../shared/schemas/batteries';
import { authOf } from '../auth/require-auth';
import { installBattery } from '../commands/install-battery';
import { removeBattery } from '../commands/remove-battery';
import { authorize } from '../policies/authorize';

/** Installing a battery for a match: mounted at /api/batteries/:id/uses. */
export function batteryInstallsRouter() {
  const router = Router({ mergeParams: true });

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'batteries:swap');
    const { id } = batteryParams.parse(req.params);
    const input = createUseSchema.parse(req.body);
    const { use, created } = await installBattery(auth.membership.teamId, auth.user.id, id, input);
    res.status(created ? 201 : 200).json(use);
  });

  return router;
}

/** A use by its id (taking the battery out): mounted at /api/battery-uses. */
export function batteryUsesRouter() {
  const router = Router();

  router.patch('/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'batteries:swap');
    const { id } = useParams.parse(req.params);
    const input = endUseSchema.parse(req.body);
    res.json(await removeBattery(auth.membership.teamId, auth.user.id, id, input));
  });

  return router;
}
