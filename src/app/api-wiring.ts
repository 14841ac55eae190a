import type { QueryClient } from '@tanstack/react-query';
import type { createBrowserRouter } from 'react-router';
import { sessionQueryOptions } from '../features/session/api/get-session';
import { connectSession } from '../lib/api-client';
import { signInPath } from '../lib/safe-next';

type Router = ReturnType<typeof createBrowserRouter>;

/** True while the app is on, or already heading to, the sign-in page. */
function isBoundForSignIn(router: Router): boolean {
  const { location, navigation } = router.state;
  return location.pathname === '/sign-in' || navigation.location?.pathname === '/sign-in';
}

/**
 * Gives the API client what it needs from the session: the CSRF token it must send, a way to
 * renew it, and where to go when the server says the session is over. Lives in the app layer
 * because it joins three parts (lib, the session feature, the router) that must not know each other.
 */
export function wireApiClient(router: Router, queryClient: QueryClient): void {
  const sessionEnded = () => {
    // Several calls failing at once would each redirect; the first one is enough.
    if (isBoundForSignIn(router)) return;
    const { pathname, search, hash } = router.state.location;
    void router.navigate(signInPath(pathname + search + hash), { replace: true });
  };

  connectSession({
    csrfToken: () => queryClient.getQueryData(sessionQueryOptions().queryKey)?.csrfToken,
    refreshCsrfToken: async () => {
      const session = await queryClient.fetchQuery({ ...sessionQueryOptions(), staleTime: 0 });
      if (!session) sessionEnded();
      return session?.csrfToken;
    },
    sessionEnded,
  });
}
