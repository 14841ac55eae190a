import { beforeAll, expect, it } from 'vitest';
import { signIn, type SignedIn } from '../support/app';
import { makeTeam, PASSWORD } from '../support/factories';
import { addPhoto, editRepair, makeRepair } from '../support/repairs';
import { cookieOf, nextEvent, realtimeHarness } from '../support/realtime';

// Repair writes announce themselves after commit, with ids only: 'repairs:created' and
// 'repairs:changed' to the event room (tablets and pit screens), the subsystem list to the team's tablets.
const { app, open, openScreen } = realtimeHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let crew: SignedIn;
let lead: SignedIn;
beforeAll(async () => {
  team = await makeTeam();
  crew = await signIn(app, team.emails.crew, PASSWORD);
  lead = await signIn(app, team.emails.lead, PASSWORD);
});

const tabletOf = async (client: SignedIn) => (await open(await cookieOf(client))).socket;

it("a report, a move, a photo and its removal reach another tablet and the pit screen as 'repairs:*', with ids and no names", async () => {
  const admin = await signIn(app, team.emails.admin, PASSWORD);
  const screen = await admin.post('/api/team/screens', { name: 'Pit TV' });
  const tv = await openScreen(screen.body.token);
  expect(tv.error).toBeUndefined();
  const tablet = await tabletOf(await signIn(app, team.emails.viewer, PASSWORD));
  const eventId = team.event.id;

  let onTablet = nextEvent(tablet, 'repairs:created');
  let onScreen = nextEvent(tv.socket, 'repairs:created');
  const repair = await makeRepair(crew, eventId);
  expect(await onTablet).toEqual({ id: repair.id, eventId });
  expect(await onScreen).toEqual({ id: repair.id, eventId });

  // A refused write announces nothing: the first announcement is the accepted move's.
  onTablet = nextEvent(tablet, 'repairs:changed');
  onScreen = nextEvent(tv.socket, 'repairs:changed');
  expect((await crew.patch(`/api/repairs/${repair.id}`, { version: 5, status: 'done' })).status).toBe(409);
  const moved = await editRepair(crew, repair, { status: 'in_progress' });
  expect(await onTablet).toEqual({ id: repair.id, eventId, version: 1 });
  expect(await onScreen).toEqual({ id: repair.id, eventId, version: 1 });

  // Photos do not change the version; they still announce the ticket.
  onTablet = nextEvent(tablet, 'repairs:changed');
  const photo = await addPhoto(crew, repair.id);
  expect(await onTablet).toEqual({ id: repair.id, eventId, version: moved.version });
  onTablet = nextEvent(tablet, 'repairs:changed');
  expect((await lead.delete(photo.url)).status).toBe(204);
  expect(await onTablet).toEqual({ id: repair.id, eventId, version: moved.version });
});

it("a new subsystem list reaches the team's tablets as 'repairs:subsystems-changed' {}", async () => {
  const own = await makeTeam();
  const tablet = await tabletOf(await signIn(app, own.emails.crew, PASSWORD));
  const ownLead = await signIn(app, own.emails.lead, PASSWORD);
  const arrived = nextEvent(tablet, 'repairs:subsystems-changed');
  expect((await ownLead.put('/api/team/repair-subsystems', { version: 0, subsystems: [{ label: 'Climber' }] })).status).toBe(200);
  expect(await arrived).toEqual({});
});

it("another team's tablet hears nothing of our board", async () => {
  const other = await makeTeam();
  const theirs = await tabletOf(await signIn(app, other.emails.lead, PASSWORD));
  let heard = false;
  theirs.onAny(() => (heard = true));
  const ours = await tabletOf(lead);
  const arrived = nextEvent(ours, 'repairs:created');
  await makeRepair(crew, team.event.id, { title: 'Quiet one' });
  await arrived;
  expect(heard).toBe(false);
});
