import { Router } from 'express';
import { compareBoardOrder } from '../../shared/domain/repair-board';
import { can } from '../../shared/roles';
import { createRepairSchema, eventRepairsParams, repairParams, updateRepairSchema, type RepairListJson } from '../../shared/schemas/repairs';
import { timelineQuery } from '../../shared/schemas/schedule';
import { authOf } from '../auth/require-auth';
import { createRepair } from '../commands/create-repair';
import { updateRepair } from '../commands/update-repair';
import { Event, Repair } from '../models';
import { authorize } from '../policies/authorize';
import { presentRepairDetail, presentRepairs, presentRepairSummary } from '../presenters/repair';
import { nextQueueOf } from '../repairs/next-queue';

/** The repair board of one event: mounted at /api/events/:eventId/repairs. */
export function eventRepairsRouter() {
  const router = Router({ mergeParams: true });

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    const { eventId } = eventRepairsParams.parse(req.params);
    // `at` as on the timeline: urgency "as of" a moment (tests pin the clock); it defaults to now.
    const { at } = timelineQuery.parse(req.query);
    const now = at ? new Date(at) : new Date();
    const event = await Event.ofTeam(auth.membership.teamId, eventId);
    const repairs = (await Repair.findAll({ where: { eventId: event.id } })).sort(compareBoardOrder);
    const nextQueue = await nextQueueOf(event, now);
    // A viewer (parents, sponsors, judges) reads titles and status, never people or notes.
    const detail = can(auth.membership.roles, 'repairs:read');
    const answer: RepairListJson = {
      repairs: detail ? await presentRepairs(repairs, { nextQueueAt: nextQueue?.queueAt ?? null, now }) : repairs.map(presentRepairSummary),
      nextQueue,
      detail,
    };
    res.json(answer);
  });

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'repairs:work');
    const { eventId } = eventRepairsParams.parse(req.params);
    const input = createRepairSchema.parse(req.body);
    const { repair, created } = await createRepair(auth.membership.teamId, auth.user.id, eventId, input);
    res.status(created ? 201 : 200).json(repair);
  });

  return router;
}

const placesByHand = (body: unknown) => typeof body === 'object' && body !== null && ('afterId' in body || 'beforeId' in body);

/** One ticket by its id: mounted at /api/repairs. */
export function repairsRouter() {
  const router = Router();

  router.get('/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    const { id } = repairParams.parse(req.params);
    const repair = await Repair.ofTeam(auth.membership.teamId, id);
    res.json(can(auth.membership.roles, 'repairs:read') ? await presentRepairDetail(repair) : presentRepairSummary(repair));
  });

  router.patch('/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'repairs:work');
    // Placing a card by hand is a lead's call, whatever else the body holds.
    if (placesByHand(req.body)) authorize(auth, 'repairs:manage');
    const { id } = repairParams.parse(req.params);
    const input = updateRepairSchema.parse(req.body);
    res.json(await updateRepair(auth.membership.teamId, auth.user.id, id, input));
  });

  return router;
}
