import { useState, type FormEvent } from 'react';
import { SOC_TABLE_LABELS, SOC_TABLES, type BatterySettings, type SocTableName } from '@shared/domain/battery-state';
import { Button } from '../../../components/ui/button';
import { ChoiceGroup, ChoiceRadio } from '../../../components/ui/choice-radio';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { TextField } from '../../../components/ui/field';
import { PencilIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { useCan } from '../../../lib/authorization';
import { mergeFieldErrors, type FieldErrors } from '../../../lib/form-errors';
import { useBatterySettings } from '../api/get-battery-settings';
import { useUpdateBatterySettings } from '../api/update-battery-settings';
import { defaultOf, NUMBER_SETTINGS, readSettings, settingsValuesOf, type SettingsValues } from './settings-values';

const SOC_TABLE_SOURCES: Record<SocTableName, string> = {
  bci: 'As quoted in Battery FAQ (B. Darden): a flooded battery at 26.7 °C. The default.',
  army: 'Its voltage test (§5-9), a little lower at each step.',
};

const shownValue = (settings: BatterySettings, field: (typeof NUMBER_SETTINGS)[number]) => {
  const value = settings[field.field];
  return value === null ? 'no limit' : `${value}${field.unit ? ` ${field.unit}` : ''}`;
};

function SettingsForm({ settings, onDone }: { settings: BatterySettings; onDone: () => void }) {
  const update = useUpdateBatterySettings();
  const [values, setValues] = useState<SettingsValues>(() => settingsValuesOf(settings));
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const errors = mergeFieldErrors(clientErrors, update.error);

  function submit(event: FormEvent) {
    event.preventDefault();
    const read = readSettings(values, settings);
    setClientErrors(read.ok ? {} : read.errors);
    if (!read.ok) return;
    if (Object.keys(read.changes).length === 0) return onDone();
    update.mutate(read.changes, { onSuccess: onDone });
  }

  return (
    <form noValidate onSubmit={submit} aria-label="Team battery settings" className="flex flex-col gap-5">
      {update.isError && <ErrorNotice title="The settings were not saved" error={update.error} />}
      <ChoiceGroup legend="State-of-charge table" error={errors.socTable} className="grid gap-2 sm:grid-cols-2">
        {(Object.keys(SOC_TABLES) as SocTableName[]).map((table) => (
          <ChoiceRadio
            key={table}
            name="soc-table"
            checked={values.socTable === table}
            onChange={() => setValues((old) => ({ ...old, socTable: table }))}
            className="justify-start! py-2 text-base"
          >
            <span className="flex flex-col text-left">
              <span>{SOC_TABLE_LABELS[table]}</span>
              <span className="text-sm font-normal text-ink-muted">{SOC_TABLE_SOURCES[table]}</span>
            </span>
          </ChoiceRadio>
        ))}
      </ChoiceGroup>
      <div className="grid gap-x-5 gap-y-4 sm:grid-cols-2">
        {NUMBER_SETTINGS.map((setting) => (
          <TextField
            key={setting.field}
            label={`${setting.label}${setting.unit ? ` (${setting.unit})` : ''}`}
            hint={`${setting.hint} Default: ${defaultOf(setting.field)}.`}
            inputMode="decimal"
            autoComplete="off"
            className="max-w-40 tabular-nums"
            value={values[setting.field]}
            onChange={(event) => setValues((old) => ({ ...old, [setting.field]: event.target.value }))}
            error={errors[setting.field]}
          />
        ))}
      </div>
      <div className="flex flex-wrap gap-3">
        <Button type="submit" size="lg" pending={update.isPending}>
          Save settings
        </Button>
        <Button variant="secondary" size="lg" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/**
 * The team's battery settings: what every number on the page is computed with. Everyone sees
 * them; battery managers change them.
 */
export function BatterySettingsSection() {
  const settings = useBatterySettings();
  const canManage = useCan('batteries:manage');
  const [editing, setEditing] = useState(false);

  return (
    <section aria-labelledby="battery-settings-title" className="flex flex-col gap-4 rounded-2xl border border-line bg-surface p-4 shadow-sm sm:p-5">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="battery-settings-title" className="text-2xl font-bold">
          Team battery settings
        </h2>
        {canManage && !editing && settings.isSuccess && (
          <Button variant="secondary" icon={<PencilIcon className="size-5" />} onClick={() => setEditing(true)}>
            Change settings
          </Button>
        )}
      </div>
      {settings.isPending && <Loading label="Loading the settings" />}
      {settings.isError && <ErrorNotice title="Could not load the settings" error={settings.error} onRetry={() => settings.refetch()} retrying={settings.isFetching} />}
      {settings.isSuccess &&
        (editing ? (
          <SettingsForm settings={settings.data} onDone={() => setEditing(false)} />
        ) : (
          <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-2">
            <div className="flex flex-col sm:col-span-2">
              <dt className="text-sm font-semibold text-ink-muted">State-of-charge table</dt>
              <dd>{SOC_TABLE_LABELS[settings.data.socTable]}</dd>
            </div>
            {NUMBER_SETTINGS.map((setting) => (
              <div key={setting.field} className="flex flex-col">
                <dt className="text-sm font-semibold text-ink-muted">{setting.label}</dt>
                <dd className="tabular-nums">{shownValue(settings.data, setting)}</dd>
              </div>
            ))}
          </dl>
        ))}
    </section>
  );
}
