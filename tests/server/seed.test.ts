import { expect, it } from 'vitest';
import { can, ROLES, type Capability, type Role } from '../../shared/roles';
import type { BatteryPlanJson } from '../../shared/domain/battery-plan';
import type { BatteryJson, ChargerJson } from '../../shared/schemas/batteries';
import type { RunSummaryJson, TemplateJson } from '../../shared/schemas/checks';
import { buildPlanInput } from '../../server/batteries/plan-input';
import { BatteryReading, BatteryUse, ChargingSession, ChecklistMark, User } from '../../server/models';
import { createDemoMatches, demoEmail, seedDemo } from '../../server/db/seed/demo';
import { LAST_MATCH_AFTER_VOLTS, seedDemoBatteries } from '../../server/db/seed/demo-batteries';
import { seedDemoChecklists } from '../../server/db/seed/demo-checklists';
import { inTransaction } from '../../server/db/transaction';
import { signIn, testApp } from '../support/app';
import { makeTeam, PASSWORD } from '../support/factories';

const { app } = testApp();

it('refuses to seed the demo accounts with NODE_ENV=production, and writes nothing', async () => {
  await expect(seedDemo({ env: 'production' })).rejects.toThrow('Refusing to seed demo accounts with NODE_ENV=production');
  expect(await User.count({ where: { email: demoEmail('admin') } })).toBe(0);
});

// The demo's checklists on a factory team (the demo team's accounts may exist in this database).
it('seeds a checklist per phase and our next match half checked: at risk, for the reasons a pit would expect', async () => {
  const own = await makeTeam();
  const now = new Date();
  const users = {} as Record<Role, User>;
  for (const role of ROLES) users[role] = await User.findByPk(own.memberships[role].userId, { rejectOnEmpty: true });
  await inTransaction(async (transaction) => {
    const matches = await createDemoMatches({ eventId: own.event.id, ourNumber: own.event.teamNumber, markedById: users.lead.id, now }, transaction);
    await seedDemoChecklists({ team: own.team, event: own.event, users, matches, now }, transaction);
  });

  const crew = await signIn(app, own.emails.crew, PASSWORD);
  const templates = (await crew.get('/api/checklist-templates')).body as TemplateJson[];
  expect(templates.map((template) => [template.phase, template.name])).toEqual([
    ['pre_match', 'Before every match'],
    ['post_match', 'After every match'],
    ['inspection', 'Robot inspection'],
    ['pack_out', 'Pack-out'],
  ]);
  const preMatch = templates[0].items;
  expect(preMatch.find((item) => item.purpose === 'bumper_colour')).toMatchObject({ kind: 'choice', options: ['Red', 'Blue'], required: true });
  expect(preMatch.find((item) => item.kind === 'number')).toMatchObject({ min: 100, max: 120, unit: 'psi' });
  expect(preMatch.some((item) => item.kind === 'text')).toBe(true);
  expect(preMatch.some((item) => !item.required)).toBe(true);

  const runs = (await crew.get(`/api/events/${own.event.id}/checklist-runs`)).body as RunSummaryJson[];
  expect(runs.map((run) => [run.name, run.match?.number ?? null, run.complete]).sort()).toEqual(
    [
      ['Robot inspection', null, true],
      ['Before every match', 17, true],
      ['After every match', 17, false],
      ['Before every match', 24, false],
    ].sort(),
  );
  expect(runs.find((run) => run.name === 'Robot inspection')?.signOff?.by.id).toBe(users.lead.id);
  // Every seeded mark is one the API would have taken: by a member whose role may mark.
  const markers = await ChecklistMark.findAll({ where: { runId: runs.map((run) => run.id) } });
  expect(markers.length).toBeGreaterThan(0);
  for (const { markedById } of markers) {
    const role = ROLES.find((candidate) => users[candidate].id === markedById);
    expect(role && can([role], 'checks:mark'), `marked by ${role}`).toBe(true);
  }

  const timeline = (await crew.get(`/api/events/${own.event.id}/timeline?at=${now.toISOString()}`)).body;
  const next = timeline.ourMatches[0];
  expect(next.number).toBe(24);
  const readiness = await crew.get(`/api/events/${own.event.id}/matches/${next.matchId}/readiness?at=${now.toISOString()}`);
  expect(readiness.body).toEqual({
    matchId: next.matchId,
    state: 'at_risk',
    reasons: [
      { code: 'checklist_incomplete', level: 'at_risk', message: 'Before every match: 2 required items open (Radio and its cables secured, No loose fasteners)' },
      { code: 'advisory_open', level: 'at_risk', message: 'Before every match: 2 optional items open (Camera lens wiped, Spare battery waiting on the cart)' },
    ],
  });
});

// The demo's battery fleet on a factory team, next to its schedule and checklists.
it('seeds a fleet with a history, chargers in use, the played matches measured and our next match\'s battery in: readiness stays at risk from the checks alone', async () => {
  const own = await makeTeam();
  const now = new Date();
  const users = {} as Record<Role, User>;
  for (const role of ROLES) users[role] = await User.findByPk(own.memberships[role].userId, { rejectOnEmpty: true });
  await inTransaction(async (transaction) => {
    const matches = await createDemoMatches({ eventId: own.event.id, ourNumber: own.event.teamNumber, markedById: users.lead.id, now }, transaction);
    await seedDemoChecklists({ team: own.team, event: own.event, users, matches, now }, transaction);
    await seedDemoBatteries({ team: own.team, event: own.event, users, matches, now }, transaction);
  });

  const handler = await signIn(app, own.emails.battery, PASSWORD);
  const fleet = (await handler.get('/api/batteries')).body as BatteryJson[];
  expect(fleet.map((battery) => [battery.label, battery.status, battery.health.status, battery.usesThisEvent])).toEqual([
    ['23-A', 'retired', 'replace', 0],
    ['24-A', 'resting', 'replace', 0],
    ['24-B', 'ready', 'watch', 0],
    ['25-A', 'charging', 'good', 1],
    ['25-B', 'ready', 'good', 1],
    ['25-C', 'ready', 'good', 0],
    ['26-A', 'ready', 'good', 1],
    ['26-B', 'ready', 'good', 0],
    ['26-C', 'in_robot', 'good', 1],
    ['26-D', 'charging', 'good', 0],
  ]);
  for (const battery of fleet) expect(battery.latestReading, battery.label).not.toBeNull();
  const chargers = (await handler.get('/api/chargers')).body as ChargerJson[];
  expect(chargers.map(({ name, bays, currentPerBayA }) => [name, bays, currentPerBayA])).toEqual([
    ['Bench charger', 2, 6],
    ['Cart charger', 1, 10],
  ]);
  // Both bench bays are busy, and each charge ends after now.
  const charging = fleet.filter((battery) => battery.charging).map((battery) => battery.charging!);
  expect(charging.map((session) => [session.chargerId, session.bay]).sort()).toEqual([[chargers[0].id, 1], [chargers[0].id, 2]].sort());
  for (const session of charging) expect(Date.parse(session.expectedEndAt!)).toBeGreaterThan(now.getTime());
  // The battery of our last match came off as the post-match check says.
  const lastUsed = fleet.find((battery) => battery.label === '25-A')!;
  expect(lastUsed.latestReading).toMatchObject({ voltage: LAST_MATCH_AFTER_VOLTS, rested: false, reliable: false });

  // Every seeded write is one the API would have taken from that member.
  const ids = fleet.map((battery) => battery.id);
  const writers: [string | null, Capability][] = [
    ...(await BatteryReading.findAll({ where: { batteryId: ids } })).map((row) => [row.takenById, 'batteries:swap'] as [string, Capability]),
    ...(await BatteryUse.findAll({ where: { batteryId: ids } })).flatMap((row) => [[row.installedById, 'batteries:swap'], [row.removedById, 'batteries:swap']] as [string | null, Capability][]),
    ...(await ChargingSession.findAll({ where: { batteryId: ids } })).flatMap((row) => [[row.startedById, 'batteries:manage'], [row.endedById, 'batteries:manage']] as [string | null, Capability][]),
  ];
  for (const [userId, capability] of writers.filter(([userId]) => userId !== null)) {
    const role = ROLES.find((candidate) => users[candidate].id === userId);
    expect(role && can([role], capability), `${capability} by ${role}`).toBe(true);
  }

  const timeline = (await handler.get(`/api/events/${own.event.id}/timeline?at=${now.toISOString()}`)).body;
  const next = timeline.ourMatches[0];
  const readiness = await handler.get(`/api/events/${own.event.id}/matches/${next.matchId}/readiness?at=${now.toISOString()}`);
  expect(readiness.body.state).toBe('at_risk');
  expect(readiness.body.reasons.map((reason: { code: string }) => reason.code)).toEqual(['checklist_incomplete', 'advisory_open']);

  // Three measured matches: the draw is learned (median of 8.75, 7.5 and 10 points in the BCI table).
  const input = await buildPlanInput(own.event, now);
  expect(input.drawPercent).toBeCloseTo(8.75, 6);
  const plan = (await handler.get(`/api/events/${own.event.id}/battery-plan?at=${now.toISOString()}`)).body as BatteryPlanJson;
  expect(plan.assignments.map((assignment) => assignment.matchId)).toEqual(timeline.ourMatches.map((match: { matchId: string }) => match.matchId));
  expect(plan.assignments[0].batteryId).toBe(fleet.find((battery) => battery.label === '26-C')!.id);
  expect(plan.warnings).toEqual([]);
});
