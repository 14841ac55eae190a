import { beforeAll, describe, expect, it } from 'vitest';
import { signIn, testApp, type SignedIn } from '../../support/app';
import { invalid } from '../../support/errors';
import { DEFAULT_SETTINGS, eventBody, makeTeam, PASSWORD, type FactoryTeam } from '../../support/factories';

// PATCH /api/events/:eventId. Signed-out, per-role, bad eventId and foreign-team answers are
// in events.test.ts.
const { app } = testApp();
let team: FactoryTeam;
let admin: SignedIn;
beforeAll(async () => {
  team = await makeTeam();
  admin = await signIn(app, team.emails.admin, PASSWORD);
});

/** A team of its own with its admin signed in, for tests that change events. */
async function ownTeam() {
  const own = await makeTeam();
  return { ...own, admin: await signIn(app, own.emails.admin, PASSWORD), url: `/api/events/${own.event.id}` };
}

describe('PATCH /api/events/:eventId: bad input', () => {
  const cases: [string, Record<string, unknown>, Record<string, string>][] = [
    ['an empty name', { name: '' }, { name: 'Give the event a name' }],
    ['an empty venue', { venue: ' ' }, { venue: 'Give the venue' }],
    ['an unknown time zone', { timeZone: 'Mars/Olympus' }, { timeZone: 'Use an IANA time zone such as Europe/Berlin' }],
    ['an impossible start date', { startDate: '2026-13-40' }, { startDate: 'Use the form YYYY-MM-DD' }],
    ['an end before the start', { startDate: '2026-12-05', endDate: '2026-12-04' }, { endDate: 'Must not be before the start date' }],
    ['a team number that is text', { teamNumber: 'abc' }, { teamNumber: 'A whole number' }],
    ['current: false', { current: false }, { current: 'Only true: make another event current to replace it' }],
    ['a version that is not a count', { version: -1 }, { version: 'The version number you loaded' }],
    ['an unknown key (the body is strict)', { name: 'Fine', colour: 'red' }, { colour: 'Not a field of this request' }],
  ];
  for (const [what, body, fields] of cases) {
    it(`answers 400 for ${what}, naming the field, and changes nothing`, async () => {
      const answer = await admin.patch(`/api/events/${team.event.id}`, body);
      expect(answer.status).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
      const stored = (await admin.get(`/api/events/${team.event.id}`)).body;
      expect(stored).toMatchObject({ name: team.event.name, venue: team.event.venue, version: 0 });
    });
  }

  it('answers 400 for an end date before the stored start date (only the end date sent)', async () => {
    const own = await ownTeam(); // starts 2026-12-05
    const answer = await own.admin.patch(own.url, { endDate: '2026-12-01' });
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual(invalid({ endDate: 'Must not be before the start date' }));
    expect((await own.admin.get(own.url)).body.endDate).toBe('2026-12-06');
  });

  it('answers 400 for a start date after the stored end date (only the start date sent)', async () => {
    const own = await ownTeam(); // ends 2026-12-06
    const answer = await own.admin.patch(own.url, { startDate: '2026-12-10' });
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual(invalid({ endDate: 'Must not be before the start date' }));
    expect((await own.admin.get(own.url)).body.startDate).toBe('2026-12-05');
  });

  it('answers 400 malformed_json for a body that is not JSON', async () => {
    const answer = await admin.agent
      .patch(`/api/events/${team.event.id}`)
      .set('x-csrf-token', admin.csrfToken)
      .set('Content-Type', 'application/json')
      .send("{name: 'single quotes'}");
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual({ error: { code: 'malformed_json', message: 'The request body is not valid JSON' } });
  });

  it('answers 413 too_large for a body over 1 MB', async () => {
    const answer = await admin.patch(`/api/events/${team.event.id}`, { name: 'x'.repeat(1024 * 1024 + 1) });
    expect(answer.status).toBe(413);
    expect(answer.body).toEqual({ error: { code: 'too_large', message: 'The request body is larger than 1 MB' } });
  });
});

describe('PATCH /api/events/:eventId: settings', () => {
  const cases: [string, Record<string, unknown>, Record<string, string>][] = [
    ['both queue leads', { queueLead: { matches: 2, minutes: 10 } }, { 'settings.queueLead': 'Give either matches or minutes' }],
    ['no queue lead', { queueLead: {} }, { 'settings.queueLead': 'Give either matches or minutes' }],
    ['a queue lead of 0 matches', { queueLead: { matches: 0 } }, { 'settings.queueLead.matches': 'A whole number of matches from 1 to 20' }],
    ['a queue lead of 241 minutes', { queueLead: { minutes: 241 } }, { 'settings.queueLead.minutes': 'A whole number of minutes from 1 to 240' }],
    ['a match of 10 seconds', { matchLengthSeconds: 10 }, { 'settings.matchLengthSeconds': 'A whole number of seconds from 30 to 900' }],
    ['a return to pit of 2.5 minutes', { returnToPitMinutes: 2.5 }, { 'settings.returnToPitMinutes': 'A whole number of minutes from 0 to 60' }],
    ['a tight threshold below 0', { tightTurnaroundMinutes: -1 }, { 'settings.tightTurnaroundMinutes': 'A whole number of minutes from 0 to 240' }],
    ['running ahead as text', { allowRunningAhead: 'yes' }, { 'settings.allowRunningAhead': 'true or false' }],
    ['an unknown setting', { pitCount: 2 }, { 'settings.pitCount': 'Not a field of this request' }],
  ];
  for (const [what, settings, fields] of cases) {
    it(`answers 400 for ${what}, naming the setting, and changes nothing`, async () => {
      const answer = await admin.patch(`/api/events/${team.event.id}`, { settings });
      expect(answer.status).toBe(400);
      expect(answer.body).toEqual(invalid(fields));
      expect((await admin.get(`/api/events/${team.event.id}`)).body.settings).toEqual(DEFAULT_SETTINGS);
    });
  }

  it('changes the settings sent, keeps the others, and switches the queue lead between matches and minutes', async () => {
    const own = await ownTeam();
    const byMinutes = await own.admin.patch(own.url, { settings: { queueLead: { minutes: 12 }, allowRunningAhead: true }, version: 0 });
    expect(byMinutes.status).toBe(200);
    expect(byMinutes.body.settings).toEqual({ ...DEFAULT_SETTINGS, queueLead: { minutes: 12 }, allowRunningAhead: true });
    expect(byMinutes.body.version).toBe(1);

    const back = await own.admin.patch(own.url, { settings: { queueLead: { matches: 3 }, matchLengthSeconds: 165, returnToPitMinutes: 4, tightTurnaroundMinutes: 25 } });
    expect(back.body.settings).toEqual({ queueLead: { matches: 3 }, matchLengthSeconds: 165, returnToPitMinutes: 4, tightTurnaroundMinutes: 25, allowRunningAhead: true });
    expect((await own.admin.get(own.url)).body).toEqual(back.body);
  });

  it('is for admins only: a lead may not change settings', async () => {
    const own = await ownTeam();
    const lead = await signIn(app, own.emails.lead, PASSWORD);
    const answer = await lead.patch(own.url, { settings: { matchLengthSeconds: 160 } });
    expect(answer.status).toBe(403);
    expect((await own.admin.get(own.url)).body.settings).toEqual(DEFAULT_SETTINGS);
  });
});

describe('PATCH /api/events/:eventId: success', () => {
  it('changes every field, keeps the time zone exactly and counts the version up', async () => {
    const own = await ownTeam();
    const changes = { name: 'Tallowmere Spring Qualifier', venue: 'Quarrystone Field House', timeZone: 'America/Chicago', startDate: '2027-03-25', endDate: '2027-03-27', teamNumber: 26118 };
    const answer = await own.admin.patch(own.url, { ...changes, version: 0 });
    expect(answer.status).toBe(200);
    expect(answer.body).toEqual({
      id: own.event.id,
      ...changes,
      settings: DEFAULT_SETTINGS,
      current: true,
      version: 1,
      createdAt: own.event.createdAt.toISOString(),
      updatedAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
    });
    expect((await own.admin.get(own.url)).body).toEqual(answer.body);
  });

  it('with current: true makes the event current, and the previous one no longer is', async () => {
    const own = await ownTeam();
    const other = await own.admin.post('/api/events', eventBody({ name: 'Off-season' }));
    expect(other.body.current).toBe(false);

    const answer = await own.admin.patch(`/api/events/${other.body.id}`, { current: true });
    expect(answer.status).toBe(200);
    expect(answer.body.current).toBe(true);
    const list = (await own.admin.get('/api/events')).body as { id: string; current: boolean }[];
    expect(list.map((event) => [event.id, event.current])).toEqual([
      [other.body.id, true],
      [own.event.id, false],
    ]);
    expect((await own.admin.get('/api/team')).body.currentEventId).toBe(other.body.id);
  });
});

describe('PATCH /api/events/:eventId with a stale version', () => {
  it("answers 409 stale with the other writer's values, and keeps them", async () => {
    const own = await ownTeam();
    const tablet = await signIn(app, own.emails.admin, PASSWORD); // a second device, same version loaded
    const loaded = (await tablet.get(own.url)).body;

    const first = await own.admin.patch(own.url, { venue: 'Hall B', version: loaded.version });
    expect(first.status).toBe(200);
    expect(first.body.version).toBe(loaded.version + 1);

    const second = await tablet.patch(own.url, { venue: 'Hall C', version: loaded.version });
    expect(second.status).toBe(409);
    expect(second.body).toEqual({
      error: { code: 'stale', message: 'Someone else changed this record since you loaded it', current: first.body },
    });
    expect((await tablet.get(own.url)).body).toEqual(first.body);

    // Reloaded, the second writer gets through.
    const retried = await tablet.patch(own.url, { venue: 'Hall C', version: first.body.version });
    expect(retried.status).toBe(200);
    expect(retried.body.venue).toBe('Hall C');
  });
});
