import { describe, expect, it } from 'vitest';
import { signIn, testApp } from '../../support/app';
import { invalid } from '../../support/errors';
import { makeTeam, PASSWORD } from '../../support/factories';
import { matchBody } from '../../support/schedule';

// GET /api/events/:eventId/timeline. Signed-out, role and foreign-team rungs are in matches.test.ts;
// the projection itself is tested in tests/shared/domain/timeline*.test.ts.
const { app } = testApp();

describe('GET /api/events/:eventId/timeline', () => {
  it('answers 400 naming at when it is not an instant with an offset', async () => {
    const own = await makeTeam();
    const viewer = await signIn(app, own.emails.viewer, PASSWORD);
    for (const at of ['soon', '2026-11-28T09:00:00']) {
      const answer = await viewer.get(`/api/events/${own.event.id}/timeline?at=${encodeURIComponent(at)}`);
      expect(answer.status).toBe(400);
      expect(answer.body).toEqual(invalid({ at: 'Use an ISO time with an offset, e.g. 2027-03-05T15:00:00Z' }));
    }
  });

  it('projects the schedule from a started match as of `at`, with our queue time', async () => {
    const own = await makeTeam(); // our team number is the event's teamNumber
    const us = own.event.teamNumber;
    const lead = await signIn(app, own.emails.lead, PASSWORD);
    const url = `/api/events/${own.event.id}/matches`;
    // Three matches 7 minutes apart; we play the third on blue.
    const q1 = (await lead.post(url, matchBody({ number: 1, scheduledStart: '2026-11-28T09:00:00Z' }))).body;
    const q2 = (await lead.post(url, matchBody({ number: 2, scheduledStart: '2026-11-28T09:07:00Z' }))).body;
    const q3 = (await lead.post(url, matchBody({ number: 3, scheduledStart: '2026-11-28T09:14:00Z', blue: [21004, us, 21006] }))).body;
    // The field started match 1 five minutes late.
    await lead.post(`/api/events/${own.event.id}/field-progress`, { matchId: q1.id, startedAt: '2026-11-28T09:05:00Z' });

    const viewer = await signIn(app, own.emails.viewer, PASSWORD);
    const answer = await viewer.get(`/api/events/${own.event.id}/timeline?at=2026-11-28T09:06:00Z`);
    expect(answer.status).toBe(200);
    // Cycle: the median scheduled gap (one start gives no observed gap) = 420 s. Match 2:
    // max(09:07, 09:05 + 7 min) = 09:12, 300 s late; match 3 09:19. Queue two matches ahead
    // (the default) = match 1's start 09:05. Our first match: no turnaround.
    expect(answer.body).toEqual({
      cycleSeconds: 420,
      delaySeconds: 300,
      matches: [
        { id: q1.id, level: 'qualification', number: 1, scheduledStart: '2026-11-28T09:00:00.000Z', projectedStart: '2026-11-28T09:05:00.000Z', startedAt: '2026-11-28T09:05:00.000Z', ours: false, alliance: null },
        { id: q2.id, level: 'qualification', number: 2, scheduledStart: '2026-11-28T09:07:00.000Z', projectedStart: '2026-11-28T09:12:00.000Z', startedAt: null, ours: false, alliance: null },
        { id: q3.id, level: 'qualification', number: 3, scheduledStart: '2026-11-28T09:14:00.000Z', projectedStart: '2026-11-28T09:19:00.000Z', startedAt: null, ours: true, alliance: 'blue' },
      ],
      ourMatches: [
        { matchId: q3.id, level: 'qualification', number: 3, alliance: 'blue', projectedStart: '2026-11-28T09:19:00.000Z', queueAt: '2026-11-28T09:05:00.000Z', turnaroundMinutes: null, tight: false },
      ],
    });

    // Queue by minutes instead (an event setting): 09:19 − 10 min.
    const admin = await signIn(app, own.emails.admin, PASSWORD);
    expect((await admin.patch(`/api/events/${own.event.id}`, { settings: { queueLead: { minutes: 10 } } })).status).toBe(200);
    const byMinutes = await viewer.get(`/api/events/${own.event.id}/timeline?at=2026-11-28T09:06:00Z`);
    expect(byMinutes.body.ourMatches[0].queueAt).toBe('2026-11-28T09:09:00.000Z');
  });

  it('answers an empty timeline for an event without matches', async () => {
    const own = await makeTeam();
    const viewer = await signIn(app, own.emails.viewer, PASSWORD);
    const answer = await viewer.get(`/api/events/${own.event.id}/timeline`);
    expect(answer.status).toBe(200);
    expect(answer.body).toEqual({ cycleSeconds: 0, delaySeconds: 0, matches: [], ourMatches: [] });
  });
});
