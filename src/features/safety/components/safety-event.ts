import { useSearchParams } from 'react-router';
import { INCIDENT_STATUSES, type IncidentStatus } from '@shared/schemas/incidents';
import { deviceTimeZone } from '../../../lib/dates';
import type { IncidentFilter } from '../api/incidents-cache';

/** An event as the safety area names it (from the events feature, through the route). */
export interface SafetyEvent {
  id: string;
  name: string;
  timeZone: string;
  current: boolean;
}

/**
 * The log's filter, kept in the address so the print view and a reload show the same incidents:
 * the current event's by default (every event's when there is none).
 */
export function useLogFilter(events: SafetyEvent[]): [IncidentFilter, (filter: IncidentFilter) => void] {
  const [params, setParams] = useSearchParams();
  const current = events.find((event) => event.current);
  const asked = params.get('eventId');
  const eventId = asked === 'all' || events.some((event) => event.id === asked) ? (asked as string) : (current?.id ?? 'all');
  const status = params.get('status');
  const filter: IncidentFilter = { eventId, ...(INCIDENT_STATUSES.includes(status as IncidentStatus) ? { status: status as IncidentStatus } : {}) };
  const setFilter = (next: IncidentFilter) => {
    const search = new URLSearchParams({ eventId: next.eventId });
    if (next.status) search.set('status', next.status);
    setParams(search, { replace: true });
  };
  return [filter, setFilter];
}

/** "Fenwick Valley Qualifier" or "Every event". */
export const filterEventName = (events: SafetyEvent[], eventId: string) => (eventId === 'all' ? 'Every event' : (events.find((event) => event.id === eventId)?.name ?? 'This event'));

/** Whose clock a report is read on: its event's, else this device's (a report outside any event). */
export const timeZoneIn =
  (events: SafetyEvent[] | undefined) =>
  (eventId: string | null): string =>
    events?.find((event) => event.id === eventId)?.timeZone ?? deviceTimeZone();
