import { Router } from 'express';
import { planBatteries } from '../../shared/domain/battery-plan';
import { planQuery } from '../../shared/schemas/batteries';
import { eventParams } from '../../shared/schemas/schedule';
import { authOf } from '../auth/require-auth';
import { buildPlanInput } from '../batteries/plan-input';
import { Event } from '../models';
import { authorize } from '../policies/authorize';

/** The battery rotation plan of an event: mounted at /api/events/:eventId/battery-plan. */
export function batteryPlanRouter() {
  const router = Router({ mergeParams: true });

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    const { eventId } = eventParams.parse(req.params);
    // `at` as on the timeline: "as of" a moment, which also lets tests pin the clock.
    const { at } = planQuery.parse(req.query);
    const event = await Event.ofTeam(auth.membership.teamId, eventId);
    res.json(planBatteries(await buildPlanInput(event, at ? new Date(at) : new Date())));
  });

  return router;
}
