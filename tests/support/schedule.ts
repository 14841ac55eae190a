import type { SignedIn } from './app';

export const CSV_HEADER = 'level,number,scheduled_start,red1,red2,red3,blue1,blue2,blue3';

/** A schedule file: the header, then the given lines. */
export const csv = (...lines: string[]) => [CSV_HEADER, ...lines].join('\n') + '\n';

/** A valid body for POST /api/events/:eventId/matches; override any field. */
export const matchBody = (overrides: Record<string, unknown> = {}) => ({
  level: 'qualification',
  number: 1,
  scheduledStart: '2026-12-05T09:00:00.000Z',
  red: [21001, 21002, 21003],
  blue: [21004, 21005, 21006],
  ...overrides,
});

/** Uploads a schedule file as a browser form would (multipart, field `file`). */
export function importCsv(
  client: SignedIn,
  eventId: string,
  text: string | Buffer,
  { dryRun = false, filename = 'schedule.csv', contentType = 'text/csv', field = 'file' } = {},
) {
  return client.agent
    .post(`/api/events/${eventId}/matches/import${dryRun ? '?dryRun=1' : ''}`)
    .set('x-csrf-token', client.csrfToken)
    .attach(field, Buffer.isBuffer(text) ? text : Buffer.from(text), { filename, contentType });
}
