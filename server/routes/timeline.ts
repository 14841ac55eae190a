import { Router } from 'express';
import { computeTimeline } from '../../shared/domain/timeline';
import { eventParams, timelineQuery } from '../../shared/schemas/schedule';
import { authOf } from '../auth/require-auth';
import { Event } from '../models';
import { authorize } from '../policies/authorize';
import { timelineSettingsOf } from '../presenters/event';
import { presentSchedule } from '../presenters/match';

/** The projected schedule of one event: mounted at /api/events/:eventId/timeline. */
export function timelineRouter() {
  const router = Router({ mergeParams: true });

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    const { eventId } = eventParams.parse(req.params);
    // `at` lets a tablet ask "as of" a moment (and tests pin the clock); it defaults to now.
    const { at } = timelineQuery.parse(req.query);
    const event = await Event.ofTeam(auth.membership.teamId, eventId);
    const matches = await presentSchedule(event.id);
    res.json(computeTimeline(matches, timelineSettingsOf(event), at ?? new Date()));
  });

  return router;
}
