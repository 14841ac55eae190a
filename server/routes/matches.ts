import { Router } from 'express';
import { parseScheduleCsv } from '../../shared/domain/schedule-csv';
import { readinessParams } from '../../shared/schemas/checks';
import { createMatchSchema, eventParams, importQuery, matchParams, timelineQuery, updateMatchSchema } from '../../shared/schemas/schedule';
import { authOf } from '../auth/require-auth';
import { createMatch } from '../commands/create-match';
import { importMatches } from '../commands/import-matches';
import { updateMatch } from '../commands/update-match';
import { HttpError } from '../errors';
import { readCsvUpload } from '../middleware/csv-upload';
import { Event } from '../models';
import { authorize } from '../policies/authorize';
import { presentSchedule } from '../presenters/match';
import { readinessOf } from '../readiness/readiness-of';

/** The schedule of one event: mounted at /api/events/:eventId/matches. */
export function eventMatchesRouter() {
  const router = Router({ mergeParams: true });

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    const { eventId } = eventParams.parse(req.params);
    const event = await Event.ofTeam(auth.membership.teamId, eventId);
    res.json(await presentSchedule(event.id));
  });

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'schedule:edit');
    const { eventId } = eventParams.parse(req.params);
    const input = createMatchSchema.parse(req.body);
    const { match, created } = await createMatch(auth.membership.teamId, eventId, input);
    res.status(created ? 201 : 200).json(match);
  });

  router.post('/import', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'schedule:edit');
    const { eventId } = eventParams.parse(req.params);
    const { dryRun } = importQuery.parse(req.query);
    // Looked up before the upload is read: another team's event is 404 whatever was sent.
    const event = await Event.ofTeam(auth.membership.teamId, eventId);
    const parsed = parseScheduleCsv(await readCsvUpload(req, res), event.timeZone);
    if (!parsed.ok) {
      const bad = new Set(parsed.errors.map((error) => error.row)).size;
      const message = `${bad} ${bad === 1 ? 'row needs' : 'rows need'} fixing; nothing was imported`;
      throw new HttpError(400, 'invalid_file', message, { rows: parsed.errors });
    }
    res.json(await importMatches(auth.membership.teamId, event.id, parsed.rows, { dryRun }));
  });

  router.get('/:matchId/readiness', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'board:read');
    const { eventId, matchId } = readinessParams.parse(req.params);
    // `at` as on the timeline: "as of" a moment, which also lets tests pin the clock.
    const { at } = timelineQuery.parse(req.query);
    const event = await Event.ofTeam(auth.membership.teamId, eventId);
    res.json(await readinessOf(event, matchId, at ? new Date(at) : new Date()));
  });

  return router;
}

/** One match by its id: mounted at /api/matches. */
export function matchesRouter() {
  const router = Router();

  router.patch('/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'schedule:edit');
    const { id } = matchParams.parse(req.params);
    const input = updateMatchSchema.parse(req.body);
    res.json(await updateMatch(auth.membership.teamId, id, input));
  });

  return router;
}
