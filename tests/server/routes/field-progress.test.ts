import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { FieldMark } from '../../../server/models';
import { signIn, testApp, type SignedIn } from '../../support/app';
import { invalid } from '../../support/errors';
import { makeTeam, PASSWORD, type FactoryTeam } from '../../support/factories';
import { matchBody } from '../../support/schedule';

// POST /api/events/:eventId/field-progress and DELETE …/field-progress/latest. Signed-out,
// role and foreign-team rungs are in matches.test.ts.
const { app } = testApp();
let team: FactoryTeam;
let admin: SignedIn;
beforeAll(async () => {
  team = await makeTeam();
  admin = await signIn(app, team.emails.admin, PASSWORD);
});

async function ownTeamWithMatches() {
  const own = await makeTeam();
  const lead = await signIn(app, own.emails.lead, PASSWORD);
  const url = `/api/events/${own.event.id}/matches`;
  const q1 = (await lead.post(url, matchBody({ number: 1, scheduledStart: '2026-11-28T09:00:00Z' }))).body;
  const q2 = (await lead.post(url, matchBody({ number: 2, scheduledStart: '2026-11-28T09:07:00Z' }))).body;
  return { ...own, lead, q1, q2, progress: `/api/events/${own.event.id}/field-progress` };
}

describe('POST …/field-progress: bad input', () => {
  const cases: [string, Record<string, unknown>, Record<string, string>][] = [
    ['no match id', {}, { matchId: 'Required' }],
    ['a match id that is not a UUID', { matchId: 'q1' }, { matchId: 'Must be a UUID' }],
    ['a start without an offset', { matchId: randomUUID(), startedAt: '2026-11-28 09:01' }, { startedAt: 'Use an ISO time with an offset, e.g. 2027-03-05T15:00:00Z' }],
    ['an unknown key', { matchId: randomUUID(), by: 'me' }, { by: 'Not a field of this request' }],
    // Year 10000 once, after the offset: the database cannot store it (it used to be a 500).
    ['a start past the year 2100', { matchId: randomUUID(), startedAt: '9999-12-31T23:59:00-01:00' }, { startedAt: 'Use an ISO time with an offset, e.g. 2027-03-05T15:00:00Z' }],
  ];
  for (const [what, body, fields] of cases) {
    it(`answers 400 for ${what}`, async () => {
      const answer = await admin.post(`/api/events/${team.event.id}/field-progress`, body);
      expect(answer.status).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
    });
  }

  it('refuses a start in the future, and records nothing', async () => {
    const own = await ownTeamWithMatches();
    const inAnHour = new Date(Date.now() + 3_600_000).toISOString();
    const answer = await own.lead.post(own.progress, { matchId: own.q1.id, startedAt: inAnHour });
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual(invalid({ startedAt: 'Must not be in the future' }));
    expect(await FieldMark.count({ where: { eventId: own.event.id } })).toBe(0);
  });

  it('answers 404 for a match not in the event', async () => {
    const answer = await admin.post(`/api/events/${team.event.id}/field-progress`, { matchId: randomUUID() });
    expect(answer.status).toBe(404);
    expect(answer.body).toEqual({ error: { code: 'not_found', message: 'Match not found' } });
  });
});

describe('field progress and undo', () => {
  it('records a mark with who made it, answering the match with its start', async () => {
    const own = await ownTeamWithMatches();
    const answer = await own.lead.post(own.progress, { matchId: own.q1.id, startedAt: '2026-11-28T09:02:00+00:00' });
    expect(answer.status).toBe(201);
    expect(answer.body).toEqual({ ...own.q1, startedAt: '2026-11-28T09:02:00.000Z' });
    const mark = await FieldMark.findOne({ where: { matchId: own.q1.id }, rejectOnEmpty: true });
    expect(mark.markedById).toBe(own.memberships.lead.userId);
    expect(mark.undoneAt).toBeNull();
  });

  it('without startedAt marks the match as started now', async () => {
    const own = await ownTeamWithMatches();
    const before = Date.now();
    const answer = await own.lead.post(own.progress, { matchId: own.q1.id });
    expect(answer.status).toBe(201);
    expect(Date.parse(answer.body.startedAt)).toBeGreaterThanOrEqual(before - 1000);
  });

  it('a second mark of the same match corrects its start', async () => {
    const own = await ownTeamWithMatches();
    await own.lead.post(own.progress, { matchId: own.q1.id, startedAt: '2026-11-28T09:02:00Z' });
    const corrected = await own.lead.post(own.progress, { matchId: own.q1.id, startedAt: '2026-11-28T09:01:00Z' });
    expect(corrected.body.startedAt).toBe('2026-11-28T09:01:00.000Z');
  });

  it('undo takes back the latest mark, recording who, and walks back one mark per call', async () => {
    const own = await ownTeamWithMatches();
    await own.lead.post(own.progress, { matchId: own.q1.id, startedAt: '2026-11-28T09:02:00Z' });
    await own.lead.post(own.progress, { matchId: own.q2.id, startedAt: '2026-11-28T09:09:00Z' });

    const undone = await admin.delete(`/api/events/${team.event.id}/field-progress/latest`); // another team: nothing of theirs
    expect(undone.status).toBe(404);

    const ownAdmin = await signIn(app, own.emails.admin, PASSWORD);
    const first = await ownAdmin.delete(`${own.progress}/latest`);
    expect(first.status).toBe(200);
    expect(first.body).toEqual({ ...own.q2, startedAt: null });
    const mark = await FieldMark.findOne({ where: { matchId: own.q2.id }, rejectOnEmpty: true });
    expect(mark.undoneById).toBe(own.memberships.admin.userId);
    expect(mark.undoneAt).toBeInstanceOf(Date);

    const list = (await ownAdmin.get(`/api/events/${own.event.id}/matches`)).body;
    expect(list.map((m: { startedAt: string | null }) => m.startedAt)).toEqual(['2026-11-28T09:02:00.000Z', null]);

    expect((await ownAdmin.delete(`${own.progress}/latest`)).body).toEqual({ ...own.q1, startedAt: null });
    const none = await ownAdmin.delete(`${own.progress}/latest`);
    expect(none.status).toBe(404);
    expect(none.body).toEqual({ error: { code: 'nothing_to_undo', message: 'No field mark to undo' } });
  });
});
