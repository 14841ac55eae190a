import { Router } from 'express';
import { subsystemsSchema } from '../../shared/schemas/repairs';
import { authOf } from '../auth/require-auth';
import { updateRepairSubsystems } from '../commands/update-repair-subsystems';
import { authorize } from '../policies/authorize';
import { subsystemsOf } from '../repairs/subsystems';

/** The team's subsystem list for tickets (the defaults until a lead edits it): mounted at /api/team/repair-subsystems. */
export function repairSubsystemsRouter() {
  const router = Router();

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    res.json(await subsystemsOf(auth.membership.teamId));
  });

  router.put('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'repairs:manage');
    const input = subsystemsSchema.parse(req.body);
    res.json(await updateRepairSubsystems(auth.membership.teamId, input));
  });

  return router;
}
