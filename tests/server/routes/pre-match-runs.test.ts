import { describe, expect, it } from 'vitest';
import type { RunJson } from '../../../shared/schemas/checks';
import { ChecklistRun } from '../../../server/models';
import { signIn, testApp } from '../../support/app';
import { makeOurMatch, makeRun, makeTemplate, preMatchBody, tick } from '../../support/checks';
import { makeTeam, PASSWORD } from '../../support/factories';
import { matchBody } from '../../support/schedule';

// A field mark on one of our matches starts the pre-match checks of our next match.
// Field marks are dated in the past: a mark in the future is refused.
const { app } = testApp();

async function ownSchedule() {
  const own = await makeTeam();
  const lead = await signIn(app, own.emails.lead, PASSWORD);
  const crew = await signIn(app, own.emails.crew, PASSWORD);
  const day = (time: string) => `2026-11-28T${time}:00.000Z`;
  const q1 = await makeOurMatch(lead, own.event, { number: 1, scheduledStart: day('09:00') });
  const q2 = (await lead.post(`/api/events/${own.event.id}/matches`, matchBody({ number: 2, scheduledStart: day('09:07') }))).body;
  const q3 = await makeOurMatch(lead, own.event, { number: 3, alliance: 'blue', scheduledStart: day('09:14') });
  const q4 = await makeOurMatch(lead, own.event, { number: 4, scheduledStart: day('09:21') });
  const mark = async (match: { id: string }, time: string) => {
    const answer = await lead.post(`/api/events/${own.event.id}/field-progress`, { matchId: match.id, startedAt: day(time) });
    expect(answer.status).toBe(201);
  };
  const runsOf = async (match: { id: string }) =>
    (await crew.get(`/api/events/${own.event.id}/checklist-runs?matchId=${match.id}`)).body as Omit<RunJson, 'items'>[];
  return { ...own, lead, crew, q1, q2, q3, q4, mark, runsOf };
}

describe('pre-match runs started by field progress', () => {
  it("a mark on our match starts every pre-match template for our next match, at its current version, and nothing else", async () => {
    const own = await ownSchedule();
    const before = await makeTemplate(own.lead, preMatchBody({ name: 'Before every match' }));
    const radio = await makeTemplate(own.lead, preMatchBody({ name: 'Radio and bumpers', items: [tick('Radio cables secured')] }));
    await makeTemplate(own.lead, preMatchBody({ name: 'After every match', phase: 'post_match' }));
    expect((await own.lead.patch(`/api/checklist-templates/${radio.id}`, { items: [tick('Radio cables secured'), tick('Radio light green')] })).status).toBe(200);

    await own.mark(own.q1, '09:01');
    const runs = await own.runsOf(own.q3);
    expect(runs.map((run) => [run.name, run.templateVersion]).sort()).toEqual([
      ['Before every match', 1],
      ['Radio and bumpers', 2],
    ]);
    for (const run of runs) {
      expect(run.match).toEqual({ id: own.q3.id, level: 'qualification', number: 3, alliance: 'blue' });
      expect(run.createdBy).toEqual({ id: own.memberships.lead.userId, name: 'Factory lead' });
      expect(run.progress.done).toBe(0);
    }
    expect(runs.map((run) => run.templateId).sort()).toEqual([before.id, radio.id].sort());
    expect(await own.runsOf(own.q4)).toEqual([]);
    expect(await own.runsOf(own.q1)).toEqual([]);
  });

  it('starts nothing for a mark on a match we do not play in', async () => {
    const own = await ownSchedule();
    await makeTemplate(own.lead);
    await own.mark(own.q2, '09:08');
    expect(await ChecklistRun.count({ where: { eventId: own.event.id } })).toBe(0);
  });

  it('a second mark of the same match, or a run already started by hand, makes no second run', async () => {
    const own = await ownSchedule();
    const before = await makeTemplate(own.lead, preMatchBody({ name: 'Before every match' }));
    await makeTemplate(own.lead, preMatchBody({ name: 'Radio and bumpers' }));
    const byHand = await makeRun(own.crew, own.event.id, before.id, own.q3.id);
    await own.mark(own.q1, '09:01');
    await own.mark(own.q1, '09:02');
    const runs = await own.runsOf(own.q3);
    expect(runs).toHaveLength(2);
    expect(runs.find((run) => run.templateId === before.id)?.id).toBe(byHand.id);
  });

  it('skips our matches already on the field, and an earlier one of ours left unmarked', async () => {
    const own = await ownSchedule();
    await makeTemplate(own.lead);
    await own.mark(own.q3, '09:15'); // q1 never marked: our next match after q3 is q4
    expect((await own.runsOf(own.q4)).map((run) => run.match?.number)).toEqual([4]);
    expect(await own.runsOf(own.q1)).toEqual([]);

    const other = await ownSchedule();
    await makeTemplate(other.lead);
    await other.mark(other.q3, '09:15'); // q3 on the field before q1's mark was tapped
    await other.mark(other.q1, '09:01');
    expect(await other.runsOf(other.q3)).toEqual([]);
    expect(await other.runsOf(other.q4)).toHaveLength(1);
  });

  it('a mark on our last match, or for a team without pre-match templates, still records the mark', async () => {
    const own = await ownSchedule();
    await own.mark(own.q1, '09:01');
    expect(await ChecklistRun.count({ where: { eventId: own.event.id } })).toBe(0);
    await makeTemplate(own.lead);
    await own.mark(own.q4, '09:22');
    expect(await ChecklistRun.count({ where: { eventId: own.event.id } })).toBe(0);
  });
});
