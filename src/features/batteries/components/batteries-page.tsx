import { useState, type ReactNode } from 'react';
import { PrintIcon } from '../../../components/ui/action-icons';
import { Button, LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { PlusIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { useCan } from '../../../lib/authorization';
import { useServerNow } from '../../../lib/server-clock';
import { useBatteries } from '../api/get-batteries';
import { AddBatteryForm } from './add-battery-form';
import { BatteryCautions } from './battery-cautions';
import { BatterySettingsSection } from './battery-settings-section';
import { FleetTable } from './fleet-table';
import { LogReadingForm } from './log-reading-form';

/**
 * The Batteries area: the cautions, logging a reading, the fleet table; then what the app puts
 * below it (charger bays, rotation plan), then the team's settings.
 */
export function BatteriesPage({ children }: { children?: ReactNode }) {
  const batteries = useBatteries();
  const canManage = useCan('batteries:manage');
  const canSwap = useCan('batteries:swap');
  const [adding, setAdding] = useState(false);
  const now = useServerNow(30_000);
  const inService = batteries.data?.filter((battery) => battery.status !== 'retired') ?? [];

  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Batteries"
        description={batteries.isSuccess && `${inService.length} in service${inService.length < batteries.data.length ? `, ${batteries.data.length - inService.length} retired` : ''}`}
        actions={
          <>
            <LinkButton to="/batteries/labels" variant="secondary" icon={<PrintIcon />}>
              Print labels
            </LinkButton>
            {canManage && !adding && (
              <Button icon={<PlusIcon />} onClick={() => setAdding(true)}>
                Add a battery
              </Button>
            )}
          </>
        }
      />
      {adding && <AddBatteryForm onDone={() => setAdding(false)} />}
      <BatteryCautions />
      {batteries.isPending && <Loading label="Loading the batteries" />}
      {batteries.isError && <ErrorNotice title="Could not load the batteries" error={batteries.error} onRetry={() => batteries.refetch()} retrying={batteries.isFetching} />}
      {canSwap && inService.length > 0 && <LogReadingForm batteries={inService} />}
      {batteries.isSuccess && (
        <section aria-labelledby="fleet-title" className="flex flex-col gap-3">
          <h2 id="fleet-title" className="text-2xl font-bold">
            Fleet
          </h2>
          {batteries.data.length > 0 ? (
            <FleetTable batteries={batteries.data} now={now} />
          ) : (
            <p className="text-lg text-ink-muted">
              No batteries yet. {canManage ? 'Add each one with “Add a battery”, by the label painted on it.' : 'A battery handler or mentor adds them.'}
            </p>
          )}
        </section>
      )}
      {children}
      <BatterySettingsSection />
    </div>
  );
}
