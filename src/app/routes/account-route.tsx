import { useCallback } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router';
import type { SessionJson } from '@shared/schemas/session';
import { AccountLinkPage } from '../../features/account/components/account-link-page';
import { rememberSession } from '../../features/session/api/sign-in';

/** A link from an e-mail signs the person in: the session feature keeps the session, the board opens. */
export function AccountLinkRoute() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const signedIn = useCallback(
    (session: SessionJson) => {
      rememberSession(queryClient, session);
      void navigate('/', { replace: true });
    },
    [queryClient, navigate],
  );
  return <AccountLinkPage onSignedIn={signedIn} />;
}
