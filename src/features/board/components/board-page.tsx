import type { ReactNode } from 'react';
import type { EventJson } from '@shared/schemas/events';
import { LinkButton } from '../../../components/ui/button';
import { CalendarIcon, PlusIcon, WrenchIcon } from '../../../components/ui/icons';
import { useCan } from '../../../lib/authorization';
import { CurrentEventCard } from './current-event-card';

function NoCurrentEvent({ hasEvents }: { hasEvents: boolean }) {
  const canManage = useCan('events:manage');
  return (
    <section
      aria-labelledby="no-event-title"
      className="flex flex-col items-center gap-4 rounded-3xl border-2 border-dashed border-line-strong bg-surface px-6 py-12 text-center"
    >
      <CalendarIcon className="size-12 text-accent-ink" />
      <h2 id="no-event-title" className="text-3xl font-bold">
        No current event
      </h2>
      <p className="max-w-prose text-lg text-ink-muted">
        {canManage
          ? 'Tell Pitwright which event the team is at, and the board shows it here with the local time at the venue.'
          : 'Once a mentor picks the event the team is at, the board shows it here.'}
      </p>
      {canManage &&
        (hasEvents ? (
          <LinkButton to="/events" size="lg" icon={<CalendarIcon />}>
            Choose the current event
          </LinkButton>
        ) : (
          <LinkButton to="/events/new" size="lg" icon={<PlusIcon />}>
            Create an event
          </LinkButton>
        ))}
    </section>
  );
}

/**
 * The pit board: our next match leads (what the crew acts on), the current event follows. The
 * route fills `nextMatch` from the schedule feature, which this feature must not import.
 */
export function BoardPage({
  currentEvent,
  hasEvents,
  nextMatch,
}: {
  currentEvent: EventJson | null;
  hasEvents: boolean;
  nextMatch?: ReactNode;
}) {
  const canReport = useCan('repairs:work');
  return (
    <div className="flex flex-col gap-6">
      <h1 className="sr-only">Pit board</h1>
      {/* Something broke: one tap from the board to the form (the repairs area's own page). */}
      {currentEvent && canReport && (
        <div className="flex justify-end">
          <LinkButton to="/repairs/new" size="lg" icon={<WrenchIcon />} className="w-full sm:w-auto">
            Report a problem
          </LinkButton>
        </div>
      )}
      {currentEvent && nextMatch}
      {currentEvent ? <CurrentEventCard event={currentEvent} /> : <NoCurrentEvent hasEvents={hasEvents} />}
    </div>
  );
}
