import type { FeaturesJson, MembershipJson, SessionJson } from '../../shared/schemas/session';
import type { AuthContext } from '../auth/types';

export function presentSession({ user, membership, memberships }: AuthContext, csrfToken: string, features: FeaturesJson): SessionJson {
  return {
    user: { id: user.id, name: user.name, email: user.email },
    memberships: memberships.map(
      (m): MembershipJson => ({
        id: m.id,
        teamId: m.teamId,
        teamName: m.team!.name,
        teamNumber: m.team!.number,
        roles: m.roles,
        active: m.id === membership.id,
      }),
    ),
    csrfToken,
    features,
  };
}
