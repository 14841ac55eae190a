import { describeZone, formatZonedDay, zonedClock } from '../../../lib/dates';
import { useNow } from '../../../lib/use-now';

/** The wall clock at the venue, which is what the event's schedule and queue calls are read against. */
export function VenueClock({ timeZone }: { timeZone: string }) {
  const now = useNow(1000);
  const { time, dayPeriod } = zonedClock(now, timeZone);
  return (
    <div className="flex flex-col gap-1">
      <p className="text-sm font-semibold tracking-wide text-ink-muted uppercase">Local time at the venue</p>
      {/* Not a live region: announcing every second would drown a screen reader. */}
      <p className="text-5xl leading-none font-bold whitespace-nowrap tabular-nums min-[420px]:text-6xl sm:text-7xl">
        <time dateTime={now.toISOString()}>
          {time}
          {dayPeriod && <span className="ml-2 text-[0.45em]">{dayPeriod}</span>}
        </time>
      </p>
      <p className="text-lg text-ink-muted tabular-nums">
        {formatZonedDay(now, timeZone)} · <span className="whitespace-nowrap">{describeZone(now, timeZone)}</span>
      </p>
    </div>
  );
}
