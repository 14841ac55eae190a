import { useState, type FormEvent } from 'react';
import { createScreenSchema, type CreatedScreenJson, type ScreenJson } from '@shared/schemas/screens';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { Dialog } from '../../../components/ui/dialog';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { TextField } from '../../../components/ui/field';
import { CheckIcon, PauseIcon, PlusIcon } from '../../../components/ui/icons';
import { Loading } from '../../../components/ui/loading';
import { StatusTag } from '../../../components/ui/status-tag';
import { formatDateRange } from '../../../lib/dates';
import { mergeFieldErrors, parseForm, type FieldErrors } from '../../../lib/form-errors';
import { newId } from '../../../lib/new-id';
import { useCreateScreen } from '../api/create-screen';
import { useScreens } from '../api/get-screens';
import { useRevokeScreen } from '../api/revoke-screen';
import { ScreenLinkDialog } from './screen-link-dialog';

function AddScreenForm({ onAdded, onCancel }: { onAdded: (screen: CreatedScreenJson) => void; onCancel: () => void }) {
  const create = useCreateScreen();
  // Kept through failed attempts: a resend after a lost answer finds the screen instead of adding a second.
  const [id, setId] = useState(newId);
  const [name, setName] = useState('Pit TV');
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  const errors = mergeFieldErrors(clientErrors, create.error);

  function submit(event: FormEvent) {
    event.preventDefault();
    const parsed = parseForm(createScreenSchema, { id, name });
    setClientErrors(parsed.ok ? {} : parsed.errors);
    if (!parsed.ok) return;
    create.mutate(
      { ...parsed.data, id },
      {
        onSuccess: (screen) => {
          setId(newId());
          setName('Pit TV');
          onAdded(screen);
        },
      },
    );
  }

  return (
    <form noValidate onSubmit={submit} aria-label="Add a screen" className="flex flex-col gap-4 rounded-xl bg-sunken p-4">
      {create.isError && <ErrorNotice error={create.error} title="The screen was not added" />}
      <TextField label="Screen name" hint="Where it hangs, e.g. Pit TV" autoComplete="off" value={name} onChange={(e) => setName(e.target.value)} error={errors.name} />
      <div className="flex flex-wrap gap-3">
        <Button type="submit" pending={create.isPending}>
          Add screen
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

function ScreenRow({ screen }: { screen: ScreenJson }) {
  const revoke = useRevokeScreen();
  const [confirming, setConfirming] = useState(false);
  const created = screen.createdAt.slice(0, 10);
  return (
    <li className="flex flex-wrap items-center justify-between gap-3 py-3">
      <div className="min-w-0">
        <p className="text-lg font-bold break-words">{screen.name}</p>
        <p className="text-ink-muted">Created {formatDateRange(created, created)}</p>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        {screen.revokedAt ? (
          <StatusTag tone="neutral" icon={<PauseIcon className="size-4" />}>
            Revoked
          </StatusTag>
        ) : (
          <>
            <StatusTag tone="ok" icon={<CheckIcon className="size-4" />}>
              Active
            </StatusTag>
            <Button
              variant="secondary"
              onClick={() => {
                revoke.reset();
                setConfirming(true);
              }}
            >
              Revoke
            </Button>
          </>
        )}
      </div>
      <Dialog
        open={confirming}
        title={`Revoke ${screen.name}?`}
        onClose={() => setConfirming(false)}
        actions={
          <>
            <Button variant="secondary" onClick={() => setConfirming(false)}>
              Keep it
            </Button>
            <Button variant="danger" pending={revoke.isPending} onClick={() => revoke.mutate(screen.id, { onSuccess: () => setConfirming(false) })}>
              Revoke
            </Button>
          </>
        }
      >
        <p>Its link stops working at once and the TV showing it goes blank. You can add a new screen at any time.</p>
        {revoke.isError && <ErrorNotice error={revoke.error} />}
      </Dialog>
    </li>
  );
}

/** Admins' pit screens: TVs that show the board through a link, without anyone signing in. */
export function PitScreensCard() {
  const screens = useScreens();
  const [adding, setAdding] = useState(false);
  const [added, setAdded] = useState<CreatedScreenJson | null>(null);
  return (
    <Card aria-labelledby="screens-title" className="mb-8 flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="screens-title" className="text-2xl font-bold">
          Pit screens
        </h2>
        {!adding && (
          <Button variant="secondary" icon={<PlusIcon />} onClick={() => setAdding(true)}>
            Add a screen
          </Button>
        )}
      </div>
      <p className="text-ink-muted">A TV in the pit shows the next match live through its own link, with no sign-in. It never shows incidents or people.</p>
      {adding && (
        <AddScreenForm
          onAdded={(screen) => {
            setAdding(false);
            setAdded(screen);
          }}
          onCancel={() => setAdding(false)}
        />
      )}
      {screens.isPending && <Loading label="Loading the screens" />}
      {screens.isError && <ErrorNotice title="Could not load the screens" error={screens.error} onRetry={() => screens.refetch()} retrying={screens.isFetching} />}
      {screens.isSuccess &&
        (screens.data.length === 0 ? (
          <p>No screens yet.</p>
        ) : (
          <ul className="divide-y divide-line">
            {screens.data.map((screen) => (
              <ScreenRow key={screen.id} screen={screen} />
            ))}
          </ul>
        ))}
      <ScreenLinkDialog screen={added} onClose={() => setAdded(null)} />
    </Card>
  );
}
