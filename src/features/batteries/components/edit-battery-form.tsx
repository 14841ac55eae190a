import { useState } from 'react';
import type { BatteryJson } from '@shared/schemas/batteries';
import { StaleNotice } from '../../../components/ui/stale-notice';
import { staleBattery, useUpdateBattery } from '../api/update-battery';
import { CHEMISTRY_WORDS } from './battery-format';
import { BatteryForm } from './battery-form';
import { batteryChanges, batteryValuesOf, type BatteryFields } from './battery-form-values';

/**
 * The battery's facts, editable. Mounted with the version loaded when opened, so a refetch from
 * another tablet never wipes what is being typed; a conflicting save shows theirs beside it.
 */
export function EditBatteryForm({ battery, onDone }: { battery: BatteryJson; onDone: () => void }) {
  const update = useUpdateBattery(battery.id);
  const [base, setBase] = useState(battery);
  const [formKey, setFormKey] = useState(0);
  const [mine, setMine] = useState<BatteryFields | null>(null);
  const theirs = staleBattery(update.error);

  function save(fields: BatteryFields, version: number) {
    // Against the version the edit started from: what was not touched stays as they saved it.
    const changes = batteryChanges(base, fields);
    if (Object.keys(changes).length === 0) return onDone();
    update.mutate({ ...changes, version }, { onSuccess: onDone });
  }

  return (
    <div className="rounded-2xl border-2 border-line-strong bg-surface p-4 sm:p-5">
      <BatteryForm
        key={formKey}
        title={`Edit battery ${base.label}`}
        initialValues={batteryValuesOf(base)}
        submitLabel="Save battery"
        pending={update.isPending}
        saveError={theirs ? null : update.error}
        onSubmit={(fields) => {
          setMine(fields);
          save(fields, base.version);
        }}
        onCancel={onDone}
        notice={
          theirs &&
          mine && (
            <StaleNotice
              what="this battery"
              intro="This is what they saved. Your input is still in the form below."
              pending={update.isPending}
              onKeepMine={() => save(mine, theirs.version)}
              onTakeTheirs={() => {
                update.reset();
                setBase(theirs);
                setMine(null);
                setFormKey((key) => key + 1);
              }}
            >
              <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-lg bg-surface p-3 tabular-nums">
                <dt className="font-semibold">Label</dt>
                <dd>{theirs.label}</dd>
                <dt className="font-semibold">Year in service</dt>
                <dd>{theirs.yearInService}</dd>
                <dt className="font-semibold">Rated capacity</dt>
                <dd>{theirs.nominalCapacityAh} Ah</dd>
                <dt className="font-semibold">Chemistry</dt>
                <dd>{CHEMISTRY_WORDS[theirs.chemistry]}</dd>
                <dt className="font-semibold">Notes</dt>
                <dd>{theirs.notes ?? '–'}</dd>
              </dl>
            </StaleNotice>
          )
        }
      />
    </div>
  );
}
