import { formatDuration } from '../../lib/match-labels';

/** "in 12:04" before the instant, "4:10 ago" after it; tabular so the digits stand still. */
export function Countdown({ target, now }: { target: string; now: Date }) {
  const left = Date.parse(target) - now.getTime();
  const duration = formatDuration(left);
  // Not a live region: a per-second announcement would drown a screen reader; the time is read on focus.
  return (
    <span className="tabular-nums">
      {left >= 0 ? (
        <>
          <span className="text-[0.6em] font-semibold">in </span>
          {duration}
        </>
      ) : (
        <>
          {duration}
          <span className="text-[0.6em] font-semibold"> ago</span>
        </>
      )}
    </span>
  );
}
