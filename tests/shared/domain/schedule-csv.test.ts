import { describe, expect, it } from 'vitest';
import { parseScheduleCsv } from '../../../shared/domain/schedule-csv';

const HEADER = 'level,number,scheduled_start,red1,red2,red3,blue1,blue2,blue3';
const file = (...lines: string[]) => [HEADER, ...lines].join('\n') + '\n';

// America/Chicago is CST (UTC−6) until 02:00 local on Sunday 2027-03-14 (IANA tzdata).
const ZONE = 'America/Chicago';

describe('parseScheduleCsv: good files', () => {
  it('reads local times in the event zone and ISO instants as they are', () => {
    const result = parseScheduleCsv(
      file('qualification,1,2027-03-05 09:00,21001,21002,21003,21004,21005,21006', 'Playoff,2,2027-03-06T10:30:00-06:00,21001,21002,21003,21004,21005,21007'),
      ZONE,
    );
    expect(result).toEqual({
      ok: true,
      rows: [
        { line: 2, level: 'qualification', number: 1, scheduledStart: '2027-03-05T15:00:00.000Z', red: [21001, 21002, 21003], blue: [21004, 21005, 21006] },
        { line: 3, level: 'playoff', number: 2, scheduledStart: '2027-03-06T16:30:00.000Z', red: [21001, 21002, 21003], blue: [21004, 21005, 21007] },
      ],
    });
  });

  it('takes a byte order mark, CRLF line ends, blank lines, spaces around cells and a capitalised header', () => {
    const text = '\uFEFF' + HEADER.toUpperCase() + '\r\n\r\n practice , 3 , 2027-03-04 16:00 ,21001,21002,21003,21004,21005,21006\r\n';
    const result = parseScheduleCsv(text, ZONE);
    expect(result).toEqual({
      ok: true,
      rows: [{ line: 3, level: 'practice', number: 3, scheduledStart: '2027-03-04T22:00:00.000Z', red: [21001, 21002, 21003], blue: [21004, 21005, 21006] }],
    });
  });

  it('reads the same wall clock an hour apart in UTC across the spring-forward change', () => {
    const result = parseScheduleCsv(
      file('qualification,1,2027-03-13 09:00,21001,21002,21003,21004,21005,21006', 'qualification,2,2027-03-14 09:00,21001,21002,21003,21004,21005,21006'),
      ZONE,
    );
    expect(result.ok && result.rows.map((row) => row.scheduledStart)).toEqual(['2027-03-13T15:00:00.000Z', '2027-03-14T14:00:00.000Z']);
  });
});

describe('parseScheduleCsv: bad files list every problem with its line and column', () => {
  it('names each bad cell, a short line and a repeated match', () => {
    const result = parseScheduleCsv(
      file(
        'qualification,1,2027-03-05 09:00,21001,21002,21003,21004,21005,21006', // line 2: fine
        'final,0,tomorrow,21001,abc,21003,21004,21005,100000', // line 3: five bad cells
        'qualification,2,2027-03-05 09:07,21001', // line 4: too few columns
        'qualification,1,2027-03-05 09:14,21001,21002,21003,21004,21005,21001', // line 5: repeated match, team twice
        'qualification,3,2027-03-14 02:30,21001,21002,21003,21004,21005,21006', // line 6: skipped by the clock change
        'qualification,4,2027-03-05T09:21:00,21001,21002,21003,21004,21005,21006', // line 7: no offset
      ),
      ZONE,
    );
    const start = 'Use YYYY-MM-DD HH:mm (event time) or an ISO time with an offset, e.g. 2027-03-05T15:00:00Z';
    expect(result).toEqual({
      ok: false,
      errors: [
        { row: 3, column: 'level', message: 'Use practice, qualification or playoff' },
        { row: 3, column: 'number', message: 'A whole number from 1 to 999' },
        { row: 3, column: 'scheduled_start', message: start },
        { row: 3, column: 'red2', message: 'A team number from 1 to 99999' },
        { row: 3, column: 'blue3', message: 'A team number from 1 to 99999' },
        { row: 4, column: null, message: 'Expected 9 columns, found 4' },
        { row: 5, column: 'blue3', message: 'Team 21001 is in this match twice' },
        { row: 5, column: 'number', message: 'qualification 1 is already on row 2' },
        { row: 6, column: 'scheduled_start', message: '2027-03-14 02:30 does not exist in America/Chicago' },
        { row: 7, column: 'scheduled_start', message: start },
      ],
    });
  });

  it('refuses a wrong header, still checking the rows below it', () => {
    const result = parseScheduleCsv('match,time,red,blue\nqualification,1,2027-03-05 09:00,21001,21002,21003,21004,21005,x\n', ZONE);
    expect(result).toEqual({
      ok: false,
      errors: [
        { row: 1, column: null, message: `The first line must be: ${HEADER}` },
        { row: 2, column: 'blue3', message: 'A team number from 1 to 99999' },
      ],
    });
  });

  it('refuses an empty file, a header alone, and a quote left open', () => {
    expect(parseScheduleCsv('', ZONE)).toEqual({ ok: false, errors: [{ row: 1, column: null, message: 'The file is empty' }] });
    expect(parseScheduleCsv(file(), ZONE)).toEqual({ ok: false, errors: [{ row: 1, column: null, message: 'The file holds no matches' }] });
    const open = parseScheduleCsv(file('qualification,1,"2027-03-05 09:00,21001,21002,21003,21004,21005,21006'), ZONE);
    expect(open.ok).toBe(false);
    expect(!open.ok && open.errors.map(({ row, column }) => ({ row, column }))).toEqual([{ row: 2, column: null }]);
    expect(!open.ok && open.errors[0].message).toMatch(/^Not readable as CSV: /);
  });

  it('counts a row from the line it starts on when a quoted cell spans lines', () => {
    const result = parseScheduleCsv(file('"quali\nfication",1,2027-03-05 09:00,21001,21002,21003,21004,21005,21006'), ZONE);
    expect(result).toEqual({ ok: false, errors: [{ row: 2, column: 'level', message: 'Use practice, qualification or playoff' }] });
  });
});
