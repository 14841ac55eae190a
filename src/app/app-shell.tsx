import { useMemo } from 'react';
import { Navigate, Outlet, useLocation, useNavigation } from 'react-router';
import { OfflineIcon } from '../components/ui/icons';
import { Loading } from '../components/ui/loading';
import { activeMembership, useSession } from '../features/session/api/get-session';
import { ViewerProvider, type Viewer } from '../lib/authorization';
import { signInPath } from '../lib/safe-next';
import { useOnline } from '../lib/use-online';
import { AppHeader } from './app-header';
import { AppNav } from './app-nav';
import { useLiveUpdates } from './live-updates';

function OfflineBanner() {
  const online = useOnline();
  if (online) return null;
  return (
    <p role="status" className="flex items-center gap-2 bg-warning-soft px-4 py-2 font-semibold text-warning lg:px-6">
      <OfflineIcon className="size-5" />
      No network. Showing what was last loaded; nothing can be saved until the connection is back.
    </p>
  );
}

/** The signed-in frame: header, navigation and the area's page. */
export function AppShell() {
  const session = useSession().data;
  const location = useLocation();
  const navigation = useNavigation();
  const membership = session ? activeMembership(session) : undefined;
  const liveStatus = useLiveUpdates(membership?.teamId ?? '');
  const viewer = useMemo<Viewer | null>(
    () => (session && membership ? { user: session.user, membership } : null),
    [session, membership],
  );

  // The route's loader guarantees a session on entry; it can still end later (a refetch after
  // one's own deactivation, or the sign-in page asking the server during sign-out).
  if (session === undefined) return <Loading label="Opening Pitwright" />;
  if (session === null) {
    if (navigation.location?.pathname === '/sign-in') return null;
    return <Navigate to={signInPath(location.pathname + location.search + location.hash)} replace />;
  }
  // The server marks one membership active in every session answer (it refuses to sign in an
  // account with none), so this is a broken answer: the route's error page says so.
  if (!viewer) throw new Error('The server did not say which team you are working in. Reload the page.');

  return (
    <ViewerProvider value={viewer}>
      <a
        href="#main"
        className="sr-only z-40 rounded-xl bg-accent px-4 py-3 font-semibold text-on-accent focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
      >
        Skip to content
      </a>
      {/* On paper (printed battery labels) only the page itself shows. */}
      <div className="contents print:hidden">
        <AppHeader memberships={session.memberships} liveStatus={liveStatus} />
        <OfflineBanner />
      </div>
      <div className="mx-auto flex w-full max-w-screen-2xl">
        <div className="contents print:hidden">
          <AppNav />
        </div>
        <main id="main" className="min-w-0 flex-1 px-4 pt-6 pb-32 sm:px-6 lg:px-8 lg:pb-12 print:p-0">
          <Outlet />
        </main>
      </div>
    </ViewerProvider>
  );
}
