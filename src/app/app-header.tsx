import { useNavigate } from 'react-router';
import type { MembershipJson } from '@shared/schemas/session';
import { Button } from '../components/ui/button';
import { ErrorNotice } from '../components/ui/error-notice';
import { CurrentIcon, SignOutIcon, UserIcon } from '../components/ui/icons';
import { Wordmark } from '../components/ui/wordmark';
import { useCurrentEvent } from '../features/events/api/get-events';
import { useSignOut } from '../features/session/api/sign-out';
import { TeamSwitcher } from '../features/session/components/team-switcher';
import { useCan, useViewer } from '../lib/authorization';
import { LiveStatusTag, type LiveStatus } from './live-updates';

function CurrentEventName() {
  const canRead = useCan('events:read');
  const currentEvent = useCurrentEvent({ enabled: canRead });
  if (!canRead || !currentEvent.isSuccess) return null;
  return currentEvent.data ? (
    <p className="flex min-w-0 items-center gap-2 font-semibold">
      <CurrentIcon className="size-5 text-accent-ink" />
      <span className="sr-only">Current event: </span>
      <span className="truncate" data-testid="shell-current-event">
        {currentEvent.data.name}
      </span>
    </p>
  ) : (
    <p className="text-ink-muted">No current event</p>
  );
}

function ActiveTeam({ memberships, active }: { memberships: MembershipJson[]; active: MembershipJson }) {
  if (memberships.length > 1) return <TeamSwitcher memberships={memberships} />;
  return (
    <p className="min-w-0 truncate font-semibold">
      <span className="tabular-nums">{active.teamNumber}</span> · {active.teamName}
    </p>
  );
}

function UserName({ name, className }: { name: string; className: string }) {
  return (
    <p className={`min-w-0 items-center gap-1.5 text-ink-muted ${className}`}>
      <UserIcon className="size-5" />
      <span className="sr-only">Signed in as </span>
      <span className="max-w-48 truncate">{name}</span>
    </p>
  );
}

export function AppHeader({ memberships, liveStatus }: { memberships: MembershipJson[]; liveStatus: LiveStatus }) {
  const { user, membership } = useViewer();
  const navigate = useNavigate();
  const signOut = useSignOut();

  return (
    // Sticky from tablet width up; on a phone it scrolls away and leaves the screen to the page.
    <header className="z-30 border-b border-line bg-surface sm:sticky sm:top-0">
      <div className="mx-auto flex max-w-screen-2xl flex-wrap items-center gap-x-6 gap-y-1 px-4 py-2 lg:px-6">
        <Wordmark />
        {/* Below desktop width the team and event get a row of their own rather than being cut short. */}
        <div className="order-last flex w-full min-w-0 flex-wrap items-center gap-x-5 gap-y-1 pb-1 lg:order-none lg:w-auto lg:flex-1 lg:pb-0">
          <ActiveTeam memberships={memberships} active={membership} />
          <CurrentEventName />
          {/* On a phone the name joins this row; row one has room only for the mark and Sign out. */}
          <UserName name={user.name} className="flex sm:hidden" />
        </div>
        <div className="ml-auto flex items-center gap-3">
          <LiveStatusTag status={liveStatus} />
          <UserName name={user.name} className="hidden sm:flex" />
          <Button
            variant="secondary"
            icon={<SignOutIcon className="size-5" />}
            pending={signOut.isPending}
            onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate('/sign-in', { replace: true }) })}
          >
            Sign out
          </Button>
        </div>
      </div>
      {signOut.isError && (
        <div className="mx-auto max-w-screen-2xl px-4 pb-3 lg:px-6">
          <ErrorNotice title="Still signed in" error={signOut.error} />
        </div>
      )}
    </header>
  );
}
