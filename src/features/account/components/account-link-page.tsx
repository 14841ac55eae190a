import { useEffect, useRef, useState } from 'react';
import { useLocation } from 'react-router';
import { accountLinkCheckSchema } from '@shared/schemas/mail';
import type { SessionJson } from '@shared/schemas/session';
import { ErrorNotice } from '../../../components/ui/error-notice';
import { Loading } from '../../../components/ui/loading';
import { SignedOutPage } from '../../../components/ui/signed-out-page';
import { isApiError } from '../../../lib/api-client';
import { useAccountLink } from '../api/check-account-link';
import { AccountLinkForm } from './account-link-form';
import { LinkNotValid } from './link-not-valid';

/** The token travels after `#` so that it never reaches a server log or a Referer header. */
function tokenOf(hash: string): string | null {
  const token = new URLSearchParams(hash.replace(/^#/, '')).get('token');
  return token !== null && accountLinkCheckSchema.safeParse({ token }).success ? token : null;
}

function CheckedLink({ token, onSignedIn }: { token: string; onSignedIn: (session: SessionJson) => void }) {
  const link = useAccountLink(token);
  const [gone, setGone] = useState<{ afterLostAnswer: boolean } | null>(null);
  if (link.isPending) return <Loading label="Checking the link" />;
  if (gone || isApiError(link.error, 'link_not_valid')) return <LinkNotValid afterLostAnswer={gone?.afterLostAnswer} />;
  if (link.isError) {
    return (
      <div className="w-full max-w-md">
        <ErrorNotice title="Could not check the link" error={link.error} onRetry={() => link.refetch()} retrying={link.isFetching} />
      </div>
    );
  }
  return <AccountLinkForm token={token} link={link.data} onSignedIn={onSignedIn} onLinkGone={(afterLostAnswer) => setGone({ afterLostAnswer })} />;
}

/**
 * `/account-link#token=…`, the page an invite or a new-password e-mail opens. `onSignedIn` (from
 * the app) makes the new session current and opens the board.
 */
export function AccountLinkPage({ onSignedIn }: { onSignedIn: (session: SessionJson) => void }) {
  const { hash } = useLocation();
  const token = tokenOf(hash);
  const [session, setSession] = useState<SessionJson | null>(null);
  const handedOn = useRef(false);

  // Handed on only once the form, and with it the check of the now used link, is gone: dropping
  // the old cache while it was still on screen would check the link again and show "not valid".
  useEffect(() => {
    if (!session || handedOn.current) return;
    handedOn.current = true;
    onSignedIn(session);
  }, [session, onSignedIn]);

  return (
    <SignedOutPage>
      {session ? (
        <Loading label="Signing you in" />
      ) : token ? (
        <CheckedLink key={token} token={token} onSignedIn={setSession} />
      ) : (
        <LinkNotValid />
      )}
    </SignedOutPage>
  );
}
