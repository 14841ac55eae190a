import { useState } from 'react';
import { Button, LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { PencilIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { isApiError } from '../../../lib/api-client';
import { useCan } from '../../../lib/authorization';
import { useServerNow } from '../../../lib/server-clock';
import { useBattery } from '../api/get-battery';
import { useBatterySettings } from '../api/get-battery-settings';
import { BatteryCautions } from './battery-cautions';
import { BatteryFacts } from './battery-facts';
import { BatteryStatusControl } from './battery-status-control';
import { BatteryTrends } from './battery-trends';
import { EditBatteryForm } from './edit-battery-form';
import { LogReadingForm } from './log-reading-form';
import { ReadingsList } from './readings-list';

/**
 * One battery. A QR label leads here with the analyzer in hand, so logging a reading comes
 * first (after the cautions); then its state and health, the trends and every reading.
 */
export function BatteryPage({ batteryId }: { batteryId: string }) {
  const battery = useBattery(batteryId);
  const settings = useBatterySettings();
  const canManage = useCan('batteries:manage');
  const canSwap = useCan('batteries:swap');
  const [editing, setEditing] = useState(false);
  const now = useServerNow(30_000);

  if (battery.isPending) return <Loading label="Loading the battery" />;
  if (battery.isError) {
    return (
      <div className="flex flex-col items-start gap-4">
        {isApiError(battery.error) && battery.error.status === 404 ? (
          <p className="text-lg">This battery is not in your team&apos;s fleet. Its label may belong to another team, or it was added under another.</p>
        ) : (
          <ErrorNotice title="Could not load the battery" error={battery.error} onRetry={() => battery.refetch()} retrying={battery.isFetching} />
        )}
        <LinkButton to="/batteries" variant="secondary">
          All batteries
        </LinkButton>
      </div>
    );
  }

  const data = battery.data;
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title={`Battery ${data.label}`}
        actions={
          <LinkButton to="/batteries" variant="secondary">
            All batteries
          </LinkButton>
        }
      />
      <BatteryCautions />
      {canSwap && <LogReadingForm key={data.id} battery={data} />}
      {settings.isError && <ErrorNotice title="Could not load the team's battery settings" error={settings.error} onRetry={() => settings.refetch()} retrying={settings.isFetching} />}
      {editing ? (
        <EditBatteryForm battery={data} onDone={() => setEditing(false)} />
      ) : (
        <BatteryFacts
          battery={data}
          settings={settings.data}
          now={now}
          actions={
            canManage && (
              <div className="flex flex-wrap items-start gap-3 border-t border-line pt-4">
                <BatteryStatusControl battery={data} />
                <Button variant="secondary" icon={<PencilIcon className="size-5" />} onClick={() => setEditing(true)}>
                  Edit details
                </Button>
              </div>
            )
          }
        />
      )}
      <BatteryTrends readings={data.readings} health={data.health} settings={settings.data} />
      <ReadingsList readings={data.readings} now={now} />
    </div>
  );
}
