import { Router } from 'express';
import { z } from 'zod';
import { createEventSchema, updateEventSchema } from '../../shared/schemas/events';
import { authOf } from '../auth/require-auth';
import { createEvent } from '../commands/create-event';
import { updateEvent } from '../commands/update-event';
import { notFound } from '../errors';
import { Event, Team } from '../models';
import { authorize } from '../policies/authorize';
import { presentEvent } from '../presenters/event';

const eventParams = z.object({ eventId: z.uuid({ message: 'Must be a UUID' }) });

export function eventsRouter() {
  const router = Router();

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'events:read');
    const teamId = auth.membership.teamId;
    const [team, events] = await Promise.all([
      Team.findByPk(teamId, { rejectOnEmpty: true }),
      Event.findAll({ where: { teamId }, order: [['startDate', 'DESC'], ['name', 'ASC'], ['createdAt', 'ASC'], ['id', 'ASC']] }),
    ]);
    res.json(events.map((event) => presentEvent(event, team.currentEventId)));
  });

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'events:manage');
    const input = createEventSchema.parse(req.body);
    const { event, team, created } = await createEvent(auth.membership.teamId, input);
    res.status(created ? 201 : 200).json(presentEvent(event, team.currentEventId));
  });

  router.get('/:eventId', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'events:read');
    const { eventId } = eventParams.parse(req.params);
    const teamId = auth.membership.teamId;
    const [team, event] = await Promise.all([
      Team.findByPk(teamId, { rejectOnEmpty: true }),
      Event.findOne({ where: { id: eventId, teamId } }),
    ]);
    if (!event) throw notFound('Event');
    res.json(presentEvent(event, team.currentEventId));
  });

  router.patch('/:eventId', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'events:manage');
    const { eventId } = eventParams.parse(req.params);
    const input = updateEventSchema.parse(req.body);
    const { event, team } = await updateEvent(auth.membership.teamId, eventId, input);
    res.json(presentEvent(event, team.currentEventId));
  });

  return router;
}
