import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { ROLES } from '../../../shared/roles';
import { signIn, testApp, type SignedIn } from '../../support/app';
import { itemId, makeOurMatch, makeRun, makeTemplate, preMatchBody } from '../../support/checks';
import { invalid, UNAUTHENTICATED } from '../../support/errors';
import { makeTeam, PASSWORD, type FactoryTeam } from '../../support/factories';
import { matchBody } from '../../support/schedule';

// GET /api/events/:eventId/matches/:matchId/readiness, and the readiness a pit screen reads.
// Our match starts at 10:00 and the event queues 10 minutes ahead: the queue call is at 09:50.
const { app } = testApp();
let team: FactoryTeam;
let lead: SignedIn;
beforeAll(async () => {
  team = await makeTeam();
  lead = await signIn(app, team.emails.lead, PASSWORD);
});

const START = '2026-12-05T10:00:00.000Z';
const at = (time: string) => `2026-12-05T${time}:00.000Z`;

async function ownMatch() {
  const own = await makeTeam();
  const admin = await signIn(app, own.emails.admin, PASSWORD);
  const ownLead = await signIn(app, own.emails.lead, PASSWORD);
  const crew = await signIn(app, own.emails.crew, PASSWORD);
  expect((await admin.patch(`/api/events/${own.event.id}`, { settings: { queueLead: { minutes: 10 } } })).status).toBe(200);
  const template = await makeTemplate(ownLead);
  const match = await makeOurMatch(ownLead, own.event, { number: 5, scheduledStart: START });
  const url = `/api/events/${own.event.id}/matches/${match.id}/readiness`;
  const readiness = async (time?: string) => {
    const answer = await crew.get(time ? `${url}?at=${at(time)}` : url);
    expect(answer.status, JSON.stringify(answer.body)).toBe(200);
    return answer.body;
  };
  const startRun = async () => {
    const run = await makeRun(crew, own.event.id, template.id, match.id);
    const mark = async (label: string, value: unknown) => {
      const answer = await crew.put(`/api/checklist-runs/${run.id}/items/${itemId(run, label)}`, { value });
      expect(answer.status).toBe(200);
    };
    const markAllRequired = async () => {
      await mark('Bumpers match our alliance', 'Red');
      await mark('Battery latched and strapped', true);
      await mark('Stored air pressure', 110);
      await mark('Code version on the robot', 'v12');
    };
    return { run, mark, markAllRequired };
  };
  return { ...own, admin, lead: ownLead, crew, template, match, url, readiness, startRun };
}

const MISSING = { code: 'checklist_missing', level: 'at_risk', message: 'No pre-match check has been started for this match' };
const ADVISORY = { code: 'advisory_open', level: 'at_risk', message: 'Before every match: 1 optional item open (Wipe the camera lens)' };

describe('readiness states', () => {
  it('without a pre-match run: at risk before the queue call, not ready after it', async () => {
    const own = await ownMatch();
    expect(await own.readiness('09:00')).toEqual({ matchId: own.match.id, state: 'at_risk', reasons: [MISSING] });
    expect(await own.readiness('09:55')).toEqual({
      matchId: own.match.id,
      state: 'not_ready',
      reasons: [
        { ...MISSING, level: 'not_ready' },
        { code: 'queue_call_passed', level: 'not_ready', message: 'The queue call was 5 min ago and required work is still open' },
      ],
    });
  });

  it('with required items open: at risk, naming them, the bumper colour, and a near queue call', async () => {
    const own = await ownMatch();
    await own.startRun();
    const open = [
      { code: 'checklist_incomplete', level: 'at_risk', message: 'Before every match: 3 required items open (Battery latched and strapped, Stored air pressure, Code version on the robot)' },
      ADVISORY,
      { code: 'bumper_unconfirmed', level: 'at_risk', message: 'Bumper colour not confirmed yet: we are on the RED alliance' },
    ];
    expect(await own.readiness('09:00')).toEqual({ matchId: own.match.id, state: 'at_risk', reasons: open });
    expect(await own.readiness('09:47')).toEqual({
      matchId: own.match.id,
      state: 'at_risk',
      reasons: [...open, { code: 'queue_call_near', level: 'at_risk', message: 'Queue call in 3 min and required work is still open' }],
    });
  });

  it('with only an optional item open: at risk; with everything done: ready', async () => {
    const own = await ownMatch();
    const { mark, markAllRequired } = await own.startRun();
    await markAllRequired();
    expect(await own.readiness('09:49')).toEqual({ matchId: own.match.id, state: 'at_risk', reasons: [ADVISORY] });
    await mark('Wipe the camera lens', true);
    expect(await own.readiness('09:49')).toEqual({ matchId: own.match.id, state: 'ready', reasons: [] });
  });

  it('a number out of limits or the wrong bumpers: not ready at once', async () => {
    const own = await ownMatch();
    const { mark, markAllRequired } = await own.startRun();
    await markAllRequired();
    await mark('Wipe the camera lens', true);
    await mark('Stored air pressure', 131);
    await mark('Bumpers match our alliance', 'Blue');
    expect(await own.readiness('09:00')).toEqual({
      matchId: own.match.id,
      state: 'not_ready',
      reasons: [
        { code: 'out_of_limits', level: 'not_ready', message: 'Stored air pressure: 131 psi is outside the limits (100 – 120 psi)' },
        { code: 'bumper_mismatch', level: 'not_ready', message: 'Blue bumpers are marked, but we are on the RED alliance: change the bumpers' },
      ],
    });
  });

  it('a run signed off with items open: at risk, quoting the reason', async () => {
    const own = await ownMatch();
    const { run, mark } = await own.startRun();
    await mark('Bumpers match our alliance', 'Red');
    const signed = await own.lead.post(`/api/checklist-runs/${run.id}/sign-off`, { reason: 'Gauge broken, pressure felt fine' });
    expect(signed.status).toBe(200);
    expect(await own.readiness('09:55')).toEqual({
      matchId: own.match.id,
      state: 'at_risk',
      reasons: [
        {
          code: 'signed_off_incomplete',
          level: 'at_risk',
          message: 'Before every match was signed off by a lead with 3 items not done (Battery latched and strapped, Stored air pressure, Code version on the robot): “Gauge broken, pressure felt fine”',
        },
        ADVISORY,
      ],
    });
  });

  it('a sign-off of a complete run excuses nothing found after it: a pressure read again low is not ready', async () => {
    const own = await ownMatch();
    const { run, mark, markAllRequired } = await own.startRun();
    await markAllRequired();
    await mark('Wipe the camera lens', true);
    const signed = await own.lead.post(`/api/checklist-runs/${run.id}/sign-off`, {});
    expect(signed.status).toBe(200);
    expect(signed.body.signOff.reason).toBeNull();
    await mark('Stored air pressure', 80);
    expect(await own.readiness('09:00')).toEqual({
      matchId: own.match.id,
      state: 'not_ready',
      reasons: [{ code: 'out_of_limits', level: 'not_ready', message: 'Stored air pressure: 80 psi is outside the limits (100 – 120 psi)' }],
    });
  });

  it('reads only pre-match runs: an open post-match run of the match changes nothing', async () => {
    const own = await ownMatch();
    const { mark, markAllRequired } = await own.startRun();
    await markAllRequired();
    await mark('Wipe the camera lens', true);
    const post = await makeTemplate(own.lead, preMatchBody({ name: 'After the match', phase: 'post_match' }));
    await makeRun(own.crew, own.event.id, post.id, own.match.id);
    expect((await own.readiness('09:00')).state).toBe('ready');
  });

  it('a match already on the field has no queue call ahead: no queue reasons', async () => {
    const own = await ownMatch();
    const marked = await own.lead.post(`/api/events/${own.event.id}/field-progress`, { matchId: own.match.id, startedAt: '2026-11-28T10:00:00Z' });
    expect(marked.status).toBe(201);
    expect(await own.readiness('11:00')).toEqual({ matchId: own.match.id, state: 'at_risk', reasons: [MISSING] });
  });
});

describe('readiness: who may read it, and bad requests', () => {
  it('answers 401 signed out', async () => {
    const answer = await request(app).get(`/api/events/${team.event.id}/matches/${randomUUID()}/readiness`);
    expect(answer.status).toBe(401);
    expect(answer.body).toEqual(UNAUTHENTICATED);
  });

  it('answers every role of the team', async () => {
    const own = await ownMatch();
    for (const role of ROLES) {
      const client = await signIn(app, own.emails[role], PASSWORD);
      expect((await client.get(own.url)).status, role).toBe(200);
    }
  });

  it("answers 404 for a match not in the event and for another team's event", async () => {
    const own = await ownMatch();
    const unknown = await own.crew.get(`/api/events/${own.event.id}/matches/${randomUUID()}/readiness`);
    expect(unknown.status).toBe(404);
    expect(unknown.body).toEqual({ error: { code: 'not_found', message: 'Match not found' } });
    const foreign = await lead.get(own.url);
    expect(foreign.status).toBe(404);
    expect(foreign.body).toEqual({ error: { code: 'not_found', message: 'Event not found' } });
    const ofOtherEvent = await lead.get(`/api/events/${team.event.id}/matches/${own.match.id}/readiness`);
    expect(ofOtherEvent.status).toBe(404);
  });

  it('answers 400 not_our_match for a match we do not play in', async () => {
    const other = await lead.post(`/api/events/${team.event.id}/matches`, matchBody({ number: 40 }));
    expect(other.status).toBe(201);
    const answer = await lead.get(`/api/events/${team.event.id}/matches/${other.body.id}/readiness`);
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual({ error: { code: 'not_our_match', message: 'We do not play in this match' } });
  });

  it('answers 400 naming a bad match id or moment', async () => {
    const bad = await lead.get(`/api/events/${team.event.id}/matches/q5/readiness`);
    expect(bad.status).toBe(400);
    expect(bad.body).toEqual(invalid({ matchId: 'Must be a UUID' }));
    const badAt = await lead.get(`/api/events/${team.event.id}/matches/${randomUUID()}/readiness?at=10:00`);
    expect(badAt.status).toBe(400);
    expect(badAt.body).toEqual(invalid({ at: 'Use an ISO time with an offset, e.g. 2027-03-05T15:00:00Z' }));
  });
});

describe('the pit screen board', () => {
  const addScreen = async (admin: SignedIn) => {
    const answer = await admin.post('/api/team/screens', { name: 'Pit TV' });
    expect(answer.status).toBe(201);
    return answer.body as { token: string };
  };

  it('carries the readiness of our next match, as the board reads it, and no names', async () => {
    const own = await ownMatch();
    // An earlier match of ours, already played: the next one is match 5.
    const played = await makeOurMatch(own.lead, own.event, { number: 2, scheduledStart: '2026-12-05T09:20:00.000Z' });
    const { run, mark } = await own.startRun();
    await mark('Bumpers match our alliance', 'Red');
    await mark('Stored air pressure', 99);
    expect((await own.lead.post(`/api/events/${own.event.id}/field-progress`, { matchId: played.id, startedAt: '2026-11-28T09:20:00Z' })).status).toBe(201);
    expect((await own.lead.post(`/api/checklist-runs/${run.id}/sign-off`, { reason: 'Compressor topping it up in the queue' })).status).toBe(200);
    const screen = await addScreen(own.admin);

    const board = await request(app).get(`/api/screen/${screen.token}`);
    expect(board.status).toBe(200);
    expect(board.body.timeline.ourMatches[0].matchId).toBe(own.match.id);
    expect(board.body.readiness).toEqual(await own.readiness());
    expect(board.body.readiness.state).toBe('at_risk');
    const text = JSON.stringify(board.body);
    for (const role of ROLES) expect(text).not.toContain(`Factory ${role}`);
  });

  it('carries null readiness without a match of ours still to play', async () => {
    const own = await makeTeam();
    const admin = await signIn(app, own.emails.admin, PASSWORD);
    const notOurs = await admin.post(`/api/events/${own.event.id}/matches`, matchBody({ number: 1 }));
    expect(notOurs.status).toBe(201);
    const board = await request(app).get(`/api/screen/${(await addScreen(admin)).token}`);
    expect(board.status).toBe(200);
    expect(board.body.timeline.ourMatches).toEqual([]);
    expect(board.body.readiness).toBeNull();
  });
});
