import { expect, it } from 'vitest';
import { ROLES, type Role } from '../../../shared/roles';
import type { IncidentJson } from '../../../shared/schemas/incidents';
import { seedDemoIncidents } from '../../../server/db/seed/demo-incidents';
import { inTransaction } from '../../../server/db/transaction';
import { Incident, OutboxMail, User } from '../../../server/models';
import { signIn, testApp } from '../../support/app';
import { makeTeam, PASSWORD } from '../../support/factories';

const { app } = testApp();

// The demo's safety log on a factory team (the demo team's accounts may exist in this database).
it('seeds a near miss and a first-aid incident as the API would have left them, with no mail queued', async () => {
  const own = await makeTeam();
  const now = new Date();
  const users = {} as Record<Role, User>;
  for (const role of ROLES) users[role] = await User.findByPk(own.memberships[role].userId, { rejectOnEmpty: true });
  await inTransaction((transaction) => seedDemoIncidents({ team: own.team, event: own.event, users, now }, transaction));

  const safety = await signIn(app, own.emails.safety, PASSWORD);
  const log: IncidentJson[] = (await safety.get('/api/incidents')).body.incidents;
  expect(log.map((incident) => [incident.classification.class, incident.status, incident.reporter.id])).toEqual([
    ['near_miss', 'open', users.crew.id],
    ['first_aid_only', 'closed', users.lead.id],
  ]);
  const [nearMiss, firstAid] = log;
  expect(nearMiss.followUps).toEqual([expect.objectContaining({ ownerId: own.memberships.safety.id, ownerName: 'Factory safety', done: false, doneAt: null })]);
  expect(firstAid.followUps).toEqual([expect.objectContaining({ ownerId: own.memberships.lead.id, done: true, doneAt: expect.any(String) })]);
  expect(firstAid.closingNote).not.toBeNull();
  for (const incident of log) {
    expect(incident.eventId).toBe(own.event.id);
    expect(incident.involved.every((person) => /^\p{L}{1,4}$/u.test(person.initials))).toBe(true);
    for (const instant of [incident.occurredAt, incident.createdAt, incident.updatedAt, incident.closedAt ?? incident.createdAt]) {
      expect(Date.parse(instant)).toBeLessThanOrEqual(now.getTime());
    }
    expect(Date.parse(incident.occurredAt)).toBeLessThan(Date.parse(incident.createdAt));
  }

  // The rule is applied (a later escalation alerts again), yet nothing was queued.
  const rows = await Incident.findAll({ where: { teamId: own.team.id }, order: [['occurredAt', 'DESC']] });
  expect(rows.map((row) => row.alertedRule)).toEqual(['near_miss', 'first_aid_only']);
  expect(await OutboxMail.count({ where: { teamId: own.team.id } })).toBe(0);

  // The crew member who reported the near miss reads it in the reporter view.
  const crew = await signIn(app, own.emails.crew, PASSWORD);
  expect((await crew.get(`/api/incidents/${nearMiss.id}`)).body).toMatchObject({ view: 'reporter', followUps: [] });
});
