import { useState } from 'react';
import type { TimelineMatchJson } from '@shared/domain/timeline';
import { localDate, localTimeToInstant } from '@shared/domain/event-clock';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import { matchName } from '../../../lib/match-labels';
import { serverNow } from '../../../lib/server-clock';

interface EarlierStartProps {
  match: TimelineMatchJson;
  timeZone: string;
  disabled: boolean;
  onMark: (variables: { matchId: string; startedAt: Date }) => void;
}

/** For a tap that came late: the lead gives the time the match really started, on the venue's clock. */
export function EarlierStart({ match, timeZone, disabled, onMark }: EarlierStartProps) {
  const [time, setTime] = useState('');
  const [problem, setProblem] = useState<string | null>(null);

  function submit() {
    try {
      const now = serverNow();
      let startedAt = localTimeToInstant(localDate(now, timeZone), time, timeZone);
      // Just after midnight, 23:58 means yesterday evening, not tonight.
      if (startedAt > now) startedAt = localTimeToInstant(localDate(new Date(now.getTime() - 24 * 3_600_000), timeZone), time, timeZone);
      setProblem(null);
      onMark({ matchId: match.id, startedAt });
    } catch {
      setProblem('Give the time as HH:MM on the venue clock');
    }
  }

  return (
    <details className="rounded-xl border border-line p-3">
      <summary className="min-h-11 cursor-pointer content-center font-semibold">It started earlier: give the time</summary>
      <div className="mt-3 flex flex-wrap items-end gap-3">
        <label className="flex flex-col gap-1 font-semibold">
          Started at (venue time)
          <input type="time" value={time} onChange={(event) => setTime(event.target.value)} className={`${controlClass} w-40`} />
        </label>
        <Button variant="secondary" disabled={disabled || !time} onClick={submit}>
          Mark {matchName(match.level, match.number)} at {time || '…'}
        </Button>
      </div>
      {problem && <p className="mt-2 font-semibold text-danger">{problem}</p>}
    </details>
  );
}
