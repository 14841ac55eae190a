import type { MatchJson } from '@shared/schemas/schedule';
import { StaleNotice } from '../../../components/ui/stale-notice';
import { formatZonedDay, formatZonedTime } from '../../../lib/dates';
import { matchName } from '../../../lib/match-labels';

interface StaleMatchNoticeProps {
  theirs: MatchJson;
  timeZone: string;
  pending: boolean;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
}

/** Someone saved this match while it was open here: show their version, keep the user's input below. */
export function StaleMatchNotice({ theirs, timeZone, pending, onKeepMine, onTakeTheirs }: StaleMatchNoticeProps) {
  const start = new Date(theirs.scheduledStart);
  return (
    <StaleNotice what="this match" intro="This is what they saved. Your input is still in the form below." pending={pending} onKeepMine={onKeepMine} onTakeTheirs={onTakeTheirs}>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-lg bg-surface p-3 tabular-nums">
        <dt className="font-semibold">Match</dt>
        <dd>{matchName(theirs.level, theirs.number)}</dd>
        <dt className="font-semibold">Scheduled</dt>
        <dd>
          {formatZonedDay(start, timeZone)}, {formatZonedTime(start, timeZone, false)}
        </dd>
        <dt className="font-semibold">RED</dt>
        <dd>{theirs.red.join(' · ')}</dd>
        <dt className="font-semibold">BLUE</dt>
        <dd>{theirs.blue.join(' · ')}</dd>
      </dl>
    </StaleNotice>
  );
}
