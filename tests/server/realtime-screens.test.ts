import { beforeAll, expect, it } from 'vitest';
import { signIn, type SignedIn } from '../support/app';
import { makeTeam, PASSWORD } from '../support/factories';
import { nextEvent, realtimeHarness } from '../support/realtime';
import { matchBody } from '../support/schedule';

// Pit screens sign their socket in with the screen token instead of a session cookie.
const { app, openScreen } = realtimeHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let admin: SignedIn;
let lead: SignedIn;
beforeAll(async () => {
  team = await makeTeam();
  admin = await signIn(app, team.emails.admin, PASSWORD);
  lead = await signIn(app, team.emails.lead, PASSWORD);
});

const addScreen = async () => {
  const answer = await admin.post('/api/team/screens', { name: 'Pit TV' });
  expect(answer.status).toBe(201);
  return answer.body as { id: string; token: string };
};

it('refuses a screen socket with an unknown, malformed or revoked token', async () => {
  for (const token of ['A'.repeat(43), 'nope', 42]) {
    const { error } = await openScreen(token);
    expect(error?.message, String(token)).toBe('unauthenticated');
  }
  const screen = await addScreen();
  expect((await admin.delete(`/api/team/screens/${screen.id}`)).status).toBe(204);
  const { error } = await openScreen(screen.token);
  expect(error?.message).toBe('unauthenticated');
});

it('a screen socket hears the field progress of its event', async () => {
  const screen = await addScreen();
  const { socket, error } = await openScreen(screen.token);
  expect(error).toBeUndefined();
  const match = await lead.post(`/api/events/${team.event.id}/matches`, matchBody({ number: 11 }));
  expect(match.status).toBe(201);
  const arrived = nextEvent(socket, 'field:progressed');
  const marked = await lead.post(`/api/events/${team.event.id}/field-progress`, { matchId: match.body.id });
  expect(marked.status).toBe(201);
  expect(await arrived).toEqual({ eventId: team.event.id, matchId: match.body.id });
});

it('a screen socket hears when the event changes', async () => {
  const screen = await addScreen();
  const { socket } = await openScreen(screen.token);
  const arrived = nextEvent(socket, 'events:updated');
  expect((await admin.patch(`/api/events/${team.event.id}`, { venue: 'Hall 2' })).status).toBe(200);
  expect(await arrived).toEqual({ id: team.event.id });
});

it('revoking a screen disconnects its open socket at once, and only that one', async () => {
  const doomed = await addScreen();
  const kept = await addScreen();
  const { socket } = await openScreen(doomed.token);
  const other = await openScreen(kept.token);
  const closed = new Promise<string>((resolve) => socket.once('disconnect', resolve));
  expect((await admin.delete(`/api/team/screens/${doomed.id}`)).status).toBe(204);
  expect(await closed).toBe('io server disconnect');
  expect(other.socket.connected).toBe(true);
});
