import { expect, it } from 'vitest';
import { composeIncidentAlert } from '../../../shared/domain/incident-alert';
import type { IncidentJson } from '../../../shared/schemas/incidents';
import { signInEveryRole, testApp } from '../../support/app';
import { makeTeam, PASSWORD, uniqueEmail } from '../../support/factories';
import { queuedAlerts, reportIncident } from '../../support/incidents';
import { mailTo, waitForOutbox } from '../../support/mail';

// Alerts through real SMTP: the app's mail sender delivers to the SMTP fake that `npm test` runs
// on SMTP_PORT, which stores what it receives; these tests read what it stored.
const { app, config } = testApp();

async function ownTeam() {
  const own = await makeTeam();
  const as = await signInEveryRole(app, own.emails, PASSWORD);
  const subjectOf = (incident: IncidentJson) =>
    composeIncidentAlert({
      teamName: own.team.name,
      kind: incident.kind,
      location: incident.location,
      occurredAt: new Date(incident.occurredAt),
      timeZone: own.event.timeZone,
      treatments: incident.treatments,
      involvedCount: incident.involved.length,
      link: `${config.publicUrl}/safety/incidents/${incident.id}`,
    }).subject;
  return { ...own, as, subjectOf };
}

it('a report beyond first aid reaches each safety contact, and an extra address, as one message each with the alert’s subject', async () => {
  const own = await ownTeam();
  const medic = uniqueEmail('event-medic');
  expect((await own.as.safety.put('/api/team/alert-rules/immediate', { version: 0, roles: ['safety', 'admin'], extraAddresses: [medic] })).status).toBe(200);
  const report = await reportIncident(own.as.crew, { kind: 'injury', location: 'field', treatments: ['emergency_services'], involved: [{ initials: 'QX', role: 'student' }] });
  const subject = own.subjectOf(report);
  expect(subject).toBe(`Safety alert, ${own.team.name}: beyond first aid, injury on the field`);

  for (const address of [own.emails.safety, own.emails.admin, medic]) {
    // Sent means the fake accepted it, and it stores a message before accepting it.
    await waitForOutbox({ incidentId: report.id, toAddress: address }, 'sent');
    const [mail, ...more] = await mailTo(address);
    expect(more).toEqual([]);
    expect({ to: mail.toAddresses, subject: mail.subject, teamId: mail.teamId }).toEqual({ to: address, subject, teamId: own.team.id });
    expect(mail.text).toContain(`${config.publicUrl}/safety/incidents/${report.id}`);
    expect(mail.text).not.toContain('QX');
  }
  // Everyone else in the team hears nothing: no message was ever queued for them.
  expect((await queuedAlerts(report.id)).map((mail) => mail.to).sort()).toEqual([own.emails.admin, own.emails.safety, medic].sort());
  for (const role of ['lead', 'crew', 'battery', 'viewer'] as const) expect(await mailTo(own.emails[role])).toEqual([]);
});

it('first aid follows its rule: safety and admin by default, nobody once the rule names nobody; a near miss sends nothing', async () => {
  const own = await ownTeam();
  const nearMiss = await reportIncident(own.as.crew);
  const firstAid = await reportIncident(own.as.crew, { kind: 'injury', treatments: ['wound_covering'] });
  for (const address of [own.emails.safety, own.emails.admin]) {
    await waitForOutbox({ incidentId: firstAid.id, toAddress: address }, 'sent');
    expect((await mailTo(address)).map((mail) => mail.subject)).toEqual([own.subjectOf(firstAid)]);
    expect(own.subjectOf(firstAid)).toMatch(/^Incident logged, .*: first aid only, injury in the pit$/);
  }
  expect(await queuedAlerts(nearMiss.id)).toEqual([]);

  expect((await own.as.admin.put('/api/team/alert-rules/first_aid_only', { version: 0, roles: [], extraAddresses: [] })).status).toBe(200);
  const unannounced = await reportIncident(own.as.crew, { kind: 'injury', treatments: ['hot_cold_therapy'] });
  expect(await queuedAlerts(unannounced.id)).toEqual([]);
  // A later alert to the same people arrives alone: nothing of the two silent reports came before it.
  const acid = await reportIncident(own.as.crew, { kind: 'battery_or_chemical' });
  await waitForOutbox({ incidentId: acid.id, toAddress: own.emails.admin }, 'sent');
  expect((await mailTo(own.emails.admin)).map((mail) => mail.subject)).toEqual([own.subjectOf(firstAid), own.subjectOf(acid)]);
});
