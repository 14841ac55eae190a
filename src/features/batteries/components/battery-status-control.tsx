import { useState } from 'react';
import type { BatteryStatus } from '@shared/domain/battery-state';
import type { BatteryJson } from '@shared/schemas/batteries';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { UndoIcon } from '../../../components/ui/icons';
import { StaleNotice } from '../../../components/ui/stale-notice';
import { staleBattery, useUpdateBattery } from '../api/update-battery';
import { RetiredIcon } from './battery-icons';
import { BatteryStatusTag } from './battery-tags';

// Back from retirement its charge is unknown: "resting" until a reading says how full it is.
const RETURNED_STATUS: BatteryStatus = 'resting';

/**
 * Retire a battery (asked first: it leaves the rotation plan and the reading picker) or return
 * a retired one to service. Only for those who manage batteries; the caller checks.
 */
export function BatteryStatusControl({ battery }: { battery: BatteryJson }) {
  const update = useUpdateBattery(battery.id);
  const [asking, setAsking] = useState(false);
  const [wanted, setWanted] = useState<BatteryStatus | null>(null);
  const theirs = staleBattery(update.error);

  function send(status: BatteryStatus, version: number) {
    setWanted(status);
    update.mutate({ status, version }, { onSuccess: () => setAsking(false) });
  }

  const retired = battery.status === 'retired';
  return (
    <div className="flex flex-col gap-3">
      {retired ? (
        <Button variant="secondary" icon={<UndoIcon className="size-5" />} pending={update.isPending} onClick={() => send(RETURNED_STATUS, battery.version)}>
          Return to service
        </Button>
      ) : (
        <Button
          variant="secondary"
          icon={<RetiredIcon className="size-5" />}
          onClick={() => {
            update.reset();
            setAsking(true);
          }}
        >
          Retire this battery…
        </Button>
      )}
      {theirs && wanted ? (
        // Both meant the same: nothing to choose, the refetch shows it.
        theirs.status !== wanted && (
          <StaleNotice
            what="this battery"
            intro={`You wanted to ${wanted === 'retired' ? 'retire it' : 'return it to service'}; this is how they left it.`}
            pending={update.isPending}
            onKeepMine={() => send(wanted, theirs.version)}
            onTakeTheirs={() => update.reset()}
          >
            <p className="flex flex-wrap items-center gap-2">
              Status now: <BatteryStatusTag status={theirs.status} />
            </p>
          </StaleNotice>
        )
      ) : (
        !asking && update.isError && <ErrorNotice title="Not changed" error={update.error} />
      )}
      <Dialog
        open={asking && !theirs}
        title={`Retire battery ${battery.label}?`}
        onClose={() => setAsking(false)}
        actions={
          <>
            <Button variant="secondary" onClick={() => setAsking(false)}>
              Keep it in service
            </Button>
            <Button variant="danger" pending={update.isPending} onClick={() => send('retired', battery.version)}>
              Retire {battery.label}
            </Button>
          </>
        }
      >
        <p className="text-lg">
          A retired battery is never planned into a match and is left out of the reading picker. Its readings stay, and it can be returned to service later.
        </p>
        {update.isError && <ErrorNotice title="Not retired" error={update.error} />}
      </Dialog>
    </div>
  );
}
