import { beforeAll, expect, it } from 'vitest';
import { signIn, type SignedIn } from '../support/app';
import { makeTeam, PASSWORD } from '../support/factories';
import { cookieOf, nextEvent, realtimeHarness } from '../support/realtime';
import { matchBody } from '../support/schedule';
import { emitToEvent } from '../../server/realtime/broadcast';

const { app, open } = realtimeHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let admin: SignedIn;
let viewer: SignedIn;
beforeAll(async () => {
  team = await makeTeam();
  admin = await signIn(app, team.emails.admin, PASSWORD);
  viewer = await signIn(app, team.emails.viewer, PASSWORD);
});

it('refuses a socket without a session', async () => {
  const { error } = await open();
  expect(error?.message).toBe('unauthenticated');
});

it("a write by one member reaches another member's socket after it commits", async () => {
  const { socket, error } = await open(await cookieOf(viewer));
  expect(error).toBeUndefined();
  const arrived = nextEvent(socket, 'events:updated');
  const answer = await admin.patch(`/api/events/${team.event.id}`, { name: 'Renamed live' });
  expect(answer.status).toBe(200);
  expect(await arrived).toEqual({ id: team.event.id });
});

it("another team's socket hears nothing of it", async () => {
  const other = await makeTeam();
  const outsider = await signIn(app, other.emails.viewer, PASSWORD);
  const { socket } = await open(await cookieOf(outsider));
  let heard = false;
  socket.on('events:updated', () => (heard = true));
  const mine = await open(await cookieOf(viewer));
  const arrived = nextEvent(mine.socket, 'events:updated');
  await admin.patch(`/api/events/${team.event.id}`, { venue: 'Moved hall' });
  await arrived; // by then the broadcast has gone out to every room it was meant for
  expect(heard).toBe(false);
});

it('when another event becomes current, connected sockets follow it to that event room', async () => {
  const own = await makeTeam();
  const ownAdmin = await signIn(app, own.emails.admin, PASSWORD);
  const { socket } = await open(await cookieOf(await signIn(app, own.emails.crew, PASSWORD)));
  const created = await ownAdmin.post('/api/events', {
    name: 'Second weekend',
    venue: 'Larchmont Pavilion',
    timeZone: 'Europe/Berlin',
    startDate: '2027-04-02',
    endDate: '2027-04-03',
    teamNumber: own.team.number,
    current: true,
  });
  expect(created.status).toBe(201);
  const arrived = nextEvent(socket, 'probe');
  emitToEvent(created.body.id, 'probe', { ok: true });
  expect(await arrived).toEqual({ ok: true });
});

it('a field mark by the lead reaches a crew tablet on the event, with the event and match ids', async () => {
  const lead = await signIn(app, team.emails.lead, PASSWORD);
  const match = await lead.post(`/api/events/${team.event.id}/matches`, matchBody({ number: 7 }));
  expect(match.status).toBe(201);
  const { socket } = await open(await cookieOf(await signIn(app, team.emails.crew, PASSWORD)));
  const arrived = nextEvent(socket, 'field:progressed');
  const marked = await lead.post(`/api/events/${team.event.id}/field-progress`, { matchId: match.body.id });
  expect(marked.status).toBe(201);
  expect(await arrived).toEqual({ eventId: team.event.id, matchId: match.body.id });
});

it("signing out, or being deactivated, closes that session's socket at once", async () => {
  const own = await makeTeam();
  const ownAdmin = await signIn(app, own.emails.admin, PASSWORD);
  const crew = await signIn(app, own.emails.crew, PASSWORD);
  const viewerOwn = await signIn(app, own.emails.viewer, PASSWORD);
  const crewSocket = (await open(await cookieOf(crew))).socket;
  const viewerSocket = (await open(await cookieOf(viewerOwn))).socket;

  const crewGone = nextEvent(crewSocket, 'disconnect');
  expect((await crew.delete('/api/session')).status).toBe(204);
  expect(await crewGone).toBe('io server disconnect');

  const viewerGone = nextEvent(viewerSocket, 'disconnect');
  expect((await ownAdmin.patch(`/api/team/members/${own.memberships.viewer.id}`, { active: false })).status).toBe(200);
  expect(await viewerGone).toBe('io server disconnect');
});
