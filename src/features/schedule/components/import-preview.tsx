import type { ImportJson, MatchJson } from '@shared/schemas/schedule';
import { formatZonedDay, formatZonedTime } from '../../../lib/dates';
import { matchName } from '../../../lib/match-labels';

const SHOWN_ROWS = 6;

/** `level,number` of the file's first lines; a display aid only, the server did the real reading. */
export function firstKeysOf(text: string): string[] {
  return text
    .split(/\r?\n/)
    .slice(1)
    .map((line) => line.split(',').slice(0, 2).map((cell) => cell.trim().replace(/^"|"$/g, '').toLowerCase()).join(' '))
    .filter((key) => key.trim() !== '')
    .slice(0, SHOWN_ROWS);
}

function Count({ value, label }: { value: number; label: string }) {
  return (
    <div className="flex flex-col items-center rounded-xl bg-sunken px-4 py-3">
      <span className="text-3xl font-bold tabular-nums">{value}</span>
      <span className="text-sm font-semibold text-ink-muted">{label}</span>
    </div>
  );
}

export function ImportCounts({ result }: { result: ImportJson }) {
  return (
    <div className="grid grid-cols-3 gap-2" aria-label="What the import does">
      <Count value={result.created} label="new" />
      <Count value={result.updated} label="changed" />
      <Count value={result.unchanged} label="unchanged" />
    </div>
  );
}

/**
 * The file's first matches as the server read them: start times are shown on the venue's clock,
 * so a file written in another zone shows up here before anything is saved.
 */
export function ImportFirstRows({ result, keys, timeZone }: { result: ImportJson; keys: string[]; timeZone: string }) {
  const bySlot = new Map(result.matches.map((match) => [`${match.level} ${match.number}`, match]));
  const rows = keys.map((key) => bySlot.get(key)).filter((match): match is MatchJson => match !== undefined);
  if (rows.length === 0) return null;
  return (
    <div className="overflow-x-auto rounded-xl border border-line">
      <table className="w-full text-left tabular-nums">
        <caption className="px-3 pt-2 text-left font-semibold">The file&apos;s first matches</caption>
        <thead className="border-b border-line text-sm text-ink-muted">
          <tr>
            <th scope="col" className="px-3 py-2">Match</th>
            <th scope="col" className="px-3 py-2">Start (venue)</th>
            <th scope="col" className="px-3 py-2">RED</th>
            <th scope="col" className="px-3 py-2">BLUE</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((match) => (
            <tr key={match.id} className="border-b border-line last:border-0">
              <td className="px-3 py-2 font-semibold whitespace-nowrap">{matchName(match.level, match.number)}</td>
              <td className="px-3 py-2 whitespace-nowrap">
                {formatZonedDay(new Date(match.scheduledStart), timeZone)} {formatZonedTime(new Date(match.scheduledStart), timeZone, false)}
              </td>
              <td className="px-3 py-2 text-alliance-red-ink">{match.red.join(' ')}</td>
              <td className="px-3 py-2 text-alliance-blue-ink">{match.blue.join(' ')}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
