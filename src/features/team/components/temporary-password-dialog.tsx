import { useRef, useState } from 'react';
import type { CreatedMemberJson } from '@shared/schemas/team';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { controlClass } from '../../../components/ui/field';
import { CheckIcon, CopyIcon } from '../../../components/ui/icons';
import { copyText } from '../../../lib/copy-text';

type CopyState = 'idle' | 'copied' | 'failed';

/**
 * The one moment the temporary password exists in clear outside the server's answer. It is set
 * in the app's typeface on purpose: Atkinson Hyperlegible keeps I, l and 1 apart, most monospace
 * fallbacks do not.
 */
export function TemporaryPasswordDialog({
  member,
  onClose,
  reason = 'added',
}: {
  member: CreatedMemberJson | null;
  onClose: () => void;
  reason?: 'added' | 'reset';
}) {
  const inputRef = useRef<HTMLInputElement>(null);
  const [copy, setCopy] = useState<CopyState>('idle');
  const password = member?.temporaryPassword ?? null;
  // E-mail addresses are only sent to admins; without one the sentence simply ends sooner.
  const withEmail = member?.email ? ` with ${member.email}` : '';

  async function copyPassword() {
    if (!password) return;
    setCopy((await copyText(password, inputRef.current)) ? 'copied' : 'failed');
  }

  function close() {
    setCopy('idle');
    onClose();
  }

  return (
    <Dialog
      open={member !== null}
      title={member ? (reason === 'added' ? `${member.name} is on the team` : `New password for ${member.name}`) : ''}
      onClose={close}
      actions={<Button onClick={close}>Done</Button>}
    >
      {member && password && (
        <>
          <p>
            {reason === 'added'
              ? `Give them this first password so they can sign in${withEmail}:`
              : `Their old password no longer works and they are signed out everywhere. Give them this one to sign in${withEmail}:`}
          </p>
          <div className="flex flex-wrap gap-2">
            <label htmlFor="temporary-password" className="sr-only">
              Temporary password
            </label>
            <input
              id="temporary-password"
              ref={inputRef}
              readOnly
              value={password}
              onFocus={(event) => event.target.select()}
              className={`${controlClass} min-w-0 flex-1 basis-56 text-2xl font-bold tracking-wider`}
            />
            <Button variant="secondary" onClick={copyPassword} icon={copy === 'copied' ? <CheckIcon /> : <CopyIcon />}>
              {copy === 'copied' ? 'Copied' : 'Copy'}
            </Button>
          </div>
          <p role="status" className="text-sm text-ink-muted">
            {copy === 'failed' && 'Could not copy here: the password is selected, copy it by hand.'}
          </p>
          <p className="rounded-xl bg-warning-soft p-3 font-semibold text-warning">
            Note it down now: this password won't be shown again.
          </p>
          <p>Ask them to choose their own password under Team → Change my password once signed in.</p>
        </>
      )}
      {member && !password && (
        // Only a resent add answers without a password: the first attempt made the member, but its
        // answer (and the one copy of the password) never arrived.
        <p>
          {member.name} was already added by an earlier attempt whose answer did not arrive, so their first password
          was never shown. Use Reset password on their card to make a new one.
        </p>
      )}
    </Dialog>
  );
}
