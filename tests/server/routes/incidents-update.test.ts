import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { composeIncidentAlert } from '../../../shared/domain/incident-alert';
import type { Role } from '../../../shared/roles';
import type { IncidentJson } from '../../../shared/schemas/incidents';
import { ChargingSession, Incident } from '../../../server/models';
import { signInEveryRole, testApp } from '../../support/app';
import { logReading, makeBattery, makeCharger, startCharging, statusesOf } from '../../support/batteries';
import { invalid } from '../../support/errors';
import { makeTeam, PASSWORD } from '../../support/factories';
import { editIncident, queuedAlerts, reportIncident } from '../../support/incidents';

// PATCH /api/incidents/:id: edits, follow-ups, closing and reopening, retiring a battery, escalation.
const { app, config } = testApp();

/** A team of our own with every role signed in, and a first-aid report by the crew. */
async function ownReport(overrides: Record<string, unknown> = {}) {
  const own = await makeTeam();
  const as = await signInEveryRole(app, own.emails, PASSWORD);
  const report = await reportIncident(as.crew, { kind: 'injury', treatments: ['hot_cold_therapy'], ...overrides });
  const patch = (changes: Record<string, unknown>, base: { version: number } = report) => as.safety.patch(`/api/incidents/${report.id}`, { version: base.version, ...changes });
  return { ...own, as, report, patch, memberOf: (role: Role) => own.memberships[role].id };
}

const followUp = (ownerId: string, overrides: Record<string, unknown> = {}) => ({ text: 'Rack the drill bits', ownerId, dueOn: '2026-12-06', ...overrides });

describe('editing a report', () => {
  it('saves the fields sent, counts the version up and re-classes by the care; the same values again write nothing', async () => {
    const { report, as, patch } = await ownReport();
    const answer = await patch({ location: 'queue', description: 'Pinched a finger in the bumper latch', treatments: ['hot_cold_therapy', 'finger_guard'] });
    expect(answer.status).toBe(200);
    const edited: IncidentJson = answer.body;
    expect(edited).toEqual({
      ...report,
      location: 'queue',
      description: 'Pinched a finger in the bumper latch',
      treatments: ['hot_cold_therapy', 'finger_guard'],
      classification: { class: 'first_aid_only', basis: ['hot_cold_therapy', 'finger_guard'] },
      view: 'full',
      updatedAt: expect.any(String),
      version: 1,
    });
    const again = await as.safety.patch(`/api/incidents/${report.id}`, { version: 1, location: 'queue', treatments: ['finger_guard', 'hot_cold_therapy'] });
    expect(again.body).toEqual(edited);
  });

  it('refuses a stale version with 409 and the report as it is now, writing nothing', async () => {
    const { report, patch } = await ownReport();
    const current = (await patch({ immediateActions: 'Ice from the snack bar' })).body as IncidentJson;
    const answer = await patch({ status: 'closed', closingNote: 'Fine' }, report);
    expect(answer.status).toBe(409);
    expect(answer.body).toEqual({ error: { code: 'stale', message: 'Someone else changed this record since you loaded it', current } });
    expect((await Incident.findByPk(report.id, { rejectOnEmpty: true })).status).toBe('open');
  });

  it('lets one of two edits on the same version through: the other is stale, never silently lost', async () => {
    const { report, patch } = await ownReport();
    const answers = await Promise.all([patch({ immediateActions: 'First tablet' }), patch({ immediateActions: 'Second tablet' })]);
    expect(statusesOf(answers)).toEqual([200, 409]);
    const saved = answers.find((answer) => answer.status === 200)!.body as IncidentJson;
    expect((await Incident.findByPk(report.id, { rejectOnEmpty: true })).immediateActions).toBe(saved.immediateActions);
  });

  it("refuses a moment in the future, another team's battery, and a field it does not know", async () => {
    const { patch } = await ownReport();
    const other = await makeTeam();
    const theirs = await makeBattery((await signInEveryRole(app, other.emails, PASSWORD)).battery);
    expect((await patch({ occurredAt: new Date(Date.now() + 3_600_000).toISOString() })).body).toEqual(invalid({ occurredAt: 'Must not be in the future' }));
    const battery = await patch({ batteryId: theirs.id });
    expect(battery.status).toBe(404);
    expect(battery.body.error.fields).toEqual({ batteryId: 'Not a battery of this team' });
    expect((await patch({ reporterId: randomUUID() })).body).toEqual(invalid({ reporterId: 'Not a field of this request' }));
    expect((await patch({ status: 'open' }, { version: -1 })).body).toEqual(invalid({ version: 'The version number you loaded' }));
  });
});

describe('follow-up actions', () => {
  it('takes the whole list: new entries get ids and owner names, ticking one done stamps it, entries left out go', async () => {
    const { report, patch, memberOf } = await ownReport();
    const added = (await patch({ followUps: [followUp(memberOf('lead')), followUp(memberOf('safety'), { text: 'Buy a first-aid kit refill', dueOn: '2026-12-05' })] }))
      .body as IncidentJson;
    expect(added.followUps).toEqual([
      { id: expect.any(String), text: 'Rack the drill bits', ownerId: memberOf('lead'), ownerName: 'Factory lead', dueOn: '2026-12-06', done: false, doneAt: null },
      { id: expect.any(String), text: 'Buy a first-aid kit refill', ownerId: memberOf('safety'), ownerName: 'Factory safety', dueOn: '2026-12-05', done: false, doneAt: null },
    ]);
    const [rack, refill] = added.followUps;

    const ticked = (await patch({ followUps: [{ ...followUp(rack.ownerId), id: rack.id, done: true }, { ...followUp(refill.ownerId, { text: refill.text, dueOn: refill.dueOn }), id: refill.id }] }, added))
      .body as IncidentJson;
    expect(ticked.followUps[0]).toEqual({ ...rack, done: true, doneAt: expect.any(String) });
    expect(ticked.followUps[1]).toEqual(refill);

    // Still done: the moment it was ticked stays. The refill is dropped from the list.
    const kept = (await patch({ followUps: [{ ...followUp(rack.ownerId, { text: 'Rack the drill bits after use' }), id: rack.id, done: true }] }, ticked)).body as IncidentJson;
    expect(kept.followUps).toEqual([{ ...ticked.followUps[0], text: 'Rack the drill bits after use' }]);
    expect(report.followUps).toEqual([]);
  });

  it("refuses an owner who is not an active member of this team, but keeps a departed owner on the entry they had", async () => {
    const { patch, memberOf, memberships } = await ownReport();
    const other = await makeTeam();
    const refused = await patch({
      followUps: [followUp(memberOf('crew')), followUp(other.memberships.safety.id), followUp(randomUUID())],
    });
    expect(refused.body).toEqual(invalid({ 'followUps.1.ownerId': 'Must be a member of the team', 'followUps.2.ownerId': 'Must be a member of the team' }));

    const withCrew = (await patch({ followUps: [followUp(memberOf('crew'))] })).body as IncidentJson;
    await memberships.crew.update({ active: false });
    const [entry] = withCrew.followUps;
    const kept = await patch({ followUps: [{ ...followUp(memberOf('crew')), id: entry.id, done: true }] }, withCrew);
    expect(kept.status).toBe(200);
    const fresh = await patch({ followUps: [{ ...followUp(memberOf('crew')), id: entry.id }, followUp(memberOf('crew'))] }, kept.body);
    expect(fresh.body).toEqual(invalid({ 'followUps.1.ownerId': 'Must be a member of the team' }));
  });

  it('refuses the same id twice in one list', async () => {
    const { patch, memberOf } = await ownReport();
    const id = randomUUID();
    const answer = await patch({ followUps: [{ ...followUp(memberOf('lead')), id }, { ...followUp(memberOf('lead')), id }] });
    expect(answer.body).toEqual(invalid({ 'followUps.1.id': 'Already in the list' }));
  });
});

describe('closing and reopening', () => {
  it('needs a closing note, sent with it or stored before; reopening keeps the note, and a closed report cannot lose it', async () => {
    const { report, patch, memberships } = await ownReport();
    const refused = await patch({ status: 'closed' });
    expect(refused.body).toEqual(invalid({ closingNote: 'Say how it was closed before closing the report' }));
    expect((await patch({ status: 'closed', closingNote: '   ' })).body).toEqual(invalid({ closingNote: 'Say how it was closed before closing the report' }));

    const closed = (await patch({ status: 'closed', closingNote: 'Ice, then back to work; latch edge filed' })).body as IncidentJson;
    expect(closed).toMatchObject({ status: 'closed', closingNote: 'Ice, then back to work; latch edge filed', closedAt: expect.any(String), version: 1 });
    const row = await Incident.findByPk(report.id, { rejectOnEmpty: true });
    expect(row.closedById).toBe(memberships.safety.userId);
    expect((await patch({ closingNote: null }, closed)).body).toEqual(invalid({ closingNote: 'Say how it was closed before closing the report' }));

    const reopened = (await patch({ status: 'open' }, closed)).body as IncidentJson;
    expect(reopened).toMatchObject({ status: 'open', closingNote: 'Ice, then back to work; latch edge filed', closedAt: null, version: 2 });
    expect((await patch({ status: 'closed' }, reopened)).body).toMatchObject({ status: 'closed', version: 3 });
  });

  it('retires the battery the report names when asked while closing: off its charger, out of the rotation', async () => {
    const { as, patch, report } = await ownReport({ kind: 'battery_or_chemical', treatments: ['eye_flush_or_swab'] });
    const battery = await makeBattery(as.battery, { label: '23-B' });
    await logReading(as.battery, battery.id, { voltage: 12.3 });
    const charging = await startCharging(as.battery, battery.id, (await makeCharger(as.battery)).id);
    const named = (await patch({ batteryId: battery.id })).body as IncidentJson;
    expect(named.batteryName).toBe('23-B');

    expect((await patch({ retireBattery: true }, named)).body).toEqual(invalid({ retireBattery: 'Only when closing the report' }));
    const before = (await as.battery.get(`/api/batteries/${battery.id}`)).body;
    expect(before.status).toBe('charging');
    const closed = await patch({ status: 'closed', closingNote: 'Cracked case: battery out of service', retireBattery: true }, named);
    expect(closed.status).toBe(200);
    const after = (await as.battery.get(`/api/batteries/${battery.id}`)).body;
    expect(after).toMatchObject({ status: 'retired', charging: null, version: before.version + 1 });
    expect((await ChargingSession.findByPk(charging.id, { rejectOnEmpty: true })).endedAt).not.toBeNull();
    expect(report.batteryId).toBeNull();
  });

  it('refuses to retire a battery when the report names none', async () => {
    const { patch } = await ownReport();
    expect((await patch({ status: 'closed', closingNote: 'Done', retireBattery: true })).body).toEqual(invalid({ retireBattery: 'The report names no battery' }));
  });
});

describe('escalation', () => {
  it('alerts again when later care makes a report more serious than what was alerted, and only then', async () => {
    const { report, patch, team, emails, event } = await ownReport();
    const contacts = [emails.admin, emails.safety].sort();
    const alertOf = (incident: IncidentJson) =>
      composeIncidentAlert({
        teamName: team.name,
        kind: incident.kind,
        location: incident.location,
        occurredAt: new Date(incident.occurredAt),
        timeZone: event.timeZone,
        treatments: incident.treatments,
        involvedCount: incident.involved.length,
        link: `${config.publicUrl}/safety/incidents/${incident.id}`,
      }).subject;
    const firstAid = alertOf(report);
    expect(await queuedAlerts(report.id)).toEqual(contacts.map((to) => expect.objectContaining({ to, subject: firstAid })));

    const hospital = (await patch({ treatments: ['hot_cold_therapy', 'hospital_visit'] })).body as IncidentJson;
    const beyond = alertOf(hospital);
    expect(beyond).toMatch(/^Safety alert, /);
    const queued = (await queuedAlerts(report.id)).map((mail) => `${mail.to} ${mail.subject}`).sort();
    expect(queued).toEqual([...contacts.map((to) => `${to} ${firstAid}`), ...contacts.map((to) => `${to} ${beyond}`)].sort());

    // Taking the visit back and adding it again tells nobody anything new.
    const lowered = (await patch({ treatments: ['hot_cold_therapy'] }, hospital)).body as IncidentJson;
    await patch({ treatments: ['hot_cold_therapy', 'hospital_visit'] }, lowered);
    expect(await queuedAlerts(report.id)).toHaveLength(4);
  });

  it('a near miss that turns out to have needed first aid reaches the first-aid rule', async () => {
    const { as, emails } = await ownReport();
    const nearMiss = await reportIncident(as.crew);
    expect(await queuedAlerts(nearMiss.id)).toEqual([]);
    await editIncident(as.admin, nearMiss, { treatments: ['wound_covering'] });
    expect((await queuedAlerts(nearMiss.id)).map((mail) => mail.to)).toEqual([emails.admin, emails.safety].sort());
  });
});
