import { useRef, useState } from 'react';
import type { MatchJson } from '@shared/schemas/schedule';
import { Button } from '../../../components/ui/button';
import { CheckIcon, PlusIcon } from '../../../components/ui/icons';
import { matchName } from '../../../lib/match-labels';
import { newId } from '../../../lib/new-id';
import { useCreateMatch } from '../api/create-match';
import { MatchForm } from './match-form';
import { emptyMatchValues } from './match-form-values';

interface AddMatchPanelProps {
  eventId: string;
  timeZone: string;
  zoneLabel: string;
  /** The day the form starts on: that of the last match, else the event's first day. */
  defaultDate: string;
}

/** Adds one match by hand: a late playoff, or a line the schedule file got wrong. */
export function AddMatchPanel({ eventId, timeZone, zoneLabel, defaultDate }: AddMatchPanelProps) {
  const create = useCreateMatch(eventId);
  const [open, setOpen] = useState(false);
  const [added, setAdded] = useState<MatchJson | null>(null);
  // One id per match being typed: a retry after a lost answer resends it and adds nothing twice.
  const clientId = useRef(newId());

  function openForm() {
    create.reset();
    setAdded(null);
    setOpen(true);
  }

  if (!open) {
    return (
      <div className="flex flex-col gap-2">
        <Button variant="secondary" size="lg" icon={<PlusIcon className="size-6" />} onClick={openForm}>
          Add a match
        </Button>
        {added && (
          <p role="status" className="flex items-center gap-2 font-semibold text-ok">
            <CheckIcon className="size-5" /> Added {matchName(added.level, added.number)}.
          </p>
        )}
      </div>
    );
  }

  return (
    <section aria-labelledby="add-match-title" className="flex w-full flex-col gap-4 rounded-2xl border border-line bg-surface p-5 shadow-sm">
      <h2 id="add-match-title" className="text-2xl font-bold">
        Add a match
      </h2>
      <MatchForm
        initialValues={emptyMatchValues(defaultDate)}
        timeZone={timeZone}
        zoneLabel={zoneLabel}
        submitLabel="Add match"
        pending={create.isPending}
        saveError={create.error}
        onSubmit={(fields) =>
          create.mutate(
            { id: clientId.current, ...fields },
            {
              onSuccess: (match) => {
                clientId.current = newId();
                setAdded(match);
                setOpen(false);
              },
            },
          )
        }
        onCancel={() => setOpen(false)}
      />
    </section>
  );
}
