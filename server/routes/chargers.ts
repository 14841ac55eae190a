import { Router } from 'express';
import { createChargerSchema } from '../../shared/schemas/batteries';
import { authOf } from '../auth/require-auth';
import { createCharger } from '../commands/create-charger';
import { Charger } from '../models';
import { authorize } from '../policies/authorize';
import { presentCharger } from '../presenters/battery';

/** The team's chargers, in the order they were added (the plan numbers bays in it): mounted at /api/chargers. */
export function chargersRouter() {
  const router = Router();

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    const chargers = await Charger.findAll({ where: { teamId: auth.membership.teamId }, order: [['createdAt', 'ASC'], ['id', 'ASC']] });
    res.json(chargers.map(presentCharger));
  });

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'batteries:manage');
    const input = createChargerSchema.parse(req.body);
    const { charger, created } = await createCharger(auth.membership.teamId, input);
    res.status(created ? 201 : 200).json(charger);
  });

  return router;
}
