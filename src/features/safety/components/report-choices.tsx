import { INCIDENT_KINDS, INCIDENT_LOCATIONS, type IncidentKind, type IncidentLocation } from '@shared/domain/incident-classification';
import { KIND_LABELS, LOCATION_LABELS } from '@shared/schemas/incidents';
import { ChoiceGroup, ChoiceRadio } from '../../../components/ui/choice-radio';

/** A battery as the report names it (from the batteries feature, through the route). */
export interface IncidentBattery {
  id: string;
  label: string;
}

interface ChoicesProps<T extends string> {
  value: T | '';
  onChange: (value: T) => void;
  error?: string;
}

export function LocationChoices({ value, onChange, error }: ChoicesProps<IncidentLocation>) {
  return (
    <ChoiceGroup legend="Where did it happen?" error={error} className="grid grid-cols-2 gap-2 sm:grid-cols-3">
      {INCIDENT_LOCATIONS.map((location) => (
        <ChoiceRadio key={location} name="location" value={location} checked={value === location} onChange={() => onChange(location)}>
          {LOCATION_LABELS[location]}
        </ChoiceRadio>
      ))}
    </ChoiceGroup>
  );
}

export function KindChoices({ value, onChange, error }: ChoicesProps<IncidentKind>) {
  return (
    <ChoiceGroup legend="What kind of incident?" error={error} className="grid gap-2 sm:grid-cols-2">
      {INCIDENT_KINDS.map((kind) => (
        <ChoiceRadio key={kind} name="kind" value={kind} checked={value === kind} onChange={() => onChange(kind)} className="justify-start text-left">
          {KIND_LABELS[kind]}
        </ChoiceRadio>
      ))}
    </ChoiceGroup>
  );
}

/** Which of the team's batteries it was, by label; "Not one of ours" leaves it unnamed. */
export function BatteryChoices({ batteries, value, onChange, error }: { batteries: IncidentBattery[] | undefined } & ChoicesProps<string>) {
  if (!batteries) return <p className="text-ink-muted">Loading the batteries…</p>;
  return (
    <ChoiceGroup legend="Which battery? (optional)" error={error} hint="Naming it lets the safety captain retire it when closing the report.">
      {batteries.map((battery) => (
        <ChoiceRadio key={battery.id} name="battery" value={battery.id} checked={value === battery.id} onChange={() => onChange(battery.id)} className="min-w-16">
          {battery.label}
        </ChoiceRadio>
      ))}
      <ChoiceRadio name="battery" value="" checked={value === ''} onChange={() => onChange('')}>
        None named
      </ChoiceRadio>
    </ChoiceGroup>
  );
}
