import { useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import type { BatteryJson, ChargerJson, ChargingSessionJson } from '@shared/schemas/batteries';
import { Button } from '../../../../components/ui/button';
import { TakeOutIcon } from '../../../../components/ui/action-icons';
import { BoltIcon } from '../battery-icons';
import { Countdown } from '../../../../components/ui/countdown';
import { ErrorNotice } from '../../../../components/ui/error-notice';
import { SelectField } from '../../../../components/ui/field';
import { CheckIcon, PlusIcon } from '../../../../components/ui/icons';
import { RelativeTime } from '../../../../components/ui/relative-time';
import { StatusTag } from '../../../../components/ui/status-tag';
import { formatZonedTime } from '../../../../lib/dates';
import { newId } from '../../../../lib/new-id';
import { useEndCharging } from '../../api/end-charging';
import { useStartCharging } from '../../api/start-charging';
import { bayName } from './bays';

/** When the charge should be done: a countdown (the server's clock) and the wall-clock time. */
function DoneBy({ session, timeZone, now }: { session: ChargingSessionJson; timeZone: string; now: Date }) {
  // The server sets it for every session it starts; a session from before it did has none.
  if (!session.expectedEndAt) return <p className="text-ink-muted">Done time not known</p>;
  const done = Date.parse(session.expectedEndAt) <= now.getTime();
  return (
    <div className="flex flex-col">
      {done ? (
        <StatusTag tone="ok" icon={<CheckIcon className="size-4" />}>
          Should be full
        </StatusTag>
      ) : (
        <span className="text-sm font-semibold text-ink-muted">Done</span>
      )}
      <span className="text-3xl leading-tight font-extrabold">
        <Countdown target={session.expectedEndAt} now={now} />
      </span>
      <span className="font-semibold tabular-nums">at {formatZonedTime(new Date(session.expectedEndAt), timeZone, false)}</span>
    </div>
  );
}

function OnBay({ battery, session, canManage, timeZone, now }: { battery: BatteryJson; session: ChargingSessionJson; canManage: boolean; timeZone: string; now: Date }) {
  const end = useEndCharging();
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-x-6 gap-y-3">
        <div className="flex min-w-0 flex-col">
          <Link to={`/batteries/${battery.id}`} className="flex items-center gap-2 text-3xl font-extrabold underline-offset-4 hover:underline">
            <BoltIcon className="size-7 text-accent-ink" />
            <span className="sr-only">Battery </span>
            {battery.label}
          </Link>
          <span className="text-ink-muted">
            On since <span className="tabular-nums">{formatZonedTime(new Date(session.startedAt), timeZone, false)}</span> (<RelativeTime at={session.startedAt} now={now} />)
          </span>
        </div>
        <DoneBy session={session} timeZone={timeZone} now={now} />
      </div>
      {canManage && (
        <Button variant="secondary" icon={<TakeOutIcon />} pending={end.isPending} onClick={() => end.mutate(session.id)} className="self-start">
          Take it off<span className="sr-only"> (battery {battery.label})</span>
        </Button>
      )}
      {end.isError && <ErrorNotice title={`${battery.label} is still on the charger`} error={end.error} />}
    </div>
  );
}

function PutOn({ charger, bay, candidates, onCancel }: { charger: ChargerJson; bay: number; candidates: BatteryJson[]; onCancel: () => void }) {
  const start = useStartCharging();
  // One id per form, kept through failed attempts: a resend finds the session instead of adding one.
  const [id] = useState(newId);
  const [batteryId, setBatteryId] = useState(candidates[0]?.id ?? '');

  function submit(event: FormEvent) {
    event.preventDefault();
    start.mutate({ id, batteryId, chargerId: charger.id, bay }, { onSuccess: onCancel });
  }

  if (candidates.length === 0) {
    return (
      <div className="flex flex-wrap items-center gap-3">
        <p className="text-ink-muted">No battery can go on: each one is charging, in the robot or retired.</p>
        <Button variant="secondary" onClick={onCancel}>
          Close
        </Button>
      </div>
    );
  }
  return (
    <form noValidate onSubmit={submit} aria-label={`Put a battery on ${bayName(charger, bay)}`} className="flex flex-col gap-3 rounded-xl bg-sunken p-3">
      <SelectField label="Battery" value={batteryId} onChange={(event) => setBatteryId(event.target.value)}>
        {candidates.map((battery) => (
          <option key={battery.id} value={battery.id}>
            {battery.label}
            {battery.status === 'spent' ? ' (spent)' : battery.status === 'resting' ? ' (resting)' : ''}
          </option>
        ))}
      </SelectField>
      {start.isError && <ErrorNotice title="Not put on" error={start.error} />}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" icon={<BoltIcon />} pending={start.isPending}>
          Put it on
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/** One bay of a charger: what is on it and when it is done, or a way to put a battery on. */
export function BayRow({ charger, bay, battery, candidates, canManage, timeZone, now }: {
  charger: ChargerJson;
  bay: number;
  battery: BatteryJson | undefined;
  /** Batteries that may go on a bay now. */
  candidates: BatteryJson[];
  canManage: boolean;
  timeZone: string;
  now: Date;
}) {
  const [choosing, setChoosing] = useState(false);
  const session = battery?.charging;
  return (
    <li className="grid gap-x-4 gap-y-2 py-4 sm:grid-cols-[5rem_1fr]" aria-label={bayName(charger, bay)}>
      <p className="text-lg font-bold text-ink-muted">Bay {bay}</p>
      {battery && session ? (
        <OnBay battery={battery} session={session} canManage={canManage} timeZone={timeZone} now={now} />
      ) : choosing ? (
        <PutOn charger={charger} bay={bay} candidates={candidates} onCancel={() => setChoosing(false)} />
      ) : (
        <div className="flex flex-wrap items-center justify-between gap-3">
          <p className="text-lg text-ink-muted">Empty</p>
          {canManage && (
            <Button variant="secondary" icon={<PlusIcon />} onClick={() => setChoosing(true)}>
              Put a battery on<span className="sr-only"> ({bayName(charger, bay)})</span>
            </Button>
          )}
        </div>
      )}
    </li>
  );
}
