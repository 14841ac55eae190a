import { TZDate } from '@date-fns/tz';
import { differenceInCalendarDays, format, parseISO } from 'date-fns';

/** Where the venue's today falls against the event's days: "Starts in 3 days", "Day 2 of 3", "Finished". */
export function eventProgress(now: Date, timeZone: string, startDate: string, endDate: string): string {
  const today = parseISO(format(new TZDate(now, timeZone), 'yyyy-MM-dd'));
  const start = parseISO(startDate);
  const end = parseISO(endDate);
  const untilStart = differenceInCalendarDays(start, today);
  if (untilStart > 1) return `Starts in ${untilStart} days`;
  if (untilStart === 1) return 'Starts tomorrow';
  if (differenceInCalendarDays(today, end) > 0) return 'Finished';
  const total = differenceInCalendarDays(end, start) + 1;
  return `Day ${differenceInCalendarDays(today, start) + 1} of ${total}`;
}
