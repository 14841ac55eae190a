import type { MembershipJson } from '@shared/schemas/session';
import { errorMessage } from '../../../components/ui/error-notice';
import { controlClass } from '../../../components/ui/field';
import { useSwitchTeam } from '../api/switch-team';

/** Lets someone who belongs to several teams choose whose data they see; absent for everyone else. */
export function TeamSwitcher({ memberships }: { memberships: MembershipJson[] }) {
  const switchTeam = useSwitchTeam();
  const active = memberships.find((membership) => membership.active);
  if (memberships.length < 2) return null;
  return (
    <div className="flex flex-col">
      <label htmlFor="team-switcher" className="sr-only">
        Team
      </label>
      <select
        id="team-switcher"
        className={`${controlClass} w-auto max-w-full py-1 text-base font-semibold`}
        value={active?.teamId ?? ''}
        disabled={switchTeam.isPending}
        aria-describedby={switchTeam.isError ? 'team-switcher-error' : undefined}
        onChange={(event) => switchTeam.mutate(event.target.value)}
      >
        {!active && <option value="">Choose a team</option>}
        {memberships.map((membership) => (
          <option key={membership.teamId} value={membership.teamId}>
            {membership.teamNumber} · {membership.teamName}
          </option>
        ))}
      </select>
      {switchTeam.isError && (
        <p id="team-switcher-error" role="alert" className="text-sm font-semibold text-danger">
          {errorMessage(switchTeam.error)}
        </p>
      )}
    </div>
  );
}
