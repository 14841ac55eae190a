import { useId, type FormEvent, type ReactNode } from 'react';
import { CHECKLIST_PHASES, PHASE_LABELS, type ChecklistPhase } from '@shared/domain/checklist';
import { TEMPLATE_NAME_MAX } from '@shared/schemas/checks';
import { Button, LinkButton } from '../../../../components/ui/button';
import { ErrorNotice } from '../../../../components/ui/error-notice';
import { SelectField, TextField } from '../../../../components/ui/field';
import { isApiError } from '../../../../lib/api-client';
import type { FieldErrors } from '../../../../lib/form-errors';
import { SortableItems } from './sortable-items';
import type { TemplateFormValues } from './template-form-values';

interface TemplateFormProps {
  values: TemplateFormValues;
  errors: FieldErrors;
  onChange: (values: TemplateFormValues) => void;
  onSubmit: () => void;
  submitLabel: string;
  pending: boolean;
  /** The failed save; null while `notice` explains it. */
  saveError: unknown;
  /** What saving does to versions and runs, beside the button. */
  versionNote: string;
  /** Shown by the save button, e.g. the notice that someone else saved first. */
  notice?: ReactNode;
}

// The server's own message for a 400 lists field paths ("items.2.label"); the fields say it
// better, and once they are all edited there is nothing left to point at.
function saveProblem(saveError: unknown, errors: FieldErrors): unknown {
  if (!isApiError(saveError, 'invalid')) return saveError;
  if (Object.keys(errors).length === 0) return null;
  return new Error(errors._ ?? 'Check the fields marked in red.');
}

/** A checklist's name, phase and ordered items; used to create and to edit. */
export function TemplateForm({ values, errors, onChange, onSubmit, submitLabel, pending, saveError, versionNote, notice }: TemplateFormProps) {
  const itemsHeading = useId();
  const problem = saveError == null ? null : saveProblem(saveError, errors);
  const hasClientErrors = saveError == null && Object.keys(errors).length > 0;

  function submit(event: FormEvent) {
    event.preventDefault();
    onSubmit();
  }

  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-5">
      <div className="grid gap-5 sm:grid-cols-[3fr_2fr]">
        <TextField
          label="Name"
          maxLength={TEMPLATE_NAME_MAX}
          value={values.name}
          onChange={(event) => onChange({ ...values, name: event.target.value })}
          error={errors.name}
        />
        <SelectField
          label="When it is used"
          value={values.phase}
          onChange={(event) => onChange({ ...values, phase: event.target.value as ChecklistPhase })}
          error={errors.phase}
        >
          {CHECKLIST_PHASES.map((phase) => (
            <option key={phase} value={phase}>
              {PHASE_LABELS[phase]}
            </option>
          ))}
        </SelectField>
      </div>
      <section aria-labelledby={itemsHeading} className="flex flex-col gap-3">
        <div>
          <h2 id={itemsHeading} className="text-xl font-bold">
            Items
          </h2>
          <p className="text-ink-muted">In the order the crew works through them. Drag a handle to move an item.</p>
        </div>
        {errors.items && <p className="font-semibold text-danger">{errors.items}</p>}
        <SortableItems items={values.items} errors={errors} onChange={(items) => onChange({ ...values, items })} />
      </section>
      {notice}
      {problem != null && <ErrorNotice error={problem} title="Not saved" />}
      {hasClientErrors && <ErrorNotice error={new Error(errors._ ?? 'Check the fields marked in red.')} title="Not saved yet" />}
      <p className="text-ink-muted">{versionNote}</p>
      <div className="flex flex-wrap gap-3">
        <Button type="submit" size="lg" pending={pending}>
          {submitLabel}
        </Button>
        <LinkButton to="/checks/templates" variant="secondary" size="lg">
          Cancel
        </LinkButton>
      </div>
    </form>
  );
}
