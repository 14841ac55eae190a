import { useNavigate } from 'react-router';
import type { SessionJson } from '@shared/schemas/session';
import { Button } from '../components/ui/button';
import { ErrorNotice } from '../components/ui/error-notice';
import { Wordmark } from '../components/ui/wordmark';
import { useSignOut } from '../features/session/api/sign-out';
import { useSwitchTeam } from '../features/session/api/switch-team';

/** Signed in, but no team is active: either none yet, or one must be picked first. */
export function NoTeam({ session }: { session: SessionJson }) {
  const navigate = useNavigate();
  const switchTeam = useSwitchTeam();
  const signOut = useSignOut();
  const { memberships } = session;

  return (
    <main className="mx-auto flex min-h-dvh max-w-xl flex-col justify-center gap-6 px-4 py-10">
      <Wordmark size="lg" />
      <h1 className="text-3xl font-bold">
        {memberships.length ? 'Choose a team' : `Welcome, ${session.user.name}`}
      </h1>
      <p className="text-lg text-ink-muted">
        {memberships.length
          ? 'You belong to more than one team. Pick the one whose pit you are working in.'
          : 'You are not on a team yet. Ask a mentor to add you from their team page.'}
      </p>
      {switchTeam.isError && <ErrorNotice error={switchTeam.error} />}
      {signOut.isError && <ErrorNotice error={signOut.error} />}
      <div className="flex flex-col gap-3">
        {memberships.map((membership) => (
          <Button
            key={membership.teamId}
            size="lg"
            pending={switchTeam.isPending && switchTeam.variables === membership.teamId}
            onClick={() => switchTeam.mutate(membership.teamId)}
          >
            {membership.teamNumber} · {membership.teamName}
          </Button>
        ))}
        <Button
          variant="secondary"
          size="lg"
          pending={signOut.isPending}
          onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate('/sign-in', { replace: true }) })}
        >
          Sign out
        </Button>
      </div>
    </main>
  );
}
