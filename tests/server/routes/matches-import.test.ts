import { beforeAll, describe, expect, it } from 'vitest';
import { Event, FieldMark } from '../../../server/models';
import { signIn, testApp, type SignedIn } from '../../support/app';
import { invalid } from '../../support/errors';
import { makeTeam, PASSWORD } from '../../support/factories';
import { csv, CSV_HEADER, importCsv } from '../../support/schedule';

// POST /api/events/:eventId/matches/import. Signed-out, role and foreign-team rungs are in matches.test.ts.
const { app } = testApp();

/** A team whose event runs in America/Chicago (CST, UTC−6 in early March 2027). */
async function chicagoTeam() {
  const own = await makeTeam();
  await Event.update({ timeZone: 'America/Chicago', startDate: '2027-03-04', endDate: '2027-03-06' }, { where: { id: own.event.id } });
  const admin = await signIn(app, own.emails.admin, PASSWORD);
  return { ...own, admin, url: `/api/events/${own.event.id}/matches` };
}
let team: Awaited<ReturnType<typeof chicagoTeam>>;
let admin: SignedIn;
beforeAll(async () => {
  team = await chicagoTeam();
  admin = team.admin;
});

const FIRST = [
  'qualification,1,2027-03-05 09:00,21001,21002,21003,21004,21005,21006',
  'qualification,2,2027-03-05 09:07,21007,21008,21009,21010,21011,21012',
  'practice,1,2027-03-04T16:00:00-06:00,21001,21004,21007,21010,21002,21005',
];

describe('POST …/matches/import: success', () => {
  it('creates every match, reading local times in the event zone, and answers the schedule', async () => {
    const own = await chicagoTeam();
    const answer = await importCsv(own.admin, own.event.id, csv(...FIRST));
    expect(answer.status).toBe(200);
    expect(answer.body).toMatchObject({ created: 3, updated: 0, unchanged: 0 });
    expect(answer.body.matches.map((m: { level: string; number: number; scheduledStart: string }) => [m.level, m.number, m.scheduledStart])).toEqual([
      ['practice', 1, '2027-03-04T22:00:00.000Z'],
      ['qualification', 1, '2027-03-05T15:00:00.000Z'],
      ['qualification', 2, '2027-03-05T15:07:00.000Z'],
    ]);
    expect(answer.body.matches[1]).toEqual({
      id: expect.any(String),
      level: 'qualification',
      number: 1,
      scheduledStart: '2027-03-05T15:00:00.000Z',
      startedAt: null,
      red: [21001, 21002, 21003],
      blue: [21004, 21005, 21006],
      version: 0,
    });
    expect((await own.admin.get(own.url)).body).toEqual(answer.body.matches);
  });

  it('a dry run answers the same counts and writes nothing', async () => {
    const own = await chicagoTeam();
    const preview = await importCsv(own.admin, own.event.id, csv(...FIRST), { dryRun: true });
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ created: 3, updated: 0, unchanged: 0 });
    expect(preview.body.matches).toHaveLength(3);
    expect((await own.admin.get(own.url)).body).toEqual([]);
  });

  it('re-import updates by level and number, keeps the rest and keeps field progress', async () => {
    const own = await chicagoTeam();
    const first = (await importCsv(own.admin, own.event.id, csv(...FIRST))).body.matches;
    const q1 = first.find((m: { level: string; number: number }) => m.level === 'qualification' && m.number === 1);
    const marked = await own.admin.post(`/api/events/${own.event.id}/field-progress`, { matchId: q1.id, startedAt: '2026-11-20T15:02:00Z' });
    expect(marked.status).toBe(201);

    const revised = csv(
      'qualification,1,2027-03-05 09:05,21001,21002,21003,21004,21005,21006', // later start
      'qualification,2,2027-03-05 09:07,21007,21008,21009,21010,21011,21012', // as it was
      'qualification,3,2027-03-05 09:14,21001,21008,21003,21010,21005,21012', // new
    );
    const preview = await importCsv(own.admin, own.event.id, revised, { dryRun: true });
    expect(preview.body).toMatchObject({ created: 1, updated: 1, unchanged: 1 });

    const answer = await importCsv(own.admin, own.event.id, revised);
    expect(answer.status).toBe(200);
    expect(answer.body).toMatchObject({ created: 1, updated: 1, unchanged: 1 });
    expect(answer.body.matches).toHaveLength(4); // practice 1 stays, though not in the file
    const after = answer.body.matches.find((m: { id: string }) => m.id === q1.id);
    expect(after).toEqual({ ...q1, scheduledStart: '2027-03-05T15:05:00.000Z', startedAt: '2026-11-20T15:02:00.000Z', version: 1 });
    expect(preview.body.matches.find((m: { id: string }) => m.id === q1.id)).toEqual(after);
    expect(await FieldMark.count({ where: { matchId: q1.id, undoneAt: null } })).toBe(1);
  });
});

describe('POST …/matches/import: bad files', () => {
  it('lists every bad row with its column and why, and imports nothing', async () => {
    const answer = await importCsv(
      admin,
      team.event.id,
      csv(
        'qualification,1,2027-03-05 09:00,21001,21002,21003,21004,21005,21006',
        'qualification,two,2027-03-05 09:07,21007,21008,21009,21010,21011,21012',
        'qualification,3,2027-03-14 02:30,21001,21002,21003,21004,21005,0',
      ),
    );
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual({
      error: {
        code: 'invalid_file',
        message: '2 rows need fixing; nothing was imported',
        rows: [
          { row: 3, column: 'number', message: 'A whole number from 1 to 999' },
          { row: 4, column: 'scheduled_start', message: '2027-03-14 02:30 does not exist in America/Chicago' },
          { row: 4, column: 'blue3', message: 'A team number from 1 to 99999' },
        ],
      },
    });
    expect((await admin.get(team.url)).body).toEqual([]);
  });

  it('refuses a wrong header', async () => {
    const answer = await importCsv(admin, team.event.id, 'match,start\n1,09:00\n');
    expect(answer.status).toBe(400);
    expect(answer.body.error.code).toBe('invalid_file');
    expect(answer.body.error.rows[0]).toEqual({ row: 1, column: null, message: `The first line must be: ${CSV_HEADER}` });
  });

  it('answers 400 naming file when none is sent, it is not CSV, or it is in another field', async () => {
    const none = await admin.agent.post(`${team.url}/import`).set('x-csrf-token', admin.csrfToken);
    expect(none.status).toBe(400);
    expect(none.body).toEqual(invalid({ file: 'Required' }));
    const pdf = await importCsv(admin, team.event.id, '%PDF-1.7', { filename: 'schedule.pdf', contentType: 'application/pdf' });
    expect(pdf.status).toBe(400);
    expect(pdf.body).toEqual(invalid({ file: 'Send a CSV file (.csv)' }));
    const elsewhere = await importCsv(admin, team.event.id, csv(...FIRST), { field: 'schedule' });
    expect(elsewhere.status).toBe(400);
    expect(elsewhere.body).toEqual(invalid({ file: 'Send one CSV file in the form field "file"' }));
    expect((await admin.get(team.url)).body).toEqual([]);
  });

  it('answers 413 for a file over 1 MB', async () => {
    const answer = await importCsv(admin, team.event.id, csv(...FIRST) + '#'.repeat(1024 * 1024));
    expect(answer.status).toBe(413);
    expect(answer.body).toEqual({ error: { code: 'too_large', message: 'The file is larger than 1 MB' } });
  });

  it('answers 400 naming dryRun when it is not a flag', async () => {
    const answer = await admin.agent.post(`${team.url}/import?dryRun=maybe`).set('x-csrf-token', admin.csrfToken).attach('file', Buffer.from(csv(...FIRST)), 'schedule.csv');
    expect(answer.status).toBe(400);
    expect(answer.body).toEqual(invalid({ dryRun: 'Use 1 to preview without saving' }));
  });
});
