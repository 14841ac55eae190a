import type { EventJson } from '@shared/schemas/events';
import { StaleNotice } from '../../../components/ui/stale-notice';
import { formatDateRange, readableZone } from '../../../lib/dates';
import type { EventFormValues } from './event-form';

const LABELS: Record<keyof EventFormValues, string> = {
  name: 'Event name',
  venue: 'Venue',
  timeZone: 'Time zone',
  startDate: 'First day',
  endDate: 'Last day',
  teamNumber: 'Team number',
};

function shown(field: keyof EventFormValues, event: EventJson): string {
  if (field === 'timeZone') return readableZone(event.timeZone);
  if (field === 'startDate' || field === 'endDate') return formatDateRange(event[field], event[field]);
  return String(event[field]);
}

interface StaleEventNoticeProps {
  theirs: EventJson;
  mine: EventFormValues;
  pending: boolean;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
}

/** Someone saved this event after it was opened here: show their values beside the user's, lose neither. */
export function StaleEventNotice({ theirs, mine, pending, onKeepMine, onTakeTheirs }: StaleEventNoticeProps) {
  const fields = (Object.keys(LABELS) as (keyof EventFormValues)[]).filter(
    (field) => String(theirs[field]) !== mine[field].trim(),
  );
  return (
    <StaleNotice
      what="this event"
      intro="Their version was saved while you were editing. Your input is still in the form below."
      pending={pending}
      onKeepMine={onKeepMine}
      onTakeTheirs={onTakeTheirs}
    >
      {fields.length > 0 ? (
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-lg bg-surface p-3">
          {fields.map((field) => (
            <div key={field} className="contents">
              <dt className="font-semibold">{LABELS[field]}</dt>
              <dd className="break-words">{shown(field, theirs)}</dd>
            </div>
          ))}
        </dl>
      ) : (
        <p>Their values match what you typed.</p>
      )}
    </StaleNotice>
  );
}
