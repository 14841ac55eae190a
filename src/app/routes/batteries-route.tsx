import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router';
import type { EventJson } from '@shared/schemas/events';
import { ErrorNotice } from '../../components/ui/error-notice';
import { BatteriesPage } from '../../features/batteries/components/batteries-page';
import { BatteryPage } from '../../features/batteries/components/battery-page';
import { ChargerBays } from '../../features/batteries/components/chargers/charger-bays';
import { BatteryLabelsPage } from '../../features/batteries/components/labels/battery-labels-page';
import { RotationPlan } from '../../features/batteries/components/plan/rotation-plan';
import { useCurrentEvent } from '../../features/events/api/get-events';
import { timelineQueryOptions } from '../../features/schedule/api/get-timeline';

/** The plan reads our matches from the schedule's timeline, which the batteries feature must not import. */
function EventPlan({ event }: { event: EventJson }) {
  // The whole query result goes down as a prop. By default a result re-renders its owner only for
  // the fields read so far, and the plan may read `isPending` only after the timeline arrived:
  // it would wait on a stale copy forever. 'all' re-renders here on every change.
  const timeline = useQuery({ ...timelineQueryOptions(event.id), notifyOnChangeProps: 'all' });
  return <RotationPlan eventId={event.id} timeZone={event.timeZone} timeline={timeline} />;
}

function NoEventPlan() {
  return (
    <section aria-labelledby="rotation-plan-title" className="flex flex-col gap-2">
      <h2 id="rotation-plan-title" className="text-2xl font-bold">
        Rotation plan
      </h2>
      <p className="text-lg text-ink-muted">There is no current event, so there are no matches to plan batteries for.</p>
    </section>
  );
}

/**
 * The Batteries area: the fleet and readings first (they need no event), then the charger bays
 * and the rotation plan, fed with the current event (events feature) and its timeline (schedule).
 */
export function BatteriesRoute() {
  const currentEvent = useCurrentEvent();
  const event = currentEvent.data ?? null;
  return (
    <BatteriesPage>
      <ChargerBays timeZone={event?.timeZone} />
      {currentEvent.isError && (
        <ErrorNotice title="Could not load the current event: the rotation plan needs it" error={currentEvent.error} onRetry={() => currentEvent.refetch()} retrying={currentEvent.isFetching} />
      )}
      {/* Keyed by event: switching events starts the plan afresh. */}
      {event ? <EventPlan key={event.id} event={event} /> : currentEvent.isSuccess && <NoEventPlan />}
    </BatteriesPage>
  );
}

/** One battery: where its QR label leads. Keyed, so moving to another battery starts its page afresh. */
export function BatteryRoute() {
  const { batteryId = '' } = useParams();
  return <BatteryPage key={batteryId} batteryId={batteryId} />;
}

/** Printable labels, one per battery. */
export function BatteryLabelsRoute() {
  return <BatteryLabelsPage />;
}
