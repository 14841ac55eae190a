import type { EventJson } from '@shared/schemas/events';
import { Button, LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { CalendarIcon, CurrentIcon, GlobeIcon, PencilIcon, PinIcon, RobotIcon } from '../../../components/ui/icons';
import { StatusTag } from '../../../components/ui/status-tag';
import { formatDateRange, readableZone } from '../../../lib/dates';
import { useUpdateEvent } from '../api/update-event';

export function EventListItem({ event, canManage }: { event: EventJson; canManage: boolean }) {
  const update = useUpdateEvent();
  return (
    <li
      className={`flex flex-col gap-3 rounded-2xl border bg-surface p-5 ${
        event.current ? 'border-accent border-l-8' : 'border-line'
      }`}
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <h2 className="text-xl font-bold break-words">{event.name}</h2>
        {event.current && (
          <StatusTag tone="accent" icon={<CurrentIcon className="size-4" />}>
            Current event
          </StatusTag>
        )}
      </div>
      <ul className="grid gap-x-6 gap-y-1.5 text-ink-muted sm:grid-cols-2">
        <li className="flex items-center gap-2">
          <PinIcon className="size-5" />
          {event.venue}
        </li>
        <li className="flex items-center gap-2">
          <CalendarIcon className="size-5" />
          {formatDateRange(event.startDate, event.endDate)}
        </li>
        <li className="flex items-center gap-2">
          <GlobeIcon className="size-5" />
          {readableZone(event.timeZone)}
        </li>
        <li className="flex items-center gap-2 tabular-nums">
          <RobotIcon className="size-5" />
          Team {event.teamNumber}
        </li>
      </ul>
      {update.isError && <ErrorNotice title="Could not make it current" error={update.error} />}
      {canManage && (
        <div className="flex flex-wrap gap-3 pt-1">
          <LinkButton
            to={`/events/${event.id}/edit`}
            variant="secondary"
            icon={<PencilIcon className="size-5" />}
            aria-label={`Edit ${event.name}`}
          >
            Edit
          </LinkButton>
          {!event.current && (
            <Button
              variant="secondary"
              icon={<CurrentIcon className="size-5" />}
              pending={update.isPending}
              onClick={() => update.mutate({ id: event.id, current: true })}
              aria-label={`Make current: ${event.name}`}
            >
              Make current
            </Button>
          )}
        </div>
      )}
    </li>
  );
}
