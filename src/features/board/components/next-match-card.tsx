import type { ReactNode } from 'react';
import type { OurMatchJson } from '@shared/domain/timeline';
import { allianceSolidClass } from '../../../components/ui/alliance';
import { AlertIcon, QueueIcon } from '../../../components/ui/icons';
import { StatusTag } from '../../../components/ui/status-tag';
import { formatZonedTime } from '../../../lib/dates';
import { formatMinutes, isQueueSoon, lineupOf, matchName } from '../../../lib/match-labels';
import { useServerNow } from '../../../lib/server-clock';
import { Countdown } from '../../../components/ui/countdown';

/** What the card needs of the matches list: the three seats of each alliance. */
export interface MatchTeams {
  id: string;
  red: readonly number[];
  blue: readonly number[];
}

// Five minutes is about two field cycles: enough to stop work, grab the robot and walk.

function Teams({ label, teams }: { label: string; teams: readonly number[] | undefined }) {
  return (
    <div>
      <dt className="text-sm font-semibold tracking-wide text-ink-muted uppercase">{label}</dt>
      <dd>
        {teams ? (
          <ul className="flex flex-wrap gap-x-4 text-2xl font-bold tabular-nums sm:text-3xl">
            {teams.map((team, seat) => (
              <li key={`${seat}-${team}`}>{team}</li>
            ))}
          </ul>
        ) : (
          <span className="text-2xl text-ink-muted">…</span>
        )}
      </dd>
    </div>
  );
}

function Clock({ label, at, timeZone, now, loud }: { label: ReactNode; at: string; timeZone: string; now: Date; loud?: boolean }) {
  return (
    <div className={`rounded-2xl p-4 ${loud ? 'bg-danger text-on-danger' : 'bg-sunken'}`}>
      <p className={`flex items-center gap-2 text-sm font-bold tracking-wide uppercase ${loud ? '' : 'text-ink-muted'}`}>{label}</p>
      <p className="text-4xl leading-tight font-extrabold whitespace-nowrap sm:text-5xl">
        <Countdown target={at} now={now} />
      </p>
      <p className="text-lg font-semibold tabular-nums">at {formatZonedTime(new Date(at), timeZone, false)}</p>
    </div>
  );
}

export function NextMatchCard({ match, teams, teamNumber, timeZone, readiness, battery, repairs }: {
  match: OurMatchJson;
  teams: MatchTeams | undefined;
  teamNumber: number;
  timeZone: string;
  /** Whether the robot is ready for it, and the checklist progress: filled by the route from the checks feature. */
  readiness?: ReactNode;
  /** The battery planned for it and whether it is in the robot: filled by the route from the batteries feature. */
  battery?: ReactNode;
  /** Open repairs that block it, with the minutes left: filled by the route from the repairs feature. */
  repairs?: ReactNode;
}) {
  const now = useServerNow(1000);
  const queueSoon = isQueueSoon(match.queueAt, now);
  const { word, opponentWord, partners, opponents } = lineupOf(match.alliance, teams, teamNumber);

  return (
    <article aria-labelledby="next-match-title" className="overflow-hidden rounded-3xl border border-line bg-surface shadow-sm">
      {queueSoon && (
        <p role="alert" className="flex items-center justify-center gap-3 bg-danger px-4 py-3 text-3xl font-extrabold tracking-wide text-on-danger uppercase">
          <QueueIcon className="size-9" /> Queue now
        </p>
      )}
      <div className="grid gap-6 p-5 sm:grid-cols-[minmax(11rem,14rem)_1fr] sm:p-6">
        <div className={`flex flex-col items-center justify-center rounded-2xl px-4 py-6 text-center ${allianceSolidClass(match.alliance)}`}>
          <p className="text-sm font-bold tracking-widest uppercase">Alliance</p>
          <p className="text-6xl leading-none font-black tracking-wider">{word}</p>
          <p className="mt-2 font-semibold">{word === 'RED' ? 'Red' : 'Blue'} bumpers on</p>
        </div>
        <div className="flex min-w-0 flex-col gap-4">
          <div>
            <p className="text-sm font-bold tracking-wide text-accent-ink uppercase">Our next match</p>
            <h2 id="next-match-title" className="text-4xl leading-tight font-extrabold tracking-tight sm:text-5xl">
              {matchName(match.level, match.number)}
            </h2>
          </div>
          <dl className="grid gap-3 min-[480px]:grid-cols-2">
            <Teams label={`With (${word})`} teams={partners} />
            <Teams label={`Against (${opponentWord})`} teams={opponents} />
          </dl>
        </div>
      </div>
      <div className="grid gap-4 px-5 pb-5 min-[480px]:grid-cols-2 sm:px-6 sm:pb-6">
        <Clock
          label={<><QueueIcon className="size-5" /> {queueSoon ? 'Queue call' : 'Queue'}</>}
          at={match.queueAt}
          timeZone={timeZone}
          now={now}
          loud={queueSoon}
        />
        <Clock label="Projected start" at={match.projectedStart} timeZone={timeZone} now={now} />
      </div>
      {/* After the countdowns (what the whole pit times itself by), before the turnaround. */}
      {readiness && <div className="px-5 pb-5 sm:px-6 sm:pb-6">{readiness}</div>}
      {/* What holds the robot back and whether it can be fixed in time; empty (and no gap) when nothing does. */}
      {repairs && <div className="px-5 pb-5 empty:hidden sm:px-6 sm:pb-6">{repairs}</div>}
      {/* Empty for a team that does not track batteries: then no gap either. */}
      {battery && <div className="px-5 pb-5 empty:hidden sm:px-6 sm:pb-6">{battery}</div>}
      <div className="flex flex-wrap items-center gap-3 border-t border-line px-5 py-4 text-lg sm:px-6">
        <span className="font-semibold text-ink-muted">Turnaround before it:</span>
        {match.turnaroundMinutes === null ? (
          <span>our first match</span>
        ) : (
          <span className="font-bold tabular-nums">{formatMinutes(match.turnaroundMinutes)}</span>
        )}
        {match.tight && (
          <StatusTag tone="danger" icon={<AlertIcon className="size-4" />}>
            Tight
          </StatusTag>
        )}
      </div>
    </article>
  );
}
