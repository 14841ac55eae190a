import { expect, it } from 'vitest';
import { can, ROLES, type Role } from '../../shared/roles';
import type { RunSummaryJson, TemplateJson } from '../../shared/schemas/checks';
import { ChecklistMark, User } from '../../server/models';
import { createDemoMatches, demoEmail, seedDemo } from '../../server/db/seed/demo';
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
