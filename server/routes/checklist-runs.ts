import { Router } from 'express';
import { createRunSchema, eventRunsParams, markSchema, runItemParams, runListQuery, runParams, signOffSchema } from '../../shared/schemas/checks';
import { authOf } from '../auth/require-auth';
import { clearItem } from '../commands/clear-item';
import { createRun } from '../commands/create-run';
import { markItem } from '../commands/mark-item';
import { signOffRun } from '../commands/sign-off-run';
import { ChecklistRun, Event } from '../models';
import { authorize } from '../policies/authorize';
import { presentRun, presentRuns, summaryOf } from '../presenters/checklist';

/** Runs of one event: mounted at /api/events/:eventId/checklist-runs. */
export function eventChecklistRunsRouter() {
  const router = Router({ mergeParams: true });

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    const { eventId } = eventRunsParams.parse(req.params);
    const { matchId } = runListQuery.parse(req.query);
    const event = await Event.ofTeam(auth.membership.teamId, eventId);
    const runs = await ChecklistRun.findAll({
      where: { eventId: event.id, ...(matchId ? { matchId } : {}) },
      order: [['createdAt', 'DESC'], ['id', 'DESC']],
    });
    res.json((await presentRuns(runs)).map(summaryOf));
  });

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'checks:mark');
    const { eventId } = eventRunsParams.parse(req.params);
    const input = createRunSchema.parse(req.body);
    const { run, created } = await createRun(auth.membership.teamId, eventId, auth.user.id, input);
    res.status(created ? 201 : 200).json(run);
  });

  return router;
}

/** One run by its id, and its items' marks: mounted at /api/checklist-runs. */
export function checklistRunsRouter() {
  const router = Router();

  router.get('/:runId', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    const { runId } = runParams.parse(req.params);
    res.json(await presentRun(await ChecklistRun.ofTeam(auth.membership.teamId, runId)));
  });

  router.put('/:runId/items/:itemId', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'checks:mark');
    const { runId, itemId } = runItemParams.parse(req.params);
    const input = markSchema.parse(req.body);
    res.json(await markItem(auth.membership.teamId, auth.user.id, runId, itemId, input));
  });

  router.delete('/:runId/items/:itemId', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'checks:mark');
    const { runId, itemId } = runItemParams.parse(req.params);
    res.json(await clearItem(auth.membership.teamId, auth.user.id, runId, itemId));
  });

  router.post('/:runId/sign-off', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'checks:sign-off');
    const { runId } = runParams.parse(req.params);
    const input = signOffSchema.parse(req.body ?? {});
    res.json(await signOffRun(auth.membership.teamId, auth.user.id, runId, input));
  });

  return router;
}
