import { describe, expect, it } from 'vitest';
import { signIn, testApp } from '../../support/app';
import { itemId, makeOurMatch, makeRun, makeTemplate, preMatchBody, tick } from '../../support/checks';
import { makeTeam, PASSWORD } from '../../support/factories';
import { editRepair, makeRepair } from '../../support/repairs';

// GET /api/events/:eventId/matches/:matchId/readiness with open repairs. Our match starts at
// 10:00 and the event queues 10 minutes ahead: the queue call is at 09:50.
const { app } = testApp();
const at = (time: string) => `2026-12-05T${time}:00.000Z`;

/** Our match with its pre-match check all done: ready, unless a repair says otherwise. */
async function readyMatch() {
  const own = await makeTeam();
  const admin = await signIn(app, own.emails.admin, PASSWORD);
  const lead = await signIn(app, own.emails.lead, PASSWORD);
  const crew = await signIn(app, own.emails.crew, PASSWORD);
  expect((await admin.patch(`/api/events/${own.event.id}`, { settings: { queueLead: { minutes: 10 } } })).status).toBe(200);
  const template = await makeTemplate(lead, preMatchBody({ items: [tick('Main breaker on')] }));
  const match = await makeOurMatch(lead, own.event, { number: 5, scheduledStart: at('10:00') });
  const run = await makeRun(crew, own.event.id, template.id, match.id);
  expect((await crew.put(`/api/checklist-runs/${run.id}/items/${itemId(run, 'Main breaker on')}`, { value: true })).status).toBe(200);
  const readiness = async (time: string) => {
    const answer = await crew.get(`/api/events/${own.event.id}/matches/${match.id}/readiness?at=${at(time)}`);
    expect(answer.status, JSON.stringify(answer.body)).toBe(200);
    return answer.body;
  };
  return { ...own, lead, crew, match, readiness };
}

const blocks = (title: string, level: string) => ({ code: 'repair_blocks_match', level, message: `Open repair blocks this match: ${title}` });
const late = (title: string) => ({ code: 'repair_blocks_match', level: 'not_ready', message: `Open repair blocks this match and cannot make the queue call: ${title}` });

describe('readiness with repairs', () => {
  it('an open blocking ticket: at risk before the queue call (loudly when near), not ready after it; gone once done', async () => {
    const own = await readyMatch();
    expect(await own.readiness('09:00')).toEqual({ matchId: own.match.id, state: 'ready', reasons: [] });
    const repair = await makeRepair(own.crew, own.event.id, { title: 'Left drive belt skipping teeth', severity: 'blocks_match' });

    expect(await own.readiness('09:00')).toEqual({ matchId: own.match.id, state: 'at_risk', reasons: [blocks(repair.title, 'at_risk')] });
    expect(await own.readiness('09:47')).toEqual({
      matchId: own.match.id,
      state: 'at_risk',
      reasons: [blocks(repair.title, 'at_risk'), { code: 'queue_call_near', level: 'at_risk', message: 'Queue call in 3 min and required work is still open' }],
    });
    // At the queue call it is still open: it could not make it.
    expect(await own.readiness('09:55')).toEqual({ matchId: own.match.id, state: 'not_ready', reasons: [late(repair.title)] });

    const inProgress = await editRepair(own.crew, repair, { status: 'in_progress' });
    expect((await own.readiness('09:00')).state).toBe('at_risk');
    await editRepair(own.crew, inProgress, { status: 'done' });
    expect(await own.readiness('09:00')).toEqual({ matchId: own.match.id, state: 'ready', reasons: [] });
    expect(await own.readiness('09:55')).toEqual({ matchId: own.match.id, state: 'ready', reasons: [] });
  });

  it('not ready at once when the work estimated is longer than the minutes left before the queue call', async () => {
    const own = await readyMatch();
    // 20 minutes left at 09:30: 15 minutes of work still fits, 30 (or 45 less 10 spent) does not.
    await makeRepair(own.crew, own.event.id, { title: 'Arm will not lift', severity: 'blocks_match', estimateMinutes: 15 });
    const long = await makeRepair(own.crew, own.event.id, { title: 'Drive dead', severity: 'blocks_match', estimateMinutes: 45 });
    expect(await own.readiness('09:30')).toEqual({
      matchId: own.match.id,
      state: 'not_ready',
      reasons: [late('Drive dead'), blocks('Arm will not lift', 'at_risk')],
    });
    // Time logged counts against the estimate: 45 − 30 spent = 15 left, which fits. Equal work
    // left: the one reported first is listed first, as on the board.
    await editRepair(own.crew, long, { timeSpentMinutes: 30 });
    expect(await own.readiness('09:30')).toEqual({
      matchId: own.match.id,
      state: 'at_risk',
      reasons: [blocks('Arm will not lift', 'at_risk'), blocks('Drive dead', 'at_risk')],
    });
  });

  it('degraded and cosmetic tickets, and tickets of another event, do not block', async () => {
    const own = await readyMatch();
    const admin = await signIn(app, own.emails.admin, PASSWORD);
    await makeRepair(own.crew, own.event.id, { title: 'Intake slow', severity: 'degraded', estimateMinutes: 300 });
    await makeRepair(own.crew, own.event.id, { title: 'Scuffed', severity: 'cosmetic' });
    const elsewhere = await admin.post('/api/events', { name: 'Other Event', venue: 'Other Hall', timeZone: 'Europe/Berlin', startDate: '2027-02-01', endDate: '2027-02-02', teamNumber: own.event.teamNumber });
    await makeRepair(own.crew, elsewhere.body.id, { title: 'Elsewhere', severity: 'blocks_match' });
    expect(await own.readiness('09:30')).toEqual({ matchId: own.match.id, state: 'ready', reasons: [] });
  });
});
