import type { ReactNode } from 'react';
import { CheckIcon, OfflineIcon } from '../../../components/ui/icons';
import { isApiError } from '../../../lib/api-client';
import { useServerNow } from '../../../lib/server-clock';
import { useScreenBoard } from '../api/get-screen-board';
import { useScreenSocket, type ScreenLiveStatus } from '../hooks/use-screen-socket';
import { ScreenClock } from './screen-clock';
import { ScreenLaterMatches } from './screen-later-matches';
import { ScreenNextMatch } from './screen-next-match';

// How many of our matches after the next one fit under it on a 1080p TV.
const LATER_SHOWN = 3;

/** Dark and big on purpose: a TV across a loud pit. Near-white on near-black reads at AAA. */
function Frame({ children }: { children: ReactNode }) {
  return <main className="min-h-dvh bg-neutral-950 px-12 py-6 text-neutral-50 [color-scheme:dark]">{children}</main>;
}

function Message({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <Frame>
      <div className="flex min-h-[80dvh] flex-col items-center justify-center gap-6 text-center">
        <h1 className="max-w-5xl text-6xl leading-tight font-black">{title}</h1>
        {children && <p className="max-w-4xl text-3xl text-neutral-300">{children}</p>}
      </div>
    </Frame>
  );
}

/** Live or reconnecting: icon + word + colour, small in a corner. */
function LiveIndicator({ status }: { status: ScreenLiveStatus }) {
  return status === 'live' ? (
    <p className="inline-flex items-center gap-2 text-xl font-bold text-emerald-300">
      <CheckIcon className="size-6" /> Live
    </p>
  ) : (
    <p className="inline-flex items-center gap-2 text-xl font-bold text-amber-300">
      <OfflineIcon className="size-6" /> Reconnecting…
    </p>
  );
}

/** The pit screen at /screen/:token: read-only, no sign-in, updating live. */
export function PitScreenPage({ token }: { token: string }) {
  const board = useScreenBoard(token);
  const status = useScreenSocket(token);
  const now = useServerNow(1000);

  // A revoked token answers 404 even when an older answer is still cached: stop showing it.
  if (isApiError(board.error) && board.error.status === 404) {
    return <Message title="This screen link was revoked or is wrong — ask a mentor for a new one" />;
  }
  if (board.isPending) return <Message title="Opening the pit screen…" />;
  if (board.isError) {
    return <Message title="Cannot reach the Pitwright server">Trying again by itself. Check the Wi-Fi of this screen.</Message>;
  }

  const { team, event, timeline, matches, readiness } = board.data;
  const ours = timeline?.ourMatches ?? [];
  const [next, ...later] = ours;
  let body: ReactNode;
  if (!event || !timeline) {
    body = <p className="text-5xl font-bold text-neutral-300">No current event yet.</p>;
  } else if (timeline.matches.length === 0) {
    body = <p className="text-5xl font-bold text-neutral-300">No matches yet — the schedule appears here once a lead imports it.</p>;
  } else if (!next) {
    body = <p className="text-5xl font-bold text-neutral-300">{timeline.matches.some((m) => m.ours) ? 'All our matches are played.' : `Team ${team.number} is not in this schedule.`}</p>;
  } else {
    body = (
      <div className="flex flex-col gap-6">
        <ScreenNextMatch
          match={next}
          teams={matches?.find((match) => match.id === next.matchId)}
          teamNumber={event.teamNumber}
          timeZone={event.timeZone}
          now={now}
          readiness={readiness}
        />
        {later.length > 0 && <ScreenLaterMatches matches={later.slice(0, LATER_SHOWN)} timeZone={event.timeZone} />}
      </div>
    );
  }

  return (
    <Frame>
      <header className="mb-6 flex items-start justify-between gap-8 border-b border-neutral-700 pb-4">
        <div className="min-w-0">
          <h1 className="text-5xl leading-tight font-black">
            <span className="tabular-nums">{team.number}</span> {team.name}
          </h1>
          <div className="mt-2 flex flex-wrap items-center gap-6">
            {event && <p className="text-3xl font-semibold text-neutral-200">{event.name}</p>}
            <LiveIndicator status={status} />
          </div>
        </div>
        {event && <ScreenClock now={now} timeZone={event.timeZone} />}
      </header>
      {body}
    </Frame>
  );
}
