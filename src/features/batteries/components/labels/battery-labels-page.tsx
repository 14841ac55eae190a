import { useState } from 'react';
import { Button, LinkButton } from '../../../../components/ui/button';
import { PrintIcon } from '../../../../components/ui/action-icons';
import { Checkbox } from '../../../../components/ui/checkbox';
import { ErrorNotice } from '../../../../components/ui/error-notice';
import { BatteryIcon } from '../../../../components/ui/icons';
import { Loading } from '../../../../components/ui/loading';
import { PageHeader } from '../../../../components/ui/page-header';
import { useViewer } from '../../../../lib/authorization';
import { useBatteries } from '../../api/get-batteries';
import { BatteryLabel } from './battery-label';

/**
 * Printable labels, one per battery in service (retired ones on request), two across on paper.
 * When printing only the labels show: the app's header and navigation hide themselves.
 */
export function BatteryLabelsPage() {
  const batteries = useBatteries();
  const { membership } = useViewer();
  const [includeRetired, setIncludeRetired] = useState(false);
  const shown = (batteries.data ?? []).filter((battery) => includeRetired || battery.status !== 'retired');
  const retiredCount = (batteries.data ?? []).length - (batteries.data ?? []).filter((battery) => battery.status !== 'retired').length;

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-col gap-4 print:hidden">
        <PageHeader
          title="Battery labels"
          description="Its label in large type, our team number and a code that opens the battery's page on a phone, for a quick reading."
          actions={
            <>
              <LinkButton to="/batteries" variant="secondary" icon={<BatteryIcon />}>
                Batteries
              </LinkButton>
              <Button icon={<PrintIcon />} onClick={() => window.print()} disabled={shown.length === 0}>
                Print
              </Button>
            </>
          }
        />
        {retiredCount > 0 && (
          <Checkbox
            label={`Include retired batteries (${retiredCount})`}
            checked={includeRetired}
            onChange={(event) => setIncludeRetired(event.target.checked)}
            className="self-start"
          />
        )}
      </div>
      {batteries.isPending && <Loading label="Loading the batteries" />}
      {batteries.isError && <ErrorNotice title="Could not load the batteries" error={batteries.error} onRetry={() => batteries.refetch()} retrying={batteries.isFetching} />}
      {batteries.isSuccess &&
        (shown.length === 0 ? (
          <p className="text-lg text-ink-muted">No battery to label yet: add the fleet first.</p>
        ) : (
          <ul aria-label="Labels" className="grid gap-4 md:grid-cols-2 print:grid-cols-2 print:gap-3">
            {shown.map((battery) => (
              <BatteryLabel key={battery.id} battery={battery} teamNumber={membership.teamNumber} />
            ))}
          </ul>
        ))}
    </div>
  );
}
