import { zonedClock } from '../../../lib/dates';

/** The wall clock at the venue, big and tabular, read across the pit. */
export function ScreenClock({ now, timeZone }: { now: Date; timeZone: string }) {
  const { time, dayPeriod } = zonedClock(now, timeZone);
  return (
    <p className="text-right">
      <span className="block text-xl font-bold tracking-widest text-neutral-300 uppercase">Venue time</span>
      {/* Not a live region: announcing every second would drown a screen reader. */}
      <time dateTime={now.toISOString()} className="text-6xl leading-none font-black whitespace-nowrap tabular-nums">
        {time}
        {dayPeriod && <span className="ml-3 text-[0.45em]">{dayPeriod}</span>}
      </time>
    </p>
  );
}
