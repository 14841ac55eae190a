import { Router } from 'express';
import { batteryParams, createBatterySchema, readingSchema, updateBatterySchema } from '../../shared/schemas/batteries';
import { authOf } from '../auth/require-auth';
import { createBattery } from '../commands/create-battery';
import { recordReading } from '../commands/record-reading';
import { updateBattery } from '../commands/update-battery';
import { Battery } from '../models';
import { authorize } from '../policies/authorize';
import { presentBatteries, presentBatteryDetail } from '../presenters/battery';

/** The team's battery fleet and its readings: mounted at /api/batteries. */
export function batteriesRouter() {
  const router = Router();

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    const batteries = await Battery.findAll({ where: { teamId: auth.membership.teamId }, order: [['label', 'ASC'], ['id', 'ASC']] });
    res.json(await presentBatteries(batteries));
  });

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'batteries:manage');
    const input = createBatterySchema.parse(req.body);
    const { battery, created } = await createBattery(auth.membership.teamId, input);
    res.status(created ? 201 : 200).json(battery);
  });

  router.get('/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    const { id } = batteryParams.parse(req.params);
    res.json(await presentBatteryDetail(await Battery.ofTeam(auth.membership.teamId, id)));
  });

  router.patch('/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'batteries:manage');
    const { id } = batteryParams.parse(req.params);
    const input = updateBatterySchema.parse(req.body);
    res.json(await updateBattery(auth.membership.teamId, auth.user.id, id, input));
  });

  router.post('/:id/readings', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'batteries:swap');
    const { id } = batteryParams.parse(req.params);
    const input = readingSchema.parse(req.body);
    const { reading, created } = await recordReading(auth.membership.teamId, auth.user.id, id, input);
    res.status(created ? 201 : 200).json(reading);
  });

  return router;
}
