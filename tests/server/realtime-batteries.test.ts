import { beforeAll, expect, it } from 'vitest';
import type { BatteryJson, ChargerJson } from '../../shared/schemas/batteries';
import { signIn, type SignedIn } from '../support/app';
import { install, makeBattery, makeCharger, readingBody } from '../support/batteries';
import { makeOurMatch } from '../support/checks';
import { makeTeam, PASSWORD } from '../support/factories';
import { cookieOf, nextEvent, realtimeHarness } from '../support/realtime';

// Battery writes announce themselves after commit, with ids only: 'batteries:changed' to the
// team's tablets, 'batteries:used' to the event room (tablets and pit screens: readiness changes).
const { app, open, openScreen } = realtimeHarness();
let team: Awaited<ReturnType<typeof makeTeam>>;
let handler: SignedIn;
let crew: SignedIn;
let battery: BatteryJson;
let charger: ChargerJson;
beforeAll(async () => {
  team = await makeTeam();
  handler = await signIn(app, team.emails.battery, PASSWORD);
  crew = await signIn(app, team.emails.crew, PASSWORD);
  battery = await makeBattery(handler, { label: 'LIVE' });
  charger = await makeCharger(handler);
});

const tabletOf = async (client: SignedIn) => (await open(await cookieOf(client))).socket;

it("fleet, reading, charger, charging and settings writes reach another tablet as 'batteries:changed' {id}", async () => {
  const tablet = await tabletOf(await signIn(app, team.emails.viewer, PASSWORD));

  let arrived = nextEvent(tablet, 'batteries:changed');
  const created = await makeBattery(handler, { label: 'NEW' });
  expect(await arrived).toEqual({ id: created.id });

  // A refused reading announces nothing: the first announcement is the accepted one's.
  arrived = nextEvent(tablet, 'batteries:changed');
  expect((await crew.post(`/api/batteries/${battery.id}/readings`, readingBody({ voltage: 17 }))).status).toBe(400);
  expect((await crew.post(`/api/batteries/${created.id}/readings`, readingBody())).status).toBe(201);
  expect(await arrived).toEqual({ id: created.id });

  arrived = nextEvent(tablet, 'batteries:changed');
  const cart = await makeCharger(handler, { name: 'Cart charger', bays: 1, currentPerBayA: 10 });
  expect(await arrived).toEqual({ id: cart.id });

  arrived = nextEvent(tablet, 'batteries:changed');
  const session = await handler.post(`/api/batteries/${created.id}/charging`, { chargerId: charger.id, bay: 2 });
  expect(await arrived).toEqual({ id: created.id });
  arrived = nextEvent(tablet, 'batteries:changed');
  expect((await handler.patch(`/api/charging-sessions/${session.body.id}`, { endedAt: new Date().toISOString() })).status).toBe(200);
  expect(await arrived).toEqual({ id: created.id });

  arrived = nextEvent(tablet, 'batteries:changed');
  expect((await handler.patch(`/api/batteries/${created.id}`, { status: 'retired' })).status).toBe(200);
  expect(await arrived).toEqual({ id: created.id });

  arrived = nextEvent(tablet, 'batteries:changed');
  expect((await handler.patch('/api/team/battery-settings', { chargeTailMinutes: 25 })).status).toBe(200);
  expect(await arrived).toEqual({ id: team.team.id });
});

it("installing and taking out reach the tablets and the pit screen as 'batteries:used', with ids and no names", async () => {
  const admin = await signIn(app, team.emails.admin, PASSWORD);
  const lead = await signIn(app, team.emails.lead, PASSWORD);
  const screen = await admin.post('/api/team/screens', { name: 'Pit TV' });
  const tv = await openScreen(screen.body.token);
  expect(tv.error).toBeUndefined();
  const tablet = await tabletOf(lead);
  const match = await makeOurMatch(lead, team.event);
  const expected = { eventId: team.event.id, batteryId: battery.id, matchId: match.id };

  let onTablet = nextEvent(tablet, 'batteries:used');
  let onScreen = nextEvent(tv.socket, 'batteries:used');
  const use = await install(crew, battery.id, match.id);
  expect(await onTablet).toEqual(expected);
  expect(await onScreen).toEqual(expected);

  onTablet = nextEvent(tablet, 'batteries:used');
  onScreen = nextEvent(tv.socket, 'batteries:used');
  expect((await crew.patch(`/api/battery-uses/${use.id}`, { removedAt: new Date().toISOString() })).status).toBe(200);
  expect(await onTablet).toEqual(expected);
  expect(await onScreen).toEqual(expected);
});
