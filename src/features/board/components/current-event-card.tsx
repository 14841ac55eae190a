import type { ReactNode } from 'react';
import type { EventJson } from '@shared/schemas/events';
import { CalendarIcon, CurrentIcon, GlobeIcon, PinIcon, RobotIcon } from '../../../components/ui/icons';
import { formatDateRange, readableZone } from '../../../lib/dates';
import { useNow } from '../../../lib/use-now';
import { eventProgress } from './event-progress';
import { VenueClock } from './venue-clock';

function Detail({ icon, label, children }: { icon: ReactNode; label: string; children: ReactNode }) {
  return (
    <div className="flex items-start gap-3">
      <span className="mt-0.5 text-accent-ink">{icon}</span>
      <div>
        <dt className="text-sm font-semibold text-ink-muted">{label}</dt>
        <dd className="text-lg font-semibold break-words">{children}</dd>
      </div>
    </div>
  );
}

export function CurrentEventCard({ event }: { event: EventJson }) {
  const today = useNow(60_000);
  return (
    <article
      aria-labelledby="current-event-name"
      className="overflow-hidden rounded-3xl border border-line bg-surface shadow-sm"
    >
      <div className="flex flex-wrap items-center justify-between gap-2 border-b border-line bg-accent-soft px-6 py-3 text-accent-ink">
        <p className="flex items-center gap-2 font-bold tracking-wide uppercase">
          <CurrentIcon className="size-5" /> Current event
        </p>
        <p className="font-semibold tabular-nums">{eventProgress(today, event.timeZone, event.startDate, event.endDate)}</p>
      </div>
      {/* Side by side on a landscape tablet, where height is short; stacked when width is. */}
      <div className="grid gap-x-8 gap-y-6 p-6 sm:p-8 lg:grid-cols-[1fr_auto] lg:items-center">
        <h2
          id="current-event-name"
          className="text-3xl leading-tight font-extrabold tracking-tight break-words sm:text-4xl lg:col-span-2 lg:text-5xl"
        >
          {event.name}
        </h2>
        <dl className="grid min-w-0 gap-5 sm:grid-cols-2 lg:grid-cols-1 2xl:grid-cols-2">
          <Detail icon={<PinIcon />} label="Venue">
            {event.venue}
          </Detail>
          <Detail icon={<CalendarIcon />} label="Dates">
            {formatDateRange(event.startDate, event.endDate)}
          </Detail>
          <Detail icon={<GlobeIcon />} label="Time zone">
            {readableZone(event.timeZone)}
          </Detail>
          <Detail icon={<RobotIcon />} label="Our team number">
            <span className="tabular-nums">{event.teamNumber}</span>
          </Detail>
        </dl>
        <div className="rounded-2xl bg-sunken p-5 sm:p-6">
          <VenueClock timeZone={event.timeZone} />
        </div>
      </div>
    </article>
  );
}
