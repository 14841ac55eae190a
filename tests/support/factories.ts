import { randomUUID } from 'node:crypto';
import { ROLES, type Role } from '../../shared/roles';
import { hashPassword } from '../../server/auth/passwords';
import { Event, Membership, Team, User } from '../../server/models';

export const PASSWORD = 'factory-password-1';
let passwordHash: Promise<string> | undefined;

/** Fresh, unique e-mail: files share one database. */
export const uniqueEmail = (label: string) => `${label}-${randomUUID().slice(0, 8)}@factory.pitwright.test`;

/**
 * A team with one member per role (all sharing PASSWORD) and a current event. Returns the
 * e-mail of each role's member, keyed by role.
 */
export async function makeTeam({ number = 29000 + Math.floor(Math.random() * 900) } = {}) {
  passwordHash ??= hashPassword(PASSWORD);
  const team = await Team.create({ number, name: `Factory Team ${number}` });
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
  const emails = {} as Record<Role, string>;
  const memberships = {} as Record<Role, Membership>;
  for (const role of ROLES) {
    const user = await User.create({ email: uniqueEmail(role), name: `Factory ${role}`, passwordHash: await passwordHash });
    memberships[role] = await Membership.create({ teamId: team.id, userId: user.id, roles: [role] });
    emails[role] = user.email;
  }
  return { team, event, emails, memberships };
}
