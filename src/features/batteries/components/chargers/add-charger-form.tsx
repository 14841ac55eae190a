import { useState, type FormEvent } from 'react';
import { createChargerSchema } from '@shared/schemas/batteries';
import { Button } from '../../../../components/ui/button';
import { PlugIcon } from '../../../../components/ui/action-icons';
import { ErrorNotice } from '../../../../components/ui/error-notice';
import { TextField } from '../../../../components/ui/field';
import { mergeFieldErrors, parseForm, type FieldErrors } from '../../../../lib/form-errors';
import { newId } from '../../../../lib/new-id';
import { useCreateCharger } from '../../api/create-charger';
import { readDecimal } from '../read-decimal';

// `Number('')` is 0: an emptied field must be refused, not saved as zero. Some keypads type "6,5".
/** "Add a charger": its name, how many bays, and the current each bay charges at. */
export function AddChargerForm({ onDone }: { onDone: () => void }) {
  const create = useCreateCharger();
  // One id per charger being added, kept through failed attempts: a resend adds nothing twice.
  const [id] = useState(newId);
  const [name, setName] = useState('');
  const [bays, setBays] = useState('1');
  const [amps, setAmps] = useState('');
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const errors = mergeFieldErrors(clientErrors, create.error);

  function submit(event: FormEvent) {
    event.preventDefault();
    const parsed = parseForm(createChargerSchema, { id, name, bays: readDecimal(bays), currentPerBayA: readDecimal(amps) });
    setClientErrors(parsed.ok ? {} : parsed.errors);
    if (!parsed.ok) return;
    create.mutate({ ...parsed.data, id }, { onSuccess: onDone });
  }

  return (
    <form noValidate onSubmit={submit} aria-labelledby="add-charger-title" className="flex flex-col gap-4 rounded-2xl bg-sunken p-4">
      <h3 id="add-charger-title" className="text-xl font-bold">
        Add a charger
      </h3>
      {create.isError && <ErrorNotice title="The charger was not added" error={create.error} />}
      <div className="grid gap-4 sm:grid-cols-[2fr_1fr_1fr]">
        <TextField label="Name" autoComplete="off" placeholder="Bench charger" value={name} onChange={(event) => setName(event.target.value)} error={errors.name} />
        <TextField label="Bays" inputMode="numeric" className="tabular-nums" value={bays} onChange={(event) => setBays(event.target.value)} error={errors.bays} />
        <TextField
          label="Amps per bay"
          inputMode="decimal"
          className="tabular-nums"
          value={amps}
          onChange={(event) => setAmps(event.target.value)}
          error={errors.currentPerBayA}
          hint="From the charger's label"
        />
      </div>
      <div className="flex flex-wrap gap-3">
        <Button type="submit" icon={<PlugIcon />} pending={create.isPending}>
          Add charger
        </Button>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
