import { zoneAbbreviation } from '@shared/domain/event-clock';
import { formatZonedTime } from '../../../lib/dates';

/**
 * A wall-clock time at the venue. The page header names the zone once; a time whose zone
 * abbreviation differs from it (the night the clocks change) carries its own.
 */
export function ZonedTime({ instant, timeZone, headerZone }: { instant: string; timeZone: string; headerZone: string }) {
  const zone = zoneAbbreviation(instant, timeZone);
  return (
    <time dateTime={instant} className="tabular-nums">
      {formatZonedTime(new Date(instant), timeZone, false)}
      {zone !== headerZone && <span className="ml-1 text-[0.75em] font-semibold">{zone}</span>}
    </time>
  );
}
