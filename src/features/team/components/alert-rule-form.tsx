import { useId, useState, type FormEvent } from 'react';
import type { Role } from '@shared/roles';
import { ALERT_RULE_LABELS, ALERTABLE_ROLES, alertRuleSchema, type AlertRuleJson } from '@shared/schemas/mail';
import { Button } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { AlertIcon, CheckIcon } from '../../../components/ui/icons';
import { isApiError } from '../../../lib/api-client';
import { mergeFieldErrors, parseForm, type FieldErrors } from '../../../lib/form-errors';
import { staleAlertRule, useUpdateAlertRule } from '../api/update-alert-rule';
import { ExtraAddresses, readAddress } from './extra-addresses';
import { RoleCheckboxes } from './role-checkboxes';

interface Draft {
  roles: Role[];
  extraAddresses: string[];
  /** The version the change started from: a refetch meanwhile must not make it overwrite someone else's save. */
  version: number;
}

const sameSet = (a: readonly string[], b: readonly string[]) => a.length === b.length && a.every((each) => b.includes(each));

/** Whether a stale answer's rule already says what was sent: the send before, whose answer was lost, saved it. */
function holds(error: unknown, sent: Pick<AlertRuleJson, 'roles' | 'extraAddresses'>): boolean {
  const current = staleAlertRule(error);
  return !!current && sameSet(current.roles, sent.roles) && sameSet(current.extraAddresses, sent.extraAddresses);
}

/** One rule: which roles and which other addresses get the e-mail. Saved whole, with the version it was loaded at. */
export function AlertRuleForm({ rule }: { rule: AlertRuleJson }) {
  const update = useUpdateAlertRule();
  const titleId = useId();
  // Null until something is changed: until then the form follows what the server says.
  const [draft, setDraft] = useState<Draft | null>(null);
  const [typed, setTyped] = useState('');
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const [savedBefore, setSavedBefore] = useState(false);
  const stale = isApiError(update.error, 'stale') && !savedBefore;
  const errors = mergeFieldErrors(clientErrors, update.error);
  const shown = draft ?? rule;
  const changed = draft !== null || typed.trim() !== '';
  const nobody = shown.roles.length === 0 && shown.extraAddresses.length === 0;

  function edit(change: Partial<Pick<Draft, 'roles' | 'extraAddresses'>>) {
    update.reset();
    setSavedBefore(false);
    setDraft({ roles: shown.roles, extraAddresses: shown.extraAddresses, version: shown.version, ...change });
  }

  function startOver() {
    update.reset();
    setSavedBefore(false);
    setClientErrors({});
    setDraft(null);
    setTyped('');
  }

  function save(event: FormEvent) {
    event.preventDefault();
    let extraAddresses = shown.extraAddresses;
    if (typed.trim() !== '') {
      const read = readAddress(typed, extraAddresses);
      if (!read.ok) {
        setClientErrors({ typed: read.error });
        return;
      }
      extraAddresses = [...extraAddresses, read.address];
    }
    const parsed = parseForm(alertRuleSchema, { version: shown.version, roles: shown.roles, extraAddresses });
    setClientErrors(parsed.ok ? {} : parsed.errors);
    if (!parsed.ok) return;
    // What was typed is in the list from here on, so an error about it lands beside it.
    setDraft({ roles: shown.roles, extraAddresses, version: shown.version });
    setTyped('');
    setSavedBefore(false);
    update.mutate(
      { key: rule.key, ...parsed.data },
      {
        onSuccess: () => setDraft(null),
        onError: (error) => {
          if (!holds(error, parsed.data)) return;
          setSavedBefore(true);
          setDraft(null);
        },
      },
    );
  }

  return (
    <form noValidate onSubmit={save} aria-labelledby={titleId} className="flex flex-col gap-4 py-5">
      <h3 id={titleId} className="text-xl font-bold">
        {ALERT_RULE_LABELS[rule.key]}
      </h3>
      <RoleCheckboxes
        legend="Members with these roles"
        roles={ALERTABLE_ROLES}
        value={shown.roles}
        onChange={(roles) => edit({ roles })}
        error={errors.roles}
      />
      <ExtraAddresses
        addresses={shown.extraAddresses}
        onChange={(extraAddresses) => edit({ extraAddresses })}
        typed={typed}
        onTypedChange={(value) => {
          update.reset();
          setTyped(value);
        }}
        errors={errors}
      />
      {nobody && (
        <p className="flex items-center gap-2 rounded-xl bg-warning-soft p-3 font-semibold text-warning">
          <AlertIcon className="size-5" /> Nobody is e-mailed for these. They are still in the safety log.
        </p>
      )}
      {stale ? (
        <div role="alert" className="flex flex-col gap-3 rounded-xl border-2 border-warning bg-warning-soft p-4">
          <p className="text-lg font-bold">Someone else changed this rule while you were editing</p>
          <p>Reload it to see what they saved, then make your change again if it is still needed.</p>
          <div>
            <Button onClick={startOver}>Reload the rule</Button>
          </div>
        </div>
      ) : (
        update.isError && !savedBefore && <ErrorNotice error={update.error} title="The rule was not saved" />
      )}
      {(update.isSuccess || savedBefore) && !changed && (
        <p role="status" className="flex items-center gap-2 font-semibold text-ok">
          <CheckIcon /> Saved.
        </p>
      )}
      {changed && !stale && (
        <div className="flex flex-wrap gap-3">
          <Button type="submit" pending={update.isPending}>
            Save
          </Button>
          <Button variant="secondary" onClick={startOver}>
            Undo changes
          </Button>
        </div>
      )}
    </form>
  );
}
