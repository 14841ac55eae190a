import type { ReadinessJson } from '@shared/domain/readiness';
import type { OurMatchJson } from '@shared/domain/timeline';
import type { MatchJson } from '@shared/schemas/schedule';
import { allianceSolidClass } from '../../../components/ui/alliance';
import { Countdown } from '../../../components/ui/countdown';
import { AlertIcon, QueueIcon } from '../../../components/ui/icons';
import { ReadinessLight } from '../../../components/ui/readiness-light';
import { formatZonedTime } from '../../../lib/dates';
import { formatMinutes, isQueueSoon, lineupOf, matchName } from '../../../lib/match-labels';

// The same threshold as the board: about two field cycles to stop work and walk the robot over.

function Clock({ label, at, now, timeZone, loud }: { label: string; at: string; now: Date; timeZone: string; loud: boolean }) {
  return (
    <div className={`rounded-3xl px-8 py-4 ${loud ? 'bg-red-700 text-white' : 'bg-neutral-900'}`}>
      <p className={`text-2xl font-bold tracking-widest uppercase ${loud ? '' : 'text-neutral-300'}`}>{label}</p>
      <p className="text-7xl leading-tight font-black whitespace-nowrap">
        <Countdown target={at} now={now} />
      </p>
      <p className="text-2xl font-semibold tabular-nums">at {formatZonedTime(new Date(at), timeZone, false)}</p>
    </div>
  );
}

function Teams({ label, teams }: { label: string; teams: readonly number[] | undefined }) {
  return (
    <div>
      <dt className="text-2xl font-bold tracking-widest text-neutral-300 uppercase">{label}</dt>
      <dd className="text-5xl font-black whitespace-nowrap tabular-nums">{teams ? teams.join(' · ') : '…'}</dd>
    </div>
  );
}

/**
 * Our next match, for a TV: the alliance as a huge block with its word, whether the robot is
 * ready, the two countdowns, who we play with and against.
 */
export function ScreenNextMatch({ match, teams, teamNumber, timeZone, now, readiness }: {
  match: OurMatchJson;
  teams: MatchJson | undefined;
  teamNumber: number;
  timeZone: string;
  now: Date;
  /** The server's readiness of our next match; shown only when it is of this one. */
  readiness: ReadinessJson | null;
}) {
  const queueSoon = isQueueSoon(match.queueAt, now);
  const { word, opponentWord, partners, opponents } = lineupOf(match.alliance, teams, teamNumber);
  return (
    <section aria-labelledby="screen-next-title" className="flex flex-col gap-5">
      {queueSoon && (
        <p role="alert" className="flex items-center justify-center gap-6 rounded-3xl bg-red-700 py-4 text-8xl font-black tracking-wider text-white uppercase">
          <QueueIcon className="size-20" /> Queue now
        </p>
      )}
      <div className="grid grid-cols-[minmax(18rem,22rem)_1fr] gap-8">
        <div className={`flex flex-col items-center justify-center rounded-3xl px-6 py-6 text-center ${allianceSolidClass(match.alliance)}`}>
          <p className="text-3xl font-bold tracking-widest uppercase">Alliance</p>
          <p className="text-[8rem] leading-none font-black tracking-wider">{word}</p>
        </div>
        <div className="flex min-w-0 flex-col gap-4">
          <div>
            <p className="text-2xl font-bold tracking-widest text-neutral-300 uppercase">Our next match</p>
            <h2 id="screen-next-title" className="text-7xl leading-none font-black tracking-tight">
              {matchName(match.level, match.number)}
            </h2>
          </div>
          <dl className="grid grid-cols-2 gap-6">
            <Teams label={`With (${word})`} teams={partners} />
            <Teams label={`Against (${opponentWord})`} teams={opponents} />
          </dl>
          <p className="flex items-center gap-4 text-3xl">
            <span className="font-semibold text-neutral-300">Turnaround before it:</span>
            <span className="font-bold tabular-nums">
              {match.turnaroundMinutes === null ? 'our first match' : formatMinutes(match.turnaroundMinutes)}
            </span>
            {match.tight && (
              <span className="inline-flex items-center gap-2 rounded-full bg-amber-300 px-4 py-1 font-black text-black">
                <AlertIcon className="size-8" /> Tight
              </span>
            )}
          </p>
        </div>
      </div>
      {readiness?.matchId === match.matchId && <ReadinessLight readiness={readiness} look="screen" />}
      <div className="grid grid-cols-2 gap-8">
        <Clock label={queueSoon ? 'Queue call' : 'Queue'} at={match.queueAt} now={now} timeZone={timeZone} loud={queueSoon} />
        <Clock label="Projected start" at={match.projectedStart} now={now} timeZone={timeZone} loud={false} />
      </div>
    </section>
  );
}
