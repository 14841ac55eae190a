import { useState, type FormEvent } from 'react';
import type { BatteryJson } from '@shared/schemas/batteries';
import { Button } from '../../../../components/ui/button';
import { InstallIcon } from '../../../../components/ui/action-icons';
import { ErrorNotice } from '../../../../components/ui/error-notice';
import { SelectField } from '../../../../components/ui/field';
import { newId } from '../../../../lib/new-id';
import { useRecordUse } from '../../api/record-use';

/** What may go into the robot: not retired, not on a charger, not in it already. */
const installable = (battery: BatteryJson) => battery.status !== 'retired' && battery.status !== 'charging' && battery.status !== 'in_robot';

/**
 * "Install for this match" on our next match: the planned battery is chosen, another may be
 * picked (the crew grabbed a different one). Installing it counts for the match's readiness.
 */
export function InstallForMatch({ matchId, matchLabel, plannedId, batteries }: { matchId: string; matchLabel: string; plannedId: string | undefined; batteries: readonly BatteryJson[] }) {
  const record = useRecordUse();
  // One id per install, kept through failed attempts: a resend finds the use instead of adding one.
  const [id, setId] = useState(newId);
  const candidates = batteries.filter(installable);
  // Follows the plan until someone picks another one by hand.
  const [chosen, setChosen] = useState<string | null>(null);
  const fallback = candidates.some((battery) => battery.id === plannedId) ? plannedId : candidates[0]?.id;
  const batteryId = chosen ?? fallback ?? '';

  function submit(event: FormEvent) {
    event.preventDefault();
    record.mutate({ id, batteryId, matchId }, { onSuccess: () => setId(newId()) });
  }

  if (candidates.length === 0) return <p className="text-ink-muted">No battery can go in: each one is charging, in the robot or retired.</p>;
  return (
    <form noValidate onSubmit={submit} aria-label={`Install a battery for ${matchLabel}`} className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-3">
        <div className="min-w-40 flex-1">
          <SelectField label={`Battery for ${matchLabel}`} value={batteryId} onChange={(event) => setChosen(event.target.value)}>
            {candidates.map((battery) => (
              <option key={battery.id} value={battery.id}>
                {battery.label}
                {battery.id === plannedId ? ' (planned)' : ''}
              </option>
            ))}
          </SelectField>
        </div>
        <Button type="submit" size="lg" icon={<InstallIcon />} pending={record.isPending}>
          Install for this match
        </Button>
      </div>
      {record.isError && <ErrorNotice title="Not installed" error={record.error} />}
    </form>
  );
}
