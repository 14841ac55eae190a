import type { RepairChangeJson } from '@shared/schemas/repairs';
import { FIELD_LABELS, formatValue, formatWhen, type Namers, type TicketField } from './repair-format';

// Long texts are named, not quoted: a paragraph in a history line is unreadable.
const LONG_TEXTS = new Set<string>(['description', 'resolutionNote', 'partsUsed']);

function edited(field: string, [before, after]: [unknown, unknown], names: Namers): string {
  const label = (FIELD_LABELS[field as TicketField] ?? field).toLowerCase();
  if (LONG_TEXTS.has(field)) {
    const empty = (value: unknown) => value === null || value === '' || (Array.isArray(value) && value.length === 0);
    if (empty(before)) return `wrote the ${label}`;
    if (empty(after)) return `cleared the ${label}`;
    return `changed the ${label}`;
  }
  const from = formatValue(field as TicketField, before, names);
  const to = formatValue(field as TicketField, after, names);
  return field === 'title' ? `renamed it from ‘${from}’ to ‘${to}’` : `changed the ${label} from ${from} to ${to}`;
}

/** One line of history in words, without the name and time: "moved it from Reported to In progress". */
export function describeChange(change: RepairChangeJson, names: Namers): string {
  const changes = change.changes ?? {};
  switch (change.kind) {
    case 'created':
      return 'reported it';
    case 'moved': {
      const [from, to] = changes.status ?? [null, null];
      return `moved it from ${formatValue('status', from, names)} to ${formatValue('status', to, names)}`;
    }
    case 'placed':
      return 'placed it by hand';
    case 'assigned': {
      const [, to] = changes.assigneeId ?? [null, null];
      return to === null ? 'took the assignee off' : `assigned it to ${formatValue('assigneeId', to, names)}`;
    }
    case 'edited': {
      const parts = Object.entries(changes).map(([field, pair]) => edited(field, pair, names));
      return parts.length > 0 ? parts.join('; ') : 'edited it';
    }
    case 'photo_added':
      return 'added a photo';
    case 'photo_removed':
      return 'removed a photo';
    default:
      return 'changed it';
  }
}

/** Who did what to a ticket and when, newest first, in the event's time zone. */
export function RepairHistory({ history, names, timeZone, now }: { history: RepairChangeJson[]; names: Namers; timeZone: string; now: Date }) {
  return (
    <section aria-labelledby="repair-history-title" className="flex flex-col gap-3">
      <h2 id="repair-history-title" className="text-2xl font-bold">
        History
      </h2>
      {history.length === 0 ? (
        <p className="text-ink-muted">Nothing recorded yet.</p>
      ) : (
        <ol className="flex flex-col divide-y divide-line rounded-2xl border border-line bg-surface px-4">
          {history.map((change) => (
            <li key={change.id} className="py-3 break-words">
              <span className="font-semibold">{change.by.displayName}</span> {describeChange(change, names)}
              <span className="text-ink-muted tabular-nums"> · {formatWhen(change.at, timeZone, now)}</span>
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
