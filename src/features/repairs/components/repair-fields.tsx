import { useId } from 'react';
import { REPAIR_SEVERITIES, type RepairSeverity } from '@shared/domain/repair-urgency';
import type { SubsystemJson } from '@shared/schemas/repairs';
import { ChoiceGroup, ChoiceRadio } from '../../../components/ui/choice-radio';
import { SelectField, TextField } from '../../../components/ui/field';
import type { RepairAssignee, RepairMatch } from './repair-context';
import { SEVERITY_HELP, SEVERITY_WORDS } from './repair-words';
import { SeverityIcon } from './severity-tag';

const SEVERITY_TINT: Record<RepairSeverity, string> = {
  blocks_match: 'text-danger',
  degraded: 'text-warning',
  cosmetic: 'text-ink-muted',
};

/** The subsystem as big buttons: one tap, no list to open. A key no longer in the team's list stays choosable on its ticket. */
export function SubsystemChoices({ subsystems, value, onChange, error }: { subsystems: SubsystemJson[]; value: string; onChange: (key: string) => void; error?: string }) {
  const name = useId();
  const choices = value && !subsystems.some((subsystem) => subsystem.key === value) ? [...subsystems, { key: value, label: value }] : subsystems;
  return (
    <ChoiceGroup legend="Subsystem" error={error} className="grid grid-cols-2 gap-2 min-[520px]:grid-cols-3 lg:grid-cols-4">
      {choices.map((subsystem) => (
        <ChoiceRadio key={subsystem.key} name={name} value={subsystem.key} checked={value === subsystem.key} onChange={() => onChange(subsystem.key)} className="px-2 text-center">
          {subsystem.label}
        </ChoiceRadio>
      ))}
    </ChoiceGroup>
  );
}

/** Three big choices, each with its shape and a line on what it means. */
export function SeverityChoices({ value, onChange, error }: { value: RepairSeverity | ''; onChange: (severity: RepairSeverity) => void; error?: string }) {
  const name = useId();
  return (
    <ChoiceGroup legend="How bad is it?" error={error} className="grid gap-2 sm:grid-cols-3">
      {REPAIR_SEVERITIES.map((severity) => (
        <ChoiceRadio key={severity} name={name} value={severity} checked={value === severity} onChange={() => onChange(severity)} className="py-3">
          <span className="flex w-full flex-col gap-1 text-left">
            <span className="flex items-center gap-2">
              <SeverityIcon severity={severity} className={`size-6 ${SEVERITY_TINT[severity]}`} />
              {SEVERITY_WORDS[severity]}
            </span>
            <span className="text-base font-normal text-ink-muted">{SEVERITY_HELP[severity]}</span>
          </span>
        </ChoiceRadio>
      ))}
    </ChoiceGroup>
  );
}

/** Who fixes it: members who work on repairs, or nobody yet. */
export function AssigneeSelect({ assignees, value, onChange, error, currentName }: {
  assignees: RepairAssignee[] | undefined;
  value: string;
  onChange: (id: string) => void;
  error?: string;
  /** The name of an assignee no longer among them (their role changed), so the field can still show them. */
  currentName?: string;
}) {
  const known = assignees?.some((assignee) => assignee.id === value);
  return (
    <SelectField label="Who fixes it" value={value} onChange={(event) => onChange(event.target.value)} error={error} hint={assignees === undefined ? 'Loading the team…' : undefined}>
      <option value="">Nobody yet</option>
      {value && !known && <option value={value}>{currentName ?? 'Someone else'}</option>}
      {assignees?.map((assignee) => (
        <option key={assignee.id} value={assignee.id}>
          {assignee.name}
        </option>
      ))}
    </SelectField>
  );
}

/** The match it broke in: ours, in schedule order. */
export function FoundInSelect({ matches, value, onChange, error }: { matches: RepairMatch[]; value: string; onChange: (id: string) => void; error?: string }) {
  const ours = matches.filter((match) => match.ours || match.id === value);
  return (
    <SelectField label="Found in" value={value} onChange={(event) => onChange(event.target.value)} error={error}>
      <option value="">Not in a match (pit, practice field)</option>
      {ours.map((match) => (
        <option key={match.id} value={match.id}>
          {match.name}
          {match.started ? ' (played)' : ''}
        </option>
      ))}
    </SelectField>
  );
}

/** Whole minutes on the number pad. */
export function MinutesField({ label, value, onChange, error, hint }: { label: string; value: string; onChange: (text: string) => void; error?: string; hint?: string }) {
  return (
    <TextField
      label={label}
      inputMode="numeric"
      autoComplete="off"
      className="tabular-nums"
      value={value}
      onChange={(event) => onChange(event.target.value)}
      error={error}
      hint={hint}
    />
  );
}
