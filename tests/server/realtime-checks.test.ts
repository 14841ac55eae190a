import { beforeAll, expect, it } from 'vitest';
import type { RunJson, TemplateJson } from '../../shared/schemas/checks';
import { signIn, type SignedIn } from '../support/app';
import { itemId, makeOurMatch, makeRun, makeTemplate } from '../support/checks';
import { makeTeam, PASSWORD } from '../support/factories';
import { cookieOf, nextEvent, realtimeHarness } from '../support/realtime';

// Checks announce themselves to the event room (tablets and pit screens) with ids only.
const { app, open, openScreen } = realtimeHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let lead: SignedIn;
let crew: SignedIn;
let template: TemplateJson;
let run: RunJson;
beforeAll(async () => {
  team = await makeTeam();
  lead = await signIn(app, team.emails.lead, PASSWORD);
  crew = await signIn(app, team.emails.crew, PASSWORD);
  template = await makeTemplate(lead);
  run = await makeRun(lead, team.event.id, template.id);
});

const tabletOf = async (client: SignedIn) => (await open(await cookieOf(client))).socket;

it("a mark and an un-mark reach another tablet and the pit screen as 'checks:marked', with ids and no names", async () => {
  const admin = await signIn(app, team.emails.admin, PASSWORD);
  const screen = await admin.post('/api/team/screens', { name: 'Pit TV' });
  const tv = await openScreen(screen.body.token);
  expect(tv.error).toBeUndefined();
  const tablet = await tabletOf(await signIn(app, team.emails.viewer, PASSWORD));
  const item = itemId(run, 'Battery latched and strapped');
  const expected = { eventId: team.event.id, runId: run.id, itemId: item };

  const onTablet = nextEvent(tablet, 'checks:marked');
  const onScreen = nextEvent(tv.socket, 'checks:marked');
  expect((await crew.put(`/api/checklist-runs/${run.id}/items/${item}`, { value: true })).status).toBe(200);
  expect(await onTablet).toEqual(expected);
  expect(await onScreen).toEqual(expected);

  const unmarked = nextEvent(tablet, 'checks:marked');
  expect((await crew.delete(`/api/checklist-runs/${run.id}/items/${item}`)).status).toBe(200);
  expect(await unmarked).toEqual(expected);
});

it('a refused mark announces nothing', async () => {
  const tablet = await tabletOf(lead);
  const arrived = nextEvent(tablet, 'checks:marked');
  const refused = await crew.put(`/api/checklist-runs/${run.id}/items/${itemId(run, 'Stored air pressure')}`, { value: 'lots' });
  expect(refused.status).toBe(400);
  const lens = itemId(run, 'Wipe the camera lens');
  expect((await crew.put(`/api/checklist-runs/${run.id}/items/${lens}`, { value: true })).status).toBe(200);
  // The first announcement to arrive is the accepted mark's.
  expect(await arrived).toEqual({ eventId: team.event.id, runId: run.id, itemId: lens });
});

it("starting a run, by hand or by a field mark, announces 'checks:run-started'", async () => {
  const tablet = await tabletOf(crew);
  const q1 = await makeOurMatch(lead, team.event, { number: 1, scheduledStart: '2026-11-28T09:00:00.000Z' });
  const q2 = await makeOurMatch(lead, team.event, { number: 2, scheduledStart: '2026-11-28T09:07:00.000Z' });

  const byHand = nextEvent(tablet, 'checks:run-started');
  const started = await makeRun(crew, team.event.id, template.id, q1.id);
  expect(await byHand).toEqual({ eventId: team.event.id, runId: started.id, matchId: q1.id });

  const byField = nextEvent(tablet, 'checks:run-started');
  expect((await lead.post(`/api/events/${team.event.id}/field-progress`, { matchId: q1.id, startedAt: '2026-11-28T09:01:00Z' })).status).toBe(201);
  const [auto] = (await crew.get(`/api/events/${team.event.id}/checklist-runs?matchId=${q2.id}`)).body;
  expect(await byField).toEqual({ eventId: team.event.id, runId: auto.id, matchId: q2.id });
});

it("a sign-off announces 'checks:signed-off'; a template edit 'checks:templates-changed' to the team", async () => {
  const tablet = await tabletOf(crew);
  const signed = nextEvent(tablet, 'checks:signed-off');
  expect((await lead.post(`/api/checklist-runs/${run.id}/sign-off`, { reason: 'Practice run, left open on purpose' })).status).toBe(200);
  expect(await signed).toEqual({ eventId: team.event.id, runId: run.id });

  const changed = nextEvent(tablet, 'checks:templates-changed');
  expect((await lead.patch(`/api/checklist-templates/${template.id}`, { name: 'Renamed live' })).status).toBe(200);
  expect(await changed).toEqual({ id: template.id });
});
