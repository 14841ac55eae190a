import { KIND_LABELS, LOCATION_LABELS, type IncidentJson } from '@shared/schemas/incidents';
import { StaleNotice } from '../../../components/ui/stale-notice';
import { formatDay, formatWhen, personLabel, STATUS_LABELS, treatmentsText } from './incident-words';
import type { Conflict } from './use-incident-write';

type Shown = (incident: IncidentJson, timeZone: string) => string;

const followUpsText: Shown = (incident) =>
  incident.followUps.map((item) => `${item.done ? '✓ ' : ''}${item.text} (${item.ownerName}, ${formatDay(item.dueOn)})`).join('; ') || 'None';

// Every field a safety captain can change, as a person reads it.
const FIELDS: [label: string, shown: Shown][] = [
  ['Status', (incident) => STATUS_LABELS[incident.status]],
  ['Closing note', (incident) => incident.closingNote ?? 'None'],
  ['Follow-ups', followUpsText],
  ['When', (incident, timeZone) => formatWhen(incident.occurredAt, timeZone)],
  ['Where', (incident) => LOCATION_LABELS[incident.location]],
  ['Kind', (incident) => KIND_LABELS[incident.kind]],
  ['What happened', (incident) => incident.description],
  ['People involved', (incident) => incident.involved.map(personLabel).join(', ') || 'None'],
  ['Care given', (incident) => treatmentsText(incident.treatments) || 'None'],
  ['What was done straight away', (incident) => incident.immediateActions ?? 'None'],
  ['Battery', (incident) => incident.batteryName ?? 'None'],
];

interface StaleIncidentNoticeProps {
  conflict: Conflict;
  timeZone: string;
  pending: boolean;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
}

/**
 * Someone saved the report while a change was on its way from here: what they changed, and the
 * change asked for here. "Keep mine" makes that change on their version; "Use theirs" drops it.
 */
export function StaleIncidentNotice({ conflict, timeZone, pending, onKeepMine, onTakeTheirs }: StaleIncidentNoticeProps) {
  const changed = FIELDS.filter(([, shown]) => shown(conflict.base, timeZone) !== shown(conflict.theirs, timeZone));
  return (
    <StaleNotice
      what="this report"
      intro={`Your change: ${conflict.edit.what}. Keep mine makes it on their version; their other changes stay.`}
      pending={pending}
      onKeepMine={onKeepMine}
      onTakeTheirs={onTakeTheirs}
      keepMineLabel="Keep mine"
      takeTheirsLabel="Use theirs"
    >
      {changed.length === 0 ? (
        <p>They saved without changing anything shown here.</p>
      ) : (
        <dl className="flex flex-col gap-2 rounded-lg bg-surface p-3">
          {changed.map(([label, shown]) => (
            <div key={label}>
              <dt className="font-semibold">{label}, theirs now</dt>
              <dd className="break-words">{shown(conflict.theirs, timeZone)}</dd>
            </div>
          ))}
        </dl>
      )}
    </StaleNotice>
  );
}
