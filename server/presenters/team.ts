import type { MemberJson, TeamJson } from '../../shared/schemas/team';
import type { Membership, Team } from '../models';

export const presentTeam = (team: Team): TeamJson => ({
  id: team.id,
  name: team.name,
  number: team.number,
  currentEventId: team.currentEventId ?? null,
});

/** A membership with its user loaded; the e-mail only for those who manage members. */
export const presentMember = (membership: Membership, { withEmail = true } = {}): MemberJson => ({
  id: membership.id,
  userId: membership.userId,
  name: membership.user!.name,
  ...(withEmail ? { email: membership.user!.email } : {}),
  roles: membership.roles,
  active: membership.active,
  version: membership.version,
  createdAt: membership.createdAt.toISOString(),
});
