import type { MatchJson } from '@shared/schemas/schedule';
import { Button } from '../../../components/ui/button';
import { AlertIcon } from '../../../components/ui/icons';
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
    <div role="alert" className="flex flex-col gap-3 rounded-xl border-2 border-warning bg-warning-soft p-4 text-ink">
      <p className="flex items-center gap-2 text-lg font-bold">
        <AlertIcon className="size-6 text-warning" /> Someone else changed this match
      </p>
      <p>This is what they saved. Your input is still in the form below.</p>
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
      <div className="flex flex-wrap gap-3">
        <Button pending={pending} onClick={onKeepMine}>
          Save mine over theirs
        </Button>
        <Button variant="secondary" onClick={onTakeTheirs}>
          Use their version
        </Button>
      </div>
    </div>
  );
}
