import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import type { Role } from '../../../shared/roles';
import type { RepairDetailJson, RepairJson } from '../../../shared/schemas/repairs';
import { Repair } from '../../../server/models';
import { signIn, testApp } from '../../support/app';
import { makeOurMatch } from '../../support/checks';
import { FORBIDDEN, invalid } from '../../support/errors';
import { makeTeam, PASSWORD } from '../../support/factories';
import { boardOf, columnOf, editRepair, makeRepair } from '../../support/repairs';

// PATCH /api/repairs/:id: moves between columns, places by hand, assignments, edits, stale versions.
const { app } = testApp();

/** A team of our own with its crew member, lead and admin signed in. */
async function ownTeam() {
  const own = await makeTeam();
  const crew = await signIn(app, own.emails.crew, PASSWORD);
  const lead = await signIn(app, own.emails.lead, PASSWORD);
  const admin = await signIn(app, own.emails.admin, PASSWORD);
  const userOf = (role: Role) => own.memberships[role].userId;
  const report = (title: string, overrides: Record<string, unknown> = {}) => makeRepair(crew, own.event.id, { title, ...overrides });
  const board = () => boardOf(lead, own.event.id);
  const history = async (id: string) => ((await lead.get(`/api/repairs/${id}`)).body as RepairDetailJson).history;
  return { ...own, crew, lead, admin, userOf, report, board, history };
}

const person = (id: string, role: Role) => ({ id, displayName: `Factory ${role}` });

describe('moving a ticket between columns', () => {
  it('crew moves it: version + 1, placed by urgency in the new column, one `moved` row in the history', async () => {
    const own = await ownTeam();
    const blocking = await own.report('Drive dead', { severity: 'blocks_match' });
    const cosmetic = await own.report('Scuffed panel', { severity: 'cosmetic' });
    const degraded = await own.report('Intake slow', { severity: 'degraded' });
    await editRepair(own.crew, blocking, { status: 'in_progress' });
    await editRepair(own.crew, cosmetic, { status: 'in_progress' });

    const moved = await editRepair(own.crew, degraded, { status: 'in_progress' });
    expect(moved).toMatchObject({ status: 'in_progress', version: 1, placedByHand: false, doneAt: null });
    expect(columnOf(await own.board(), 'in_progress')).toEqual(['Drive dead', 'Intake slow', 'Scuffed panel']);
    expect(columnOf(await own.board(), 'reported')).toEqual([]);
    const [row, created] = await own.history(degraded.id);
    expect(row).toEqual({ id: expect.any(String), kind: 'moved', by: person(own.userOf('crew'), 'crew'), at: expect.any(String), changes: { status: ['reported', 'in_progress'] } });
    expect(created.kind).toBe('created');
  });

  it('done sets doneAt; leaving done clears it; parts, time and the resolution note travel with the move', async () => {
    const own = await ownTeam();
    const repair = await own.report('Arm pivot bolt backing out');
    const done = await editRepair(own.crew, repair, {
      status: 'done',
      timeSpentMinutes: 12,
      partsUsed: ['M6 x 40 bolt', '  ', 'Nylon lock nut '],
      resolutionNote: 'Replaced, thread locker, torque-marked',
    });
    expect(done).toMatchObject({ status: 'done', version: 1, timeSpentMinutes: 12, partsUsed: ['M6 x 40 bolt', 'Nylon lock nut'], resolutionNote: 'Replaced, thread locker, torque-marked' });
    expect(Math.abs(Date.parse(done.doneAt!) - Date.now())).toBeLessThan(60_000);
    const history = await own.history(repair.id);
    expect(history.slice(0, 2).map((row) => [row.kind, row.changes])).toEqual([
      ['moved', { status: ['reported', 'done'] }],
      ['edited', { timeSpentMinutes: [0, 12], partsUsed: [[], ['M6 x 40 bolt', 'Nylon lock nut']], resolutionNote: [null, 'Replaced, thread locker, torque-marked'] }],
    ]);
    const reopened = await editRepair(own.crew, done, { status: 'needs_test' });
    expect(reopened).toMatchObject({ status: 'needs_test', doneAt: null, version: 2 });
  });
});

describe('placing a card by hand', () => {
  it('a lead reorders within a column with afterId/beforeId: one card written, placedByHand, a `placed` row', async () => {
    const own = await ownTeam();
    const a = await own.report('A', { severity: 'blocks_match' });
    const b = await own.report('B', { severity: 'degraded' });
    const c = await own.report('C', { severity: 'cosmetic' });
    expect(columnOf(await own.board(), 'reported')).toEqual(['A', 'B', 'C']);

    const placed = await editRepair(own.lead, c, { afterId: a.id, beforeId: b.id });
    expect(placed).toMatchObject({ placedByHand: true, version: 1, status: 'reported' });
    const board = await own.board();
    expect(columnOf(board, 'reported')).toEqual(['A', 'C', 'B']);
    // Only the card placed changed: the others keep their keys and versions.
    expect(board.repairs.find((repair) => repair.id === a.id)).toMatchObject({ orderKey: a.orderKey, version: 0 });
    expect(board.repairs.find((repair) => repair.id === b.id)).toMatchObject({ orderKey: b.orderKey, version: 0 });
    expect((await own.history(c.id))[0]).toMatchObject({ kind: 'placed', by: person(own.userOf('lead'), 'lead'), changes: { position: [null, 'by hand'] } });

    // To the top (afterId null) and to the bottom (beforeId null alone).
    const top = await editRepair(own.admin, placed, { afterId: null, beforeId: a.id });
    expect(columnOf(await own.board(), 'reported')).toEqual(['C', 'A', 'B']);
    await editRepair(own.lead, top, { beforeId: null });
    expect(columnOf(await own.board(), 'reported')).toEqual(['A', 'B', 'C']);
    await editRepair(own.lead, a, { afterId: b.id });
    expect(columnOf(await own.board(), 'reported')).toEqual(['B', 'A', 'C']);
  });

  it('a card placed by hand keeps its place when urgency would move it; one placed by urgency follows its severity', async () => {
    const own = await ownTeam();
    const a = await own.report('A', { severity: 'degraded' });
    const b = await own.report('B', { severity: 'degraded' });
    const c = await own.report('C', { severity: 'degraded' });
    // C to the top by hand, then A becomes blocking: it goes above every card urgency orders, not above C.
    await editRepair(own.lead, c, { afterId: null, beforeId: a.id });
    expect(columnOf(await own.board(), 'reported')).toEqual(['C', 'A', 'B']);
    await editRepair(own.crew, b, { severity: 'blocks_match' });
    expect(columnOf(await own.board(), 'reported')).toEqual(['C', 'B', 'A']);
    // A card placed by hand does not move for its own severity.
    const board = await own.board();
    const placedC = board.repairs.find((repair) => repair.title === 'C')!;
    await editRepair(own.crew, placedC, { severity: 'cosmetic' });
    expect(columnOf(await own.board(), 'reported')).toEqual(['C', 'B', 'A']);
    // An edit urgency does not read leaves the key alone.
    const before = (await own.board()).repairs.find((repair) => repair.title === 'A')!;
    const renamed = await editRepair(own.crew, before, { title: 'A renamed', severity: 'degraded' });
    expect(renamed.orderKey).toBe(before.orderKey);
  });

  it('a lead moves a card to another column and places it there in one write: `moved` and `placed` rows', async () => {
    const own = await ownTeam();
    const x = await own.report('X', { severity: 'blocks_match' });
    const y = await own.report('Y', { severity: 'cosmetic' });
    const z = await own.report('Z', { severity: 'degraded' });
    await editRepair(own.crew, x, { status: 'in_progress' });
    await editRepair(own.crew, y, { status: 'in_progress' });
    expect(columnOf(await own.board(), 'in_progress')).toEqual(['X', 'Y']);
    const moved = await editRepair(own.lead, z, { status: 'in_progress', afterId: y.id, beforeId: null });
    expect(moved).toMatchObject({ status: 'in_progress', placedByHand: true, version: 1 });
    expect(columnOf(await own.board(), 'in_progress')).toEqual(['X', 'Y', 'Z']);
    expect((await own.history(z.id)).slice(0, 2).map((row) => [row.kind, row.changes])).toEqual([
      ['moved', { status: ['reported', 'in_progress'] }],
      ['placed', { position: [null, 'by hand'] }],
    ]);
    // Moved on without a place: urgency places it again, and the hand placement is forgotten.
    const tested = await editRepair(own.crew, moved, { status: 'needs_test' });
    expect(tested.placedByHand).toBe(false);
  });

  it('crew cannot place by hand (403, nothing written), even with a column change', async () => {
    const own = await ownTeam();
    const a = await own.report('A', { severity: 'blocks_match' });
    const b = await own.report('B', { severity: 'cosmetic' });
    for (const body of [{ afterId: null }, { beforeId: a.id }, { status: 'in_progress', afterId: null, beforeId: null }, { afterId: 'junk' }]) {
      const answer = await own.crew.patch(`/api/repairs/${b.id}`, { version: 0, ...body });
      expect(answer.status).toBe(403);
      expect(answer.body).toEqual(FORBIDDEN);
    }
    const board = await own.board();
    expect(board.repairs.find((repair) => repair.id === b.id)).toMatchObject({ status: 'reported', version: 0, orderKey: b.orderKey });
  });

  it('answers 400 for a neighbour that is not another card of the target column, or neighbours out of order', async () => {
    const own = await ownTeam();
    const other = await ownTeam();
    const a = await own.report('A', { severity: 'blocks_match' });
    const b = await own.report('B', { severity: 'degraded' });
    const c = await own.report('C', { severity: 'cosmetic' });
    const d = await own.report('D', { severity: 'cosmetic' });
    await editRepair(own.crew, d, { status: 'in_progress' });
    const foreign = await other.report('Foreign');
    const url = `/api/repairs/${c.id}`;
    const notInColumn = 'Must be another card of the column the ticket goes to';
    expect((await own.lead.patch(url, { version: 0, afterId: c.id })).body).toEqual(invalid({ afterId: notInColumn }));
    expect((await own.lead.patch(url, { version: 0, afterId: foreign.id, beforeId: randomUUID() })).body).toEqual(invalid({ afterId: notInColumn, beforeId: notInColumn }));
    // D is in another column than the one C stays in; in the column C goes to, it is fine.
    expect((await own.lead.patch(url, { version: 0, beforeId: d.id })).body).toEqual(invalid({ beforeId: notInColumn }));
    expect((await own.lead.patch(url, { version: 0, status: 'in_progress', afterId: a.id })).body).toEqual(invalid({ afterId: notInColumn }));
    expect((await own.lead.patch(url, { version: 0, afterId: b.id, beforeId: a.id })).body).toEqual(invalid({ beforeId: 'Must come after the card named in afterId' }));
    expect((await own.lead.patch(url, { version: 0, afterId: 'a' })).body).toEqual(invalid({ afterId: 'Must be a UUID' }));
    expect(columnOf(await own.board(), 'reported')).toEqual(['A', 'B', 'C']);
    expect((await editRepair(own.lead, c, { status: 'in_progress', beforeId: d.id })).version).toBe(1);
    expect(columnOf(await own.board(), 'in_progress')).toEqual(['C', 'D']);
  });
});

describe('a crowded gap', () => {
  it('when a key would outgrow its column (after some 370 drops into one gap), the column gets fresh keys; versions stay', async () => {
    const own = await ownTeam();
    const a = await own.report('A', { severity: 'blocks_match' });
    const b = await own.report('B', { severity: 'degraded' });
    const c = await own.report('C', { severity: 'cosmetic' });
    // As if hundreds of cards had been dropped between A and B: their keys are as close as keys get.
    const low = `a0${'V'.repeat(61)}`;
    await Repair.update({ orderKey: low }, { where: { id: a.id } });
    await Repair.update({ orderKey: `${low}1` }, { where: { id: b.id } });

    const placed = await editRepair(own.lead, c, { afterId: a.id, beforeId: b.id });
    const board = await own.board();
    expect(columnOf(board, 'reported')).toEqual(['A', 'C', 'B']);
    for (const repair of board.repairs) expect(repair.orderKey.length).toBeLessThanOrEqual(4);
    expect(board.repairs.find((repair) => repair.id === placed.id)?.orderKey).toBe(placed.orderKey);
    expect(board.repairs.map((repair) => [repair.title, repair.version])).toEqual([
      ['A', 0],
      ['C', 1],
      ['B', 0],
    ]);
  });
});

describe('assigning and editing', () => {
  it('assigns and unassigns: `assigned` rows with the ids, the assignee with a name in the answer', async () => {
    const own = await ownTeam();
    const repair = await own.report('Intake roller slipping');
    const assigned = await editRepair(own.crew, repair, { assigneeId: own.userOf('crew') });
    expect(assigned.assignee).toEqual(person(own.userOf('crew'), 'crew'));
    const reassigned = await editRepair(own.lead, assigned, { assigneeId: own.userOf('admin') });
    const unassigned = await editRepair(own.lead, reassigned, { assigneeId: null });
    expect(unassigned).toMatchObject({ assignee: null, version: 3 });
    expect((await own.history(repair.id)).map((row) => [row.kind, row.changes])).toEqual([
      ['assigned', { assigneeId: [own.userOf('admin'), null] }],
      ['assigned', { assigneeId: [own.userOf('crew'), own.userOf('admin')] }],
      ['assigned', { assigneeId: [null, own.userOf('crew')] }],
      ['created', expect.any(Object)],
    ]);
    for (const role of ['viewer', 'battery', 'safety'] as const) {
      const answer = await own.crew.patch(`/api/repairs/${repair.id}`, { version: 3, assigneeId: own.userOf(role) });
      expect(answer.body).toEqual(invalid({ assigneeId: 'Pick a member of the team who works on repairs' }));
    }
  });

  it('edits fields: one `edited` row with each field before and after; an edit that changes nothing writes nothing', async () => {
    const own = await ownTeam();
    const match = await makeOurMatch(own.lead, own.event);
    const repair = await own.report('Elevator limit switch', { description: 'Reads open sometimes' });
    const edited = await editRepair(own.crew, repair, {
      title: 'Elevator limit switch flickers',
      description: 'Reads open when the carriage shakes',
      subsystem: 'electrical',
      foundInMatchId: match.id,
      estimateMinutes: 25,
    });
    expect(edited).toMatchObject({ title: 'Elevator limit switch flickers', subsystem: 'electrical', foundInMatchId: match.id, estimateMinutes: 25, version: 1 });
    expect((await own.history(repair.id))[0]).toMatchObject({
      kind: 'edited',
      changes: {
        title: ['Elevator limit switch', 'Elevator limit switch flickers'],
        description: ['Reads open sometimes', 'Reads open when the carriage shakes'],
        subsystem: ['drivetrain', 'electrical'],
        foundInMatchId: [null, match.id],
        estimateMinutes: [null, 25],
      },
    });

    // The same values again: 200 with the ticket as it is, no version, no history.
    const same = await own.crew.patch(`/api/repairs/${repair.id}`, { version: 1, title: 'Elevator limit switch flickers', subsystem: 'electrical', estimateMinutes: 25 });
    expect(same.status).toBe(200);
    expect(same.body).toMatchObject({ version: 1, updatedAt: edited.updatedAt });
    expect(await own.history(repair.id)).toHaveLength(2);
  });

  it('a subsystem taken off the list stays on its tickets, but cannot be picked again', async () => {
    const own = await ownTeam();
    const repair = await own.report('Bumper fabric torn', { subsystem: 'bumpers' });
    const list = (await own.lead.get('/api/team/repair-subsystems')).body;
    const put = await own.lead.put('/api/team/repair-subsystems', { version: 0, subsystems: list.subsystems.filter((entry: { key: string }) => entry.key !== 'bumpers') });
    expect(put.status).toBe(200);
    const kept = await editRepair(own.crew, repair, { subsystem: 'bumpers', title: 'Bumper fabric torn at the corner' });
    expect(kept.subsystem).toBe('bumpers');
    expect((await own.crew.patch(`/api/repairs/${repair.id}`, { version: 1, subsystem: 'arm' })).status).toBe(200);
    expect((await own.crew.patch(`/api/repairs/${repair.id}`, { version: 2, subsystem: 'bumpers' })).body).toEqual(invalid({ subsystem: 'Pick a subsystem from the list' }));
    expect((await own.crew.post(`/api/events/${own.event.id}/repairs`, { title: 'x', subsystem: 'bumpers', severity: 'cosmetic' })).body).toEqual(
      invalid({ subsystem: 'Pick a subsystem from the list' }),
    );
  });

  it('answers 400 naming each bad field, and needs the version', async () => {
    const own = await ownTeam();
    const repair = await own.report('Arm');
    const url = `/api/repairs/${repair.id}`;
    expect((await own.crew.patch(url, { title: 'x' })).body).toEqual(invalid({ version: 'The version number you loaded' }));
    expect((await own.crew.patch(url, { version: -1, status: 'fixed', timeSpentMinutes: 1.5, partsUsed: 'bolt', reporterId: 'me' })).body).toEqual(
      invalid({
        version: 'The version number you loaded',
        status: 'One of: reported, in_progress, needs_test, done',
        timeSpentMinutes: 'Time spent: whole minutes from 0 to 10080',
        partsUsed: 'A list of lines',
        reporterId: 'Not a field of this request',
      }),
    );
    expect((await own.crew.patch(url, { version: 0, title: '', partsUsed: ['x'.repeat(121)], resolutionNote: 'y'.repeat(2001) })).body).toEqual(
      invalid({ title: 'Say in a few words what is wrong', 'partsUsed.0': 'At most 120 characters a line', resolutionNote: 'At most 2000 characters' }),
    );
    expect((await own.lead.get(url)).body).toMatchObject({ title: 'Arm', version: 0 });
  });

  it("answers 404 for another team's ticket, before looking at the version", async () => {
    const own = await ownTeam();
    const other = await ownTeam();
    const foreign = await other.report('Theirs');
    const answer = await own.lead.patch(`/api/repairs/${foreign.id}`, { version: 99, title: 'Ours now' });
    expect(answer.status).toBe(404);
    expect(answer.body).toEqual({ error: { code: 'not_found', message: 'Repair not found' } });
    expect((await other.lead.get(`/api/repairs/${foreign.id}`)).body).toMatchObject({ title: 'Theirs', version: 0 });
  });
});

describe('a write based on an old version', () => {
  it('answers 409 stale with the current ticket and overwrites nothing', async () => {
    const own = await ownTeam();
    const repair = await own.report('Intake roller slipping', { severity: 'degraded' });
    const theirs = await editRepair(own.lead, repair, { title: 'Intake roller slipping on the hub', status: 'in_progress', assigneeId: own.userOf('lead') });

    const mine = await own.crew.patch(`/api/repairs/${repair.id}`, { version: 0, title: 'Intake roller worn', status: 'done', assigneeId: own.userOf('crew') });
    expect(mine.status).toBe(409);
    expect(mine.body).toEqual({ error: { code: 'stale', message: 'Someone else changed this record since you loaded it', current: theirs } });
    // Re-read: their edit stands, and nothing of mine arrived (no version, no history row).
    const reread: RepairDetailJson = (await own.crew.get(`/api/repairs/${repair.id}`)).body;
    expect(reread).toMatchObject({ title: 'Intake roller slipping on the hub', status: 'in_progress', assignee: person(own.userOf('lead'), 'lead'), version: 1, doneAt: null });
    expect(reread.history.map((row) => row.kind)).toEqual(['moved', 'assigned', 'edited', 'created']);
    // Resent on their version, mine goes through.
    const resent = await editRepair(own.crew, theirs, { title: 'Intake roller worn' });
    expect(resent).toMatchObject({ title: 'Intake roller worn', status: 'in_progress', version: 2 } satisfies Partial<RepairJson>);
  });

  it('a stale place by hand is refused the same way', async () => {
    const own = await ownTeam();
    const a = await own.report('A', { severity: 'blocks_match' });
    const b = await own.report('B', { severity: 'cosmetic' });
    await editRepair(own.crew, b, { title: 'B edited' });
    const answer = await own.lead.patch(`/api/repairs/${b.id}`, { version: 0, afterId: null, beforeId: a.id });
    expect(answer.status).toBe(409);
    expect(answer.body.error.current).toMatchObject({ id: b.id, version: 1, title: 'B edited', placedByHand: false });
    expect(columnOf(await own.board(), 'reported')).toEqual(['A', 'B edited']);
  });
});
