import { Router } from 'express';
import { batterySettingsSchema } from '../../shared/schemas/batteries';
import { authOf } from '../auth/require-auth';
import { settingsOf } from '../batteries/settings';
import { updateBatterySettings } from '../commands/update-battery-settings';
import { authorize } from '../policies/authorize';

/** The team's battery settings (the defaults until it changes one): mounted at /api/team/battery-settings. */
export function batterySettingsRouter() {
  const router = Router();

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    res.json(await settingsOf(auth.membership.teamId));
  });

  router.patch('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'batteries:manage');
    const input = batterySettingsSchema.parse(req.body);
    res.json(await updateBatterySettings(auth.membership.teamId, input));
  });

  return router;
}
