import { useId } from 'react';
import { ITEM_KINDS } from '@shared/domain/checklist';
import { ROLES, ROLE_LABELS, type Role } from '@shared/roles';
import { ITEM_HELP_MAX, ITEM_LABEL_MAX } from '@shared/schemas/checks';
import { Checkbox } from '../../../../components/ui/checkbox';
import { controlClass, Field, SelectField, TextField } from '../../../../components/ui/field';
import type { FieldErrors } from '../../../../lib/form-errors';
import { KIND_HINTS, KIND_LABELS } from './item-kinds';
import { OptionChips } from './option-chips';
import { BUMPER_OPTIONS, type ItemDraft } from './template-form-values';

interface ItemFieldsProps {
  item: ItemDraft;
  errors: FieldErrors;
  /** Focus the label when the item was just added. */
  autoFocus: boolean;
  onChange: (patch: Partial<ItemDraft>) => void;
}

function KindPicker({ item, error, onChange }: { item: ItemDraft; error?: string; onChange: (patch: Partial<ItemDraft>) => void }) {
  const name = useId();
  return (
    <fieldset className="flex flex-col gap-1.5">
      <legend className="mb-1.5 font-semibold">Kind</legend>
      <div className="grid grid-cols-2 gap-2 sm:grid-cols-4">
        {ITEM_KINDS.map((kind) => (
          <label
            key={kind}
            className="flex min-h-12 cursor-pointer items-center gap-3 rounded-xl border-2 border-line px-3 py-2 font-semibold has-checked:border-accent has-checked:bg-accent-soft"
          >
            <input
              type="radio"
              name={name}
              value={kind}
              checked={item.kind === kind}
              onChange={() => onChange({ kind })}
              className="size-6 shrink-0 accent-accent"
            />
            {KIND_LABELS[kind]}
          </label>
        ))}
      </div>
      <p className="text-sm text-ink-muted">{KIND_HINTS[item.kind]}</p>
      {error && <p className="font-semibold text-danger">{error}</p>}
    </fieldset>
  );
}

/** Everything about one item except its place in the list. */
export function ItemFields({ item, errors, autoFocus, onChange }: ItemFieldsProps) {
  return (
    <div className="flex flex-col gap-4">
      <TextField label="Label" maxLength={ITEM_LABEL_MAX} autoFocus={autoFocus} value={item.label} onChange={(event) => onChange({ label: event.target.value })} error={errors.label} />
      <Field label="Help text (optional)" hint="How to check it, in a sentence the crew reads under the item." error={errors.help}>
        {(control) => (
          <textarea rows={2} maxLength={ITEM_HELP_MAX} className={controlClass} value={item.help} onChange={(event) => onChange({ help: event.target.value })} {...control} />
        )}
      </Field>
      <KindPicker item={item} error={errors.kind} onChange={onChange} />
      {item.kind === 'number' && (
        <div className="grid grid-cols-2 gap-4 sm:grid-cols-3">
          <TextField label="Minimum" inputMode="decimal" className="tabular-nums" value={item.min} onChange={(event) => onChange({ min: event.target.value })} error={errors.min} />
          <TextField label="Maximum" inputMode="decimal" className="tabular-nums" value={item.max} onChange={(event) => onChange({ max: event.target.value })} error={errors.max} />
          <TextField label="Unit" placeholder="psi, V" maxLength={12} value={item.unit} onChange={(event) => onChange({ unit: event.target.value })} error={errors.unit} />
          <p className="col-span-full -mt-2 text-sm text-ink-muted">Leave a limit empty when there is none.</p>
        </div>
      )}
      {item.kind === 'choice' && (
        <>
          <OptionChips options={item.options} locked={item.bumperColour} error={errors.options} onChange={(options) => onChange({ options })} />
          <div className="flex flex-col gap-1.5">
            <Checkbox
              label="This confirms the bumper colour (Red/Blue) for the match's alliance"
              checked={item.bumperColour}
              onChange={(event) => onChange(event.target.checked ? { bumperColour: true, options: BUMPER_OPTIONS } : { bumperColour: false })}
            />
            {item.bumperColour && <p className="text-sm text-ink-muted">Readiness compares the colour picked with the alliance of the run's match.</p>}
            {errors.purpose && <p className="font-semibold text-danger">{errors.purpose}</p>}
          </div>
        </>
      )}
      <div className="grid items-end gap-4 sm:grid-cols-2">
        <Checkbox label="Required" checked={item.required} onChange={(event) => onChange({ required: event.target.checked })} />
        <SelectField label="Usually done by" value={item.role} onChange={(event) => onChange({ role: event.target.value as Role | '' })} error={errors.role}>
          <option value="">Anyone</option>
          {ROLES.map((role) => (
            <option key={role} value={role}>
              {ROLE_LABELS[role]}
            </option>
          ))}
        </SelectField>
      </div>
      {errors.required && <p className="font-semibold text-danger">{errors.required}</p>}
    </div>
  );
}
