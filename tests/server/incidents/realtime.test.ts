import type { Socket } from 'socket.io-client';
import { beforeAll, expect, it } from 'vitest';
import { signIn, signInEveryRole, type SignedIn } from '../../support/app';
import { logReading, makeBattery } from '../../support/batteries';
import { makeTeam, PASSWORD } from '../../support/factories';
import { addIncidentPhoto, editIncident, incidentPhotoUrl, reportIncident } from '../../support/incidents';
import { cookieOf, nextEvent, realtimeHarness } from '../../support/realtime';

// 'incidents:changed' {id} goes to the incidents room only: the sockets of safety captains and
// mentors. The team room, the event room and pit screens never hear of an incident.
const { app, open, openScreen } = realtimeHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let as: Record<'admin' | 'lead' | 'crew' | 'battery' | 'safety' | 'viewer', SignedIn>;
let batteryId: string;
beforeAll(async () => {
  team = await makeTeam();
  as = await signInEveryRole(app, team.emails, PASSWORD);
  batteryId = (await makeBattery(as.battery)).id;
});

const tabletOf = async (client: SignedIn) => (await open(await cookieOf(client))).socket;

/** Every event name a socket hears from now on. */
function heardBy(socket: Socket) {
  const names: string[] = [];
  socket.onAny((name: string) => names.push(name));
  return names;
}

/**
 * A battery reading announces 'batteries:changed' to the team room and the pit screens, after
 * whatever was announced before it: once a socket has it, anything earlier has arrived too.
 */
async function barrier(sockets: readonly Socket[]) {
  const arrived = sockets.map((socket) => nextEvent(socket, 'batteries:changed'));
  await logReading(as.battery, batteryId);
  await Promise.all(arrived);
}

it('a report, an edit and photos reach the safety captain and the mentor as ids, never crew, viewer or pit screen', async () => {
  const safety = await tabletOf(as.safety);
  const admin = await tabletOf(as.admin);
  const others = [await tabletOf(as.crew), await tabletOf(as.viewer), await tabletOf(as.lead)];
  const screen = await as.admin.post('/api/team/screens', { name: 'Pit TV' });
  const tv = await openScreen(screen.body.token);
  expect(tv.error).toBeUndefined();
  const heard = [...others, tv.socket].map(heardBy);

  let onSafety = nextEvent(safety, 'incidents:changed');
  let onAdmin = nextEvent(admin, 'incidents:changed');
  const report = await reportIncident(as.crew, { kind: 'injury', treatments: ['hospital_visit'] });
  expect(await onSafety).toEqual({ id: report.id });
  expect(await onAdmin).toEqual({ id: report.id });

  // A refused edit announces nothing: the first announcement is the accepted one's.
  onSafety = nextEvent(safety, 'incidents:changed');
  expect((await as.safety.patch(`/api/incidents/${report.id}`, { version: 3, status: 'open' })).status).toBe(409);
  await editIncident(as.safety, report, { immediateActions: 'Ambulance called by event staff' });
  expect(await onSafety).toEqual({ id: report.id });

  onSafety = nextEvent(safety, 'incidents:changed');
  const photo = await addIncidentPhoto(as.crew, report.id);
  expect(await onSafety).toEqual({ id: report.id });
  onSafety = nextEvent(safety, 'incidents:changed');
  expect((await as.admin.delete(incidentPhotoUrl(report.id, photo.id))).status).toBe(204);
  expect(await onSafety).toEqual({ id: report.id });

  await barrier([...others, tv.socket]);
  for (const names of heard) expect(names.filter((name) => name.startsWith('incidents:'))).toEqual([]);
});

it("another team's safety captain hears nothing of our incidents", async () => {
  const other = await makeTeam();
  const theirs = await tabletOf(await signIn(app, other.emails.safety, PASSWORD));
  const heard = heardBy(theirs);
  const ours = await tabletOf(as.safety);
  const arrived = nextEvent(ours, 'incidents:changed');
  await reportIncident(as.crew);
  await arrived;
  // Their own team's barrier: a reading of theirs, announced after our report.
  const theirHandler = await signIn(app, other.emails.battery, PASSWORD);
  const theirBattery = await makeBattery(theirHandler);
  const barrierArrived = nextEvent(theirs, 'batteries:changed');
  await logReading(theirHandler, theirBattery.id);
  await barrierArrived;
  expect(heard.filter((name) => name.startsWith('incidents:'))).toEqual([]);
});

it('a member given the safety role starts hearing incidents on the socket already open; one who loses it stops', async () => {
  const own = await makeTeam();
  const ownAs = await signInEveryRole(app, own.emails, PASSWORD);
  const promoted = await tabletOf(ownAs.crew);
  const demoted = await tabletOf(ownAs.safety);
  const heardByDemoted = heardBy(demoted);
  const setRoles = async (role: 'crew' | 'safety', roles: string[]) => {
    const answer = await ownAs.admin.patch(`/api/team/members/${own.memberships[role].id}`, { roles });
    expect(answer.status, JSON.stringify(answer.body)).toBe(200);
  };
  await setRoles('crew', ['crew', 'safety']);
  await setRoles('safety', ['crew']);

  const arrived = nextEvent(promoted, 'incidents:changed');
  const report = await reportIncident(ownAs.lead);
  expect(await arrived).toEqual({ id: report.id });

  const battery = await makeBattery(ownAs.battery);
  const barrierArrived = nextEvent(demoted, 'batteries:changed');
  await logReading(ownAs.battery, battery.id);
  await barrierArrived;
  expect(heardByDemoted.filter((name) => name.startsWith('incidents:'))).toEqual([]);
});
