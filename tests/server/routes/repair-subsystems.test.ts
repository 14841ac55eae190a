import { describe, expect, it } from 'vitest';
import { can, ROLES } from '../../../shared/roles';
import type { SubsystemsJson } from '../../../shared/schemas/repairs';
import { signIn, testApp } from '../../support/app';
import { FORBIDDEN, invalid } from '../../support/errors';
import { makeTeam, PASSWORD } from '../../support/factories';

// GET/PUT /api/team/repair-subsystems.
const { app } = testApp();

const DEFAULTS: SubsystemsJson = {
  subsystems: [
    { key: 'drivetrain', label: 'Drivetrain' },
    { key: 'intake', label: 'Intake' },
    { key: 'elevator', label: 'Elevator' },
    { key: 'arm', label: 'Arm' },
    { key: 'end_effector', label: 'End effector' },
    { key: 'electrical', label: 'Electrical' },
    { key: 'pneumatics', label: 'Pneumatics' },
    { key: 'software', label: 'Software' },
    { key: 'bumpers', label: 'Bumpers' },
    { key: 'other', label: 'Other' },
  ],
  version: 0,
};

async function ownLead() {
  const own = await makeTeam();
  return { ...own, lead: await signIn(app, own.emails.lead, PASSWORD) };
}

describe('the subsystem list', () => {
  for (const role of ROLES) {
    const manages = can([role], 'repairs:manage');
    it(`${role}: reads the list; ${manages ? 'may' : 'may not'} edit it`, async () => {
      const own = await makeTeam();
      const client = await signIn(app, own.emails[role], PASSWORD);
      const read = await client.get('/api/team/repair-subsystems');
      expect(read.status).toBe(200);
      expect(read.body).toEqual(DEFAULTS);
      const put = await client.put('/api/team/repair-subsystems', { version: 0, subsystems: [{ label: 'Climber' }] });
      expect(put.status).toBe(manages ? 200 : 403);
      if (!manages) expect(put.body).toEqual(FORBIDDEN);
    });
  }

  it('keeps keys sent, makes keys from new labels (unique, within 40 characters), and counts the version', async () => {
    const own = await ownLead();
    const answer = await own.lead.put('/api/team/repair-subsystems', {
      version: 0,
      subsystems: [
        { key: 'drivetrain', label: 'Drive base' },
        { label: '  Climber  ' },
        { label: 'Über-Shooter (v2)!' },
        { key: 'climber', label: 'Old climber' },
        { key: 'a'.repeat(40), label: 'Forty' },
        { label: 'A'.repeat(40) },
        { label: '⚙' },
      ],
    });
    expect(answer.status).toBe(200);
    expect(answer.body).toEqual({
      subsystems: [
        { key: 'drivetrain', label: 'Drive base' },
        { key: 'climber_2', label: 'Climber' },
        { key: 'uber_shooter_v2', label: 'Über-Shooter (v2)!' },
        { key: 'climber', label: 'Old climber' },
        { key: 'a'.repeat(40), label: 'Forty' },
        { key: `${'a'.repeat(38)}_2`, label: 'A'.repeat(40) },
        { key: 'subsystem', label: '⚙' },
      ],
      version: 1,
    });
    expect((await own.lead.get('/api/team/repair-subsystems')).body).toEqual(answer.body);
    // Sending the same list again changes nothing: the version stays.
    const again = await own.lead.put('/api/team/repair-subsystems', { version: 1, subsystems: answer.body.subsystems });
    expect(again.body.version).toBe(1);
    // New tickets pick from the new list.
    const crew = await signIn(app, own.emails.crew, PASSWORD);
    expect((await crew.post(`/api/events/${own.event.id}/repairs`, { title: 'Hook bent', subsystem: 'climber_2', severity: 'degraded' })).status).toBe(201);
  });

  it('answers 409 stale with the current list for an old version, and writes nothing', async () => {
    const own = await ownLead();
    const first = await own.lead.put('/api/team/repair-subsystems', { version: 0, subsystems: [{ label: 'Arm' }] });
    expect(first.status).toBe(200);
    const stale = await own.lead.put('/api/team/repair-subsystems', { version: 0, subsystems: [{ label: 'Wrist' }] });
    expect(stale.status).toBe(409);
    expect(stale.body).toEqual({ error: { code: 'stale', message: 'Someone else changed this record since you loaded it', current: first.body } });
    expect((await own.lead.get('/api/team/repair-subsystems')).body).toEqual({ subsystems: [{ key: 'arm', label: 'Arm' }], version: 1 });
  });

  it('answers 400 naming each bad entry: a label twice (any case), a key twice, an empty list, a bad key', async () => {
    const own = await ownLead();
    const url = '/api/team/repair-subsystems';
    expect((await own.lead.put(url, { version: 0, subsystems: [{ label: 'Arm' }, { label: 'ARM ' }, { key: 'x', label: 'X' }, { key: 'x', label: 'Y' }] })).body).toEqual(
      invalid({ 'subsystems.1.label': 'Already in the list', 'subsystems.3.key': 'Already in the list' }),
    );
    expect((await own.lead.put(url, { version: 0, subsystems: [] })).body).toEqual(invalid({ subsystems: 'Keep at least one subsystem' }));
    expect((await own.lead.put(url, { version: 0, subsystems: [{ key: 'Drive Train', label: '' }] })).body).toEqual(
      invalid({ 'subsystems.0.key': 'Pick a subsystem from the list', 'subsystems.0.label': 'Name the subsystem' }),
    );
    expect((await own.lead.put(url, { subsystems: [{ label: 'Arm' }] })).body).toEqual(invalid({ version: 'The version number you loaded' }));
    expect((await own.lead.get(url)).body).toEqual(DEFAULTS);
  });

  it("is the team's own: another team's edit does not show", async () => {
    const own = await ownLead();
    const other = await ownLead();
    expect((await other.lead.put('/api/team/repair-subsystems', { version: 0, subsystems: [{ label: 'Turret' }] })).status).toBe(200);
    expect((await own.lead.get('/api/team/repair-subsystems')).body).toEqual(DEFAULTS);
  });
});
