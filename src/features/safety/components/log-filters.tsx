import type { IncidentStatus } from '@shared/schemas/incidents';
import { ChoiceGroup, ChoiceRadio } from '../../../components/ui/choice-radio';
import { SelectField } from '../../../components/ui/field';
import type { IncidentFilter } from '../api/incidents-cache';
import type { SafetyEvent } from './safety-event';

const STATUS_CHOICES: { value: IncidentStatus | undefined; label: string }[] = [
  { value: undefined, label: 'All' },
  { value: 'open', label: 'Open' },
  { value: 'closed', label: 'Closed' },
];

/** Which event's incidents, and which status. */
export function LogFilters({ events, filter, onChange }: { events: SafetyEvent[]; filter: IncidentFilter; onChange: (filter: IncidentFilter) => void }) {
  return (
    <div className="grid items-end gap-4 sm:grid-cols-[minmax(0,1fr)_auto]">
      <SelectField label="Event" value={filter.eventId} onChange={(event) => onChange({ ...filter, eventId: event.target.value })}>
        {events.map((event) => (
          <option key={event.id} value={event.id}>
            {event.name}
            {event.current ? ' (current)' : ''}
          </option>
        ))}
        <option value="all">Every event</option>
      </SelectField>
      <ChoiceGroup legend="Status" className="flex gap-2">
        {STATUS_CHOICES.map((choice) => (
          <ChoiceRadio key={choice.label} name="status" checked={filter.status === choice.value} onChange={() => onChange({ ...filter, status: choice.value })}>
            {choice.label}
          </ChoiceRadio>
        ))}
      </ChoiceGroup>
    </div>
  );
}
