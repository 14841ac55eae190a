import { expect, it } from 'vitest';
import { can, ROLES, type Role } from '../../shared/roles';
import type { RepairDetailJson } from '../../shared/schemas/repairs';
import { createDemoMatches } from '../../server/db/seed/demo';
import { seedDemoChecklists } from '../../server/db/seed/demo-checklists';
import { seedDemoRepairs } from '../../server/db/seed/demo-repairs';
import { inTransaction } from '../../server/db/transaction';
import { User } from '../../server/models';
import { signIn, testApp } from '../support/app';
import { makeTeam, PASSWORD } from '../support/factories';
import { boardOf, columnOf } from '../support/repairs';

const { app } = testApp();

// The demo's repair board on a factory team (the demo team's accounts may exist in this database).
it('seeds a board across the columns: one blocking ticket in progress that can still make the queue call, one done with parts and a note', async () => {
  const own = await makeTeam();
  const now = new Date();
  const users = {} as Record<Role, User>;
  for (const role of ROLES) users[role] = await User.findByPk(own.memberships[role].userId, { rejectOnEmpty: true });
  await inTransaction(async (transaction) => {
    const matches = await createDemoMatches({ eventId: own.event.id, ourNumber: own.event.teamNumber, markedById: users.lead.id, now }, transaction);
    await seedDemoChecklists({ team: own.team, event: own.event, users, matches, now }, transaction);
    await seedDemoRepairs({ event: own.event, users, matches, now }, transaction);
  });

  const crew = await signIn(app, own.emails.crew, PASSWORD);
  const board = await boardOf(crew, own.event.id, `?at=${now.toISOString()}`);
  expect(board.nextQueue).not.toBeNull();
  expect(columnOf(board, 'reported')).toEqual(['Intake roller slipping on its hub', 'Bumper fabric torn at the back corner']);
  expect(columnOf(board, 'in_progress')).toEqual(['Left drive belt skipping teeth']);
  expect(columnOf(board, 'needs_test')).toEqual(['Elevator limit switch reads open when shaken']);
  expect(columnOf(board, 'done')).toEqual(['Arm pivot bolt backing out']);
  const belt = board.repairs.find((repair) => repair.status === 'in_progress')!;
  expect(belt).toMatchObject({ severity: 'blocks_match', assignee: { id: users.crew.id } });
  expect(belt.urgency.late).toBe(false);
  expect(belt.urgency.remainingMinutes).toBeGreaterThan(0);
  const done = board.repairs.find((repair) => repair.status === 'done')!;
  expect(done.partsUsed.length).toBeGreaterThan(0);
  expect(done.resolutionNote).not.toBeNull();
  expect(done.doneAt).not.toBeNull();
  for (const repair of board.repairs) expect(Date.parse(repair.reportedAt)).toBeLessThanOrEqual(now.getTime());

  // Every seeded history row is one the API would have taken from that member, never in the future.
  for (const repair of board.repairs) {
    const detail: RepairDetailJson = (await crew.get(`/api/repairs/${repair.id}`)).body;
    expect(detail.history.at(-1)?.kind).toBe('created');
    expect(detail.photos).toEqual([]);
    for (const row of detail.history) {
      const role = ROLES.find((candidate) => users[candidate].id === row.by.id);
      expect(role && can([role], 'repairs:work'), `${row.kind} by ${role}`).toBe(true);
      expect(Date.parse(row.at)).toBeLessThanOrEqual(now.getTime());
    }
  }

  // Our next match: the blocking belt is named, at risk while it can still make the queue call.
  const readiness = await crew.get(`/api/events/${own.event.id}/matches/${board.nextQueue!.matchId}/readiness?at=${now.toISOString()}`);
  expect(readiness.body.state).toBe('at_risk');
  expect(readiness.body.reasons).toContainEqual({ code: 'repair_blocks_match', level: 'at_risk', message: 'Open repair blocks this match: Left drive belt skipping teeth' });
});
