import { useState } from 'react';
import type { MailFailureJson, MailKind } from '@shared/schemas/mail';
import { Button, LinkButton } from '../../../components/ui/button';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { AlertIcon, CheckIcon } from '../../../components/ui/icons';
import { isNotFound } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/dates';
import { useDismissMailFailure } from '../api/dismiss-mail-failure';
import { useMailFailures } from '../api/get-mail-failures';
import { useRetryMailFailure } from '../api/retry-mail-failure';

const KIND_LABELS: Record<MailKind, string> = {
  incident_alert: 'Incident alert',
  invite: 'Invite',
  password_reset: 'New-password link',
};

function FailureRow({ failure, onDone }: { failure: MailFailureJson; onDone: (note: string) => void }) {
  const retry = useRetryMailFailure();
  const dismiss = useDismissMailFailure();
  const handledAlready = (error: unknown) => isNotFound(error) && onDone(`The mail to ${failure.to} was retried or dismissed already.`);
  const attempts = `${failure.attempts} ${failure.attempts === 1 ? 'try' : 'tries'}`;
  return (
    <li className="flex flex-col gap-3 rounded-xl border border-line bg-surface p-4">
      <div className="min-w-0">
        <p className="text-lg font-bold break-words">
          {KIND_LABELS[failure.kind]}: {failure.subject}
        </p>
        <p className="break-all">To {failure.to}</p>
        <p className="text-ink-muted">
          Given up {formatDateTime(failure.failedAt)} after {attempts}. <span className="break-words">{failure.lastError}</span>
        </p>
      </div>
      {(retry.isError || dismiss.isError) && !isNotFound(retry.error ?? dismiss.error) && <ErrorNotice error={retry.error ?? dismiss.error} />}
      <div className="flex flex-wrap gap-3">
        <Button pending={retry.isPending} onClick={() => retry.mutate(failure.id, { onSuccess: () => onDone(`Sending again to ${failure.to}.`), onError: handledAlready })}>
          Retry
        </Button>
        <Button variant="secondary" pending={dismiss.isPending} onClick={() => dismiss.mutate(failure.id, { onSuccess: () => onDone(`Dismissed the mail to ${failure.to}.`), onError: handledAlready })}>
          Dismiss
        </Button>
        {failure.incidentId && (
          <LinkButton variant="quiet" to={`/safety/incidents/${failure.incidentId}`}>
            Open the incident
          </LinkButton>
        )}
      </div>
    </li>
  );
}

/**
 * Mail the sender gave up on after every retry: someone must pass the news on another way, or
 * fix the address and retry. Shown only while there is something to act on.
 */
export function MailFailuresCard() {
  const failures = useMailFailures();
  const [note, setNote] = useState<string | null>(null);
  const list = failures.data?.failures ?? [];
  if (list.length === 0 && !note && !failures.isError) return null;
  return (
    <section aria-labelledby="mail-failures-title" className="mb-8 flex flex-col gap-4 rounded-2xl border-2 border-warning bg-warning-soft p-5 sm:p-6">
      <h2 id="mail-failures-title" className="flex items-center gap-2 text-2xl font-bold">
        <AlertIcon className="size-7 text-warning" /> Mail not delivered
      </h2>
      {failures.isError && (
        <ErrorNotice title="Could not load the mail that failed" error={failures.error} onRetry={() => failures.refetch()} retrying={failures.isFetching} />
      )}
      {list.length > 0 && (
        <>
          <p>These e-mails could not be sent, even after several tries. Retry once the mail server or the address is fixed, or tell the people another way and dismiss.</p>
          <ul className="flex flex-col gap-3">
            {list.map((failure) => (
              <FailureRow key={failure.id} failure={failure} onDone={setNote} />
            ))}
          </ul>
        </>
      )}
      {note && (
        <p role="status" className="flex items-center gap-2 font-semibold">
          <CheckIcon className="size-5 text-ok" /> {note}
        </p>
      )}
    </section>
  );
}
