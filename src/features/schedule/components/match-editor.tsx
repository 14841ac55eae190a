import { useState } from 'react';
import type { MatchJson } from '@shared/schemas/schedule';
import { Button } from '../../../components/ui/button';
import { PencilIcon } from '../../../components/ui/icons';
import { matchName } from '../../../lib/match-labels';
import { staleMatch, useUpdateMatch } from '../api/update-match';
import { MatchForm } from './match-form';
import { matchChanges, matchValuesOf, type MatchFields } from './match-form-values';
import { StaleMatchNotice } from './stale-match-notice';

interface MatchEditorProps {
  eventId: string;
  match: MatchJson;
  timeZone: string;
  zoneLabel: string;
}

/** "Edit" beside a match's name; compact, so eighty rows of it do not crowd the schedule. */
export function EditMatchButton({ match, onClick }: { match: MatchJson; onClick: () => void }) {
  return (
    <Button variant="quiet" className="-my-2" icon={<PencilIcon className="size-5" />} onClick={onClick}>
      Edit <span className="sr-only">{matchName(match.level, match.number)}</span>
    </Button>
  );
}

/**
 * The match's form in its row. Mounted with the version loaded when opened: refetches from other
 * tablets must not wipe what is being typed; a conflicting save shows theirs beside it instead.
 */
export function EditMatchForm({ eventId, match, timeZone, zoneLabel, onDone }: MatchEditorProps & { onDone: () => void }) {
  const update = useUpdateMatch(eventId);
  const [base, setBase] = useState(match);
  const [formKey, setFormKey] = useState(0);
  const [mine, setMine] = useState<MatchFields | null>(null);
  const theirs = staleMatch(update.error);

  function save(fields: MatchFields, version: number) {
    // Changes against the version the user started from: what they did not touch stays as saved.
    const changes = matchChanges(base, fields);
    if (Object.keys(changes).length === 0) return onDone();
    update.mutate({ id: match.id, changes: { ...changes, version } }, { onSuccess: onDone });
  }

  function takeTheirs(latest: MatchJson) {
    update.reset();
    setBase(latest);
    setMine(null);
    setFormKey((key) => key + 1);
  }

  return (
    <section aria-label={`Edit ${matchName(match.level, match.number)}`} className="rounded-xl border-2 border-line-strong bg-surface p-3 sm:p-4">
      <MatchForm
        key={formKey}
        initialValues={matchValuesOf(base, timeZone)}
        timeZone={timeZone}
        zoneLabel={zoneLabel}
        submitLabel="Save match"
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
            <StaleMatchNotice
              theirs={theirs}
              timeZone={timeZone}
              pending={update.isPending}
              onKeepMine={() => save(mine, theirs.version)}
              onTakeTheirs={() => takeTheirs(theirs)}
            />
          )
        }
      />
    </section>
  );
}
