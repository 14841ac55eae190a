import type { OurMatchJson } from '@shared/domain/timeline';
import { allianceSolidClass } from '../../../components/ui/alliance';
import { formatZonedTime } from '../../../lib/dates';
import { allianceWord, formatMinutes, matchName } from '../../../lib/match-labels';

/** Our next few matches after the next one, one line each. */
export function ScreenLaterMatches({ matches, timeZone }: { matches: OurMatchJson[]; timeZone: string }) {
  const time = (at: string) => formatZonedTime(new Date(at), timeZone, false);
  return (
    <section aria-labelledby="screen-later-title">
      <h2 id="screen-later-title" className="mb-2 text-2xl font-bold tracking-widest text-neutral-300 uppercase">
        After that
      </h2>
      <ol className="divide-y divide-neutral-700 rounded-3xl bg-neutral-900 px-8">
        {matches.map((match) => (
          <li key={match.matchId} className="grid grid-cols-[18rem_8rem_1fr_1fr_1.3fr] items-center gap-6 py-2 text-3xl">
            <span className="font-black">{matchName(match.level, match.number)}</span>
            <span className={`rounded-xl px-3 text-center font-black tracking-wider ${allianceSolidClass(match.alliance)}`}>{allianceWord(match.alliance)}</span>
            <span className="tabular-nums">
              <span className="text-xl text-neutral-300">Queue </span>
              {time(match.queueAt)}
            </span>
            <span className="tabular-nums">
              <span className="text-xl text-neutral-300">Start </span>
              {time(match.projectedStart)}
            </span>
            <span className="whitespace-nowrap tabular-nums">
              <span className="text-xl text-neutral-300">Turnaround </span>
              {match.turnaroundMinutes === null ? '—' : formatMinutes(match.turnaroundMinutes)}
              {match.tight && <span className="ml-3 font-black text-amber-300">Tight</span>}
            </span>
          </li>
        ))}
      </ol>
    </section>
  );
}
