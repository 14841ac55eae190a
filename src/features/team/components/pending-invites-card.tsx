import { useState } from 'react';
import { ROLE_LABELS } from '@shared/roles';
import type { InviteJson } from '@shared/schemas/mail';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { Dialog } from '../../../components/ui/dialog';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { isNotFound } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/dates';
import { useInvites } from '../api/get-invites';
import { useRevokeInvite } from '../api/revoke-invite';

function InviteRow({ invite }: { invite: InviteJson }) {
  const revoke = useRevokeInvite();
  const [confirming, setConfirming] = useState(false);
  return (
    <li className="flex flex-wrap items-center justify-between gap-3 py-4">
      <div className="min-w-0 flex-1 basis-64">
        <p className="text-lg font-bold break-words">{invite.name}</p>
        <p className="break-all text-ink-muted">{invite.email}</p>
        <p className="mt-1">
          {invite.roles.map((role) => ROLE_LABELS[role]).join(', ')} · link works until {formatDateTime(invite.expiresAt)}
        </p>
      </div>
      <Button
        variant="secondary"
        onClick={() => {
          revoke.reset();
          setConfirming(true);
        }}
      >
        Revoke
      </Button>
      <Dialog
        open={confirming}
        title={`Revoke the invite for ${invite.name}?`}
        onClose={() => setConfirming(false)}
        actions={
          <>
            <Button variant="secondary" onClick={() => setConfirming(false)}>
              Keep it
            </Button>
            <Button variant="danger" pending={revoke.isPending} onClick={() => revoke.mutate(invite.id, { onSettled: (_answer, error) => (!error || isNotFound(error)) && setConfirming(false) })}>
              Revoke
            </Button>
          </>
        }
      >
        <p>The link in their e-mail stops working at once. You can invite them again at any time.</p>
        {revoke.isError && <ErrorNotice error={revoke.error} />}
      </Dialog>
    </li>
  );
}

/** Invites sent and not yet used; shown only while there are some. */
export function PendingInvitesCard() {
  const invites = useInvites();
  if (invites.isPending || (invites.isSuccess && invites.data.invites.length === 0)) return null;
  return (
    <Card aria-labelledby="invites-title" className="mb-8 flex flex-col gap-2">
      <h2 id="invites-title" className="text-2xl font-bold">
        Invited, not joined yet
      </h2>
      {invites.isError ? (
        <ErrorNotice title="Could not load the invites" error={invites.error} onRetry={() => invites.refetch()} retrying={invites.isFetching} />
      ) : (
        <ul className="divide-y divide-line">
          {invites.data.invites.map((invite) => (
            <InviteRow key={invite.id} invite={invite} />
          ))}
        </ul>
      )}
    </Card>
  );
}
