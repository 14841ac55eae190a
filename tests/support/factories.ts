import { randomUUID } from 'node:crypto';
import { ROLES, type Role } from '../../shared/roles';
import { hashPassword } from '../../server/auth/passwords';
import { Event, Membership, Team, User } from '../../server/models';

export const PASSWORD = 'factory-password-1';
let passwordHash: Promise<string> | undefined;

/** Fresh, unique e-mail: files share one database. */
export const uniqueEmail = (label: string) => `${label}-${randomUUID().slice(0, 8)}@factory.pitwright.test`;

const randomTeamNumber = () => 29000 + Math.floor(Math.random() * 900);

/**
 * A team with one member per role (all sharing PASSWORD) and a current event. Returns the
 * e-mail of each role's member, keyed by role.
 */
export async function makeTeam({ number = randomTeamNumber() } = {}) {
  const { team, emails, memberships } = await makeTeamWithoutEvent({ number });
  const event = await Event.create({
    teamId: team.id,
    name: `Factory Event ${number}`,
    venue: 'Factory Hall',
    timeZone: 'Europe/Berlin',
    startDate: '2026-12-05',
    endDate: '2026-12-06',
    teamNumber: number,
  });
  await team.update({ currentEventId: event.id });
  return { team, event, emails, memberships };
}
export type FactoryTeam = Awaited<ReturnType<typeof makeTeam>>;

/** Like makeTeam, but the team has no event yet (a team on its first day). */
export async function makeTeamWithoutEvent({ number = randomTeamNumber() } = {}) {
  passwordHash ??= hashPassword(PASSWORD);
  const team = await Team.create({ number, name: `Factory Team ${number}` });
  const emails = {} as Record<Role, string>;
  const memberships = {} as Record<Role, Membership>;
  for (const role of ROLES) {
    const user = await User.create({ email: uniqueEmail(role), name: `Factory ${role}`, passwordHash: await passwordHash });
    memberships[role] = await Membership.create({ teamId: team.id, userId: user.id, roles: [role] });
    emails[role] = user.email;
  }
  return { team, emails, memberships };
}

/** A valid body for POST /api/events; override any field. */
export const eventBody = (overrides: Record<string, unknown> = {}) => ({
  name: 'Fenwick Valley Qualifier',
  venue: 'Ostermoor Exhibition Hall',
  timeZone: 'America/Chicago',
  startDate: '2027-03-04',
  endDate: '2027-03-06',
  teamNumber: 24321,
  ...overrides,
});

/** A second team for an existing account, as an operator would link it (the API refuses to). */
export const joinTeam = (userId: string, teamId: string, roles: Role[]) => Membership.create({ teamId, userId, roles });

/** The timeline settings every new event starts with. */
export const DEFAULT_SETTINGS = {
  queueLead: { matches: 2 },
  matchLengthSeconds: 150,
  returnToPitMinutes: 5,
  tightTurnaroundMinutes: 20,
  allowRunningAhead: false,
};
