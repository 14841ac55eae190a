import { describe, expect, it } from 'vitest';
import { composeIncidentAlert } from '../../../shared/domain/incident-alert';
import { can, ROLES } from '../../../shared/roles';
import type { AlertRuleJson } from '../../../shared/schemas/mail';
import { Membership, OutboxMail, User } from '../../../server/models';
import { signIn, signInEveryRole, testApp } from '../../support/app';
import { FORBIDDEN, invalid } from '../../support/errors';
import { makeTeam, makeTeamWithoutEvent, PASSWORD, uniqueEmail } from '../../support/factories';
import { queuedAlerts, reportIncident } from '../../support/incidents';

// GET /api/team/alert-rules, PUT /api/team/alert-rules/:key, and whom a report's alert is queued for.
const { app, config } = testApp();

const DEFAULTS: AlertRuleJson[] = [
  { key: 'immediate', roles: ['safety', 'admin'], extraAddresses: [], version: 0 },
  { key: 'first_aid_only', roles: ['safety', 'admin'], extraAddresses: [], version: 0 },
  { key: 'near_miss', roles: [], extraAddresses: [], version: 0 },
];

async function ownTeam() {
  const own = await makeTeam();
  const as = await signInEveryRole(app, own.emails, PASSWORD);
  return { ...own, as };
}

describe('alert rules', () => {
  for (const role of ROLES) {
    const manages = can([role], 'alerts:manage');
    it(`${role}: ${manages ? 'reads and sets them' : '403, whatever the body'}`, async () => {
      const own = await ownTeam();
      const read = await own.as[role].get('/api/team/alert-rules');
      const set = await own.as[role].put('/api/team/alert-rules/near_miss', { version: 0, roles: ['safety'], extraAddresses: [] });
      if (manages) {
        expect(read.status).toBe(200);
        expect(read.body).toEqual({ rules: DEFAULTS });
        expect(set.status).toBe(200);
      } else {
        expect(read.body).toEqual(FORBIDDEN);
        expect(set.body).toEqual(FORBIDDEN);
        expect((await own.as[role].put('/api/team/alert-rules/nope', { version: 'x' })).body).toEqual(FORBIDDEN);
      }
    });
  }

  it('sets one rule with its version: the others keep their defaults, a stale version is 409 with the rule as it is', async () => {
    const own = await ownTeam();
    const answer = await own.as.safety.put('/api/team/alert-rules/first_aid_only', {
      version: 0,
      roles: ['safety', 'lead', 'safety'],
      extraAddresses: ['Nurse@Example.org', 'nurse@example.org', 'coach@example.org'],
    });
    const saved = { key: 'first_aid_only', roles: ['safety', 'lead'], extraAddresses: ['nurse@example.org', 'coach@example.org'], version: 1 };
    expect(answer.status).toBe(200);
    expect(answer.body).toEqual(saved);
    expect((await own.as.admin.get('/api/team/alert-rules')).body).toEqual({ rules: [DEFAULTS[0], saved, DEFAULTS[2]] });

    const stale = await own.as.admin.put('/api/team/alert-rules/first_aid_only', { version: 0, roles: [], extraAddresses: [] });
    expect(stale.status).toBe(409);
    expect(stale.body).toEqual({ error: { code: 'stale', message: 'Someone else changed this record since you loaded it', current: saved } });
    // The same setting in another order writes nothing.
    expect((await own.as.admin.put('/api/team/alert-rules/first_aid_only', { version: 1, roles: ['lead', 'safety'], extraAddresses: ['coach@example.org', 'nurse@example.org'] })).body).toEqual(saved);

    const other = await ownTeam();
    expect((await other.as.admin.get('/api/team/alert-rules')).body).toEqual({ rules: DEFAULTS });
  });

  it('refuses a key, a role or an address it does not take', async () => {
    const own = await ownTeam();
    expect((await own.as.admin.put('/api/team/alert-rules/everything', { version: 0, roles: [], extraAddresses: [] })).body).toEqual(
      invalid({ key: 'One of: immediate, first_aid_only, near_miss' }),
    );
    const answer = await own.as.admin.put('/api/team/alert-rules/immediate', { version: 0, roles: ['viewer'], extraAddresses: ['not-an-address'], cc: [] });
    expect(answer.body).toEqual(
      invalid({ 'roles.0': 'One of: admin, lead, crew, battery, safety', 'extraAddresses.0': 'Enter a valid e-mail address', cc: 'Not a field of this request' }),
    );
    const many = Array.from({ length: 11 }, (_, index) => `contact${index}@example.org`);
    expect((await own.as.admin.put('/api/team/alert-rules/immediate', { version: 0, roles: [], extraAddresses: many })).body).toEqual(
      invalid({ extraAddresses: 'At most 10 addresses' }),
    );
  });
});

describe('whom an alert is queued for', () => {
  it('by default: every active safety captain and mentor, once each, for care beyond first aid; the text names no one', async () => {
    const own = await ownTeam();
    // A second mentor who is also the safety captain, and a safety captain no longer active.
    const both = await User.create({ email: uniqueEmail('both'), name: 'Factory both', passwordHash: 'x' });
    await Membership.create({ teamId: own.team.id, userId: both.id, roles: ['admin', 'safety'] });
    const gone = await User.create({ email: uniqueEmail('gone'), name: 'Factory gone', passwordHash: 'x' });
    await Membership.create({ teamId: own.team.id, userId: gone.id, roles: ['safety'], active: false });

    const report = await reportIncident(own.as.crew, {
      kind: 'injury',
      location: 'field',
      description: 'RT caught a hand in the arm at the field reset',
      involved: [{ initials: 'RT', role: 'student' }],
      treatments: ['sutures'],
    });
    const expected = composeIncidentAlert({
      teamName: own.team.name,
      kind: 'injury',
      location: 'field',
      occurredAt: new Date(report.occurredAt),
      timeZone: 'Europe/Berlin',
      treatments: ['sutures'],
      involvedCount: 1,
      link: `${config.publicUrl}/safety/incidents/${report.id}`,
    });
    expect(expected.subject).toBe(`Safety alert, ${own.team.name}: beyond first aid, injury on the field`);
    expect(await queuedAlerts(report.id)).toEqual(
      [own.emails.admin, own.emails.safety, both.email].sort().map((to) => ({ to, subject: expected.subject, kind: 'incident_alert', teamId: own.team.id })),
    );
    const texts = (await OutboxMail.findAll({ where: { incidentId: report.id } })).map((mail) => mail.text);
    expect(new Set(texts)).toEqual(new Set([expected.text]));
    expect(expected.text).not.toMatch(/RT|caught a hand/);
  });

  it('near misses reach nobody by default; first aid follows its rule, and nobody once the rule names nobody', async () => {
    const own = await ownTeam();
    expect(await queuedAlerts((await reportIncident(own.as.crew)).id)).toEqual([]);
    const firstAid = { kind: 'injury', treatments: ['wound_covering'] };
    expect((await queuedAlerts((await reportIncident(own.as.crew, firstAid)).id)).map((mail) => mail.to)).toEqual([own.emails.admin, own.emails.safety].sort());

    expect((await own.as.safety.put('/api/team/alert-rules/first_aid_only', { version: 0, roles: [], extraAddresses: [] })).status).toBe(200);
    expect(await queuedAlerts((await reportIncident(own.as.crew, firstAid)).id)).toEqual([]);
  });

  it("a rule's roles and extra addresses together, each address once whatever its case; acid exposure goes out at once", async () => {
    const own = await ownTeam();
    const put = await own.as.admin.put('/api/team/alert-rules/immediate', {
      version: 0,
      roles: ['lead'],
      extraAddresses: ['event-medic@example.org', own.emails.lead.toUpperCase()],
    });
    expect(put.status).toBe(200);
    const report = await reportIncident(own.as.battery, { kind: 'battery_or_chemical', treatments: [] });
    const queued = await queuedAlerts(report.id);
    expect(queued.map((mail) => mail.to)).toEqual(['event-medic@example.org', own.emails.lead].sort());
    expect(queued[0].subject).toBe(`Safety alert, ${own.team.name}: near miss, battery acid or chemical in the pit`);
  });

  it('an incident outside any event is told in UTC', async () => {
    const { emails } = await makeTeamWithoutEvent();
    const safety = await signIn(app, emails.safety, PASSWORD);
    const report = await reportIncident(safety, { kind: 'injury', treatments: ['hospital_visit'], location: 'travel' });
    const [mail] = await OutboxMail.findAll({ where: { incidentId: report.id } });
    expect(mail.text.split('\n')[0]).toMatch(/^Injury while travelling, .* \(UTC\)\.$/);
  });
});
