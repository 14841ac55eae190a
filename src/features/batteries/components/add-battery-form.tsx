import { useState } from 'react';
import { useCreateBattery } from '../api/create-battery';
import { newId } from '../../../lib/new-id';
import { BatteryForm } from './battery-form';
import { newBatteryValues } from './battery-form-values';

/** "Add a battery": the form stays open after an add, emptied, for the next battery of the crate. */
export function AddBatteryForm({ onDone }: { onDone: () => void }) {
  const create = useCreateBattery();
  // One id per battery being added, kept through failed attempts: a resend finds it instead of adding another.
  const [id, setId] = useState(newId);
  const [formKey, setFormKey] = useState(0);
  const [added, setAdded] = useState<string | null>(null);

  return (
    <div className="flex flex-col gap-3 rounded-2xl border-2 border-line-strong bg-surface p-4 sm:p-5">
      {added && (
        <p role="status" className="font-semibold text-ok">
          Battery {added} added. Add another, or close the form.
        </p>
      )}
      <BatteryForm
        key={formKey}
        title="Add a battery"
        initialValues={newBatteryValues()}
        submitLabel="Add battery"
        pending={create.isPending}
        saveError={create.error}
        onSubmit={(fields) =>
          create.mutate(
            { ...fields, id },
            {
              onSuccess: (battery) => {
                setAdded(battery.label);
                setId(newId());
                setFormKey((key) => key + 1);
              },
            },
          )
        }
        onCancel={onDone}
        cancelLabel={added ? 'Done' : 'Cancel'}
      />
    </div>
  );
}
