// Written out rather than imported from shared/domain/schedule-csv: that module pulls csv-parse,
// which needs Node's Buffer and breaks the browser bundle. tests/support/schedule.ts holds the same line.
const HEADER = 'level,number,scheduled_start,red1,red2,red3,blue1,blue2,blue3';

// A made-up example in our own format; the team numbers belong to no one.
const EXAMPLE = [
  'qualification,1,2027-03-05 09:00,24011,24012,24013,24014,24015,24016',
  'qualification,2,2027-03-05 09:07,24021,24022,24023,24024,24025,24026',
];

/** The file format, where the lead picks the file: the usual reason an import fails is a column out of place. */
export function CsvFormatHelp({ zoneLabel }: { zoneLabel: string }) {
  return (
    <div className="flex flex-col gap-2 rounded-xl bg-sunken p-4">
      <p className="font-semibold">The file: one header line, then one match per line</p>
      <pre className="overflow-x-auto rounded-lg bg-surface p-3 text-sm leading-relaxed tabular-nums">
        <code>{[HEADER, ...EXAMPLE].join('\n')}</code>
      </pre>
      <p className="text-sm text-ink-muted">
        Level is practice, qualification or playoff. A start like 2027-03-05 09:00 is read on the venue&apos;s clock ({zoneLabel});
        one with an offset (2027-03-05T09:00:00-06:00) is taken as written. Matches already in the schedule are updated by level
        and number; field marks stay.
      </p>
    </div>
  );
}
