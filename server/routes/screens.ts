import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import { z } from 'zod';
import { computeTimeline } from '../../shared/domain/timeline';
import { createScreenSchema, type CreatedScreenJson, type ScreenBoardJson } from '../../shared/schemas/screens';
import { authOf } from '../auth/require-auth';
import { createScreen } from '../commands/create-screen';
import { revokeScreen } from '../commands/revoke-screen';
import { notFound } from '../errors';
import { Event, ScreenToken, Team } from '../models';
import { authorize } from '../policies/authorize';
import { timelineSettingsOf } from '../presenters/event';
import { presentSchedule } from '../presenters/match';
import { presentScreen, presentScreenEvent } from '../presenters/screen';
import { readinessOnTimeline } from '../readiness/readiness-of';

const screenParams = z.object({ id: z.uuid({ message: 'Must be a UUID' }) });
const tokenParams = z.object({ token: z.string() });

/** Admins' pit screens: mounted at /api/team/screens behind requireAuth. */
export function screensRouter() {
  const router = Router();

  router.get('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'screens:manage');
    const screens = await ScreenToken.findAll({
      where: { teamId: auth.membership.teamId },
      order: [['createdAt', 'ASC'], ['id', 'ASC']],
    });
    res.json(screens.map(presentScreen));
  });

  router.post('/', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'screens:manage');
    const input = createScreenSchema.parse(req.body);
    const { screen, token, created } = await createScreen(auth.membership.teamId, auth.user.id, input);
    const body: CreatedScreenJson = token ? { ...presentScreen(screen), token, path: `/screen/${token}` } : presentScreen(screen);
    res.status(created ? 201 : 200).json(body);
  });

  router.delete('/:id', async (req, res) => {
    const auth = authOf(req);
    authorize(auth, 'screens:manage');
    const { id } = screenParams.parse(req.params);
    await revokeScreen(auth.membership.teamId, id);
    res.status(204).end();
  });

  return router;
}

// A TV refetches once a minute and on every live change; a pit of several screens behind one
// address stays far below this, a token guesser does not.
const SCREEN_READS_PER_MINUTE = 240;

/**
 * What a pit screen shows, read with its token and no session: mounted at /api/screen before
 * the session middleware. Nothing about people: the team, the current event, its schedule and
 * the readiness of our next match.
 */
export function screenBoardRouter() {
  const router = Router();
  router.use(
    rateLimit({
      windowMs: 60_000,
      limit: SCREEN_READS_PER_MINUTE,
      standardHeaders: 'draft-7',
      legacyHeaders: false,
      handler: (_req, res) => {
        res.status(429).json({ error: { code: 'rate_limited', message: 'Too many screen reads: try again in a minute' } });
      },
    }),
  );

  router.get('/:token', async (req, res) => {
    const { token } = tokenParams.parse(req.params);
    const screen = await ScreenToken.active(token);
    if (!screen) throw notFound('Screen');
    const team = await Team.findByPk(screen.teamId, { rejectOnEmpty: true });
    const event = team.currentEventId ? await Event.findOne({ where: { id: team.currentEventId, teamId: team.id } }) : null;
    const matches = event ? await presentSchedule(event.id) : null;
    const now = new Date();
    const timeline = event && matches ? computeTimeline(matches, timelineSettingsOf(event), now) : null;
    const next = timeline?.ourMatches[0];
    const body: ScreenBoardJson = {
      team: { number: team.number, name: team.name },
      event: event ? presentScreenEvent(event) : null,
      timeline,
      matches,
      // Readiness reasons name items and a lead's sign-off reason, never who marked what.
      readiness: event && timeline && next ? await readinessOnTimeline(event, timeline, next.matchId, now) : null,
    };
    // The token is in the URL: no shared cache may keep the answer.
    res.set('Cache-Control', 'no-store').json(body);
  });

  return router;
}
