import { addDays, formatISO } from 'date-fns';
import { TZDate } from '@date-fns/tz';
import type { Role } from '../../../shared/roles';
import { hashPassword } from '../../auth/passwords';
import { Event, Membership, Team, User } from '../../models';
import { inTransaction } from '../transaction';

export const DEMO_PASSWORD = 'pitwright-demo';
export const DEMO_DOMAIN = 'demo.pitwright.test';

// Everything here is invented: team, event, venue and people.
const DEMO_TEAM = { number: 28417, name: 'Quillfeather Mechanics' };
const DEMO_EVENT = { name: 'Harrowgate District Qualifier', venue: 'Millbrook Civic Arena', timeZone: 'America/Chicago' };
export const DEMO_USERS: { role: Role; name: string }[] = [
  { role: 'admin', name: 'Demo Mentor' },
  { role: 'lead', name: 'Demo Pit Lead' },
  { role: 'crew', name: 'Demo Crew Member' },
  { role: 'battery', name: 'Demo Battery Handler' },
  { role: 'safety', name: 'Demo Safety Captain' },
  { role: 'viewer', name: 'Demo Viewer' },
];

export const demoEmail = (role: Role) => `${role}@${DEMO_DOMAIN}`;

/**
 * Seeds the invented demo team with one account per role. Refuses in production, where
 * well-known passwords must never exist.
 */
export async function seedDemo({ env, now = new Date() }: { env: string; now?: Date }) {
  if (env === 'production') throw new Error('Refusing to seed demo accounts with NODE_ENV=production');
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  // The demo event runs today and tomorrow at the venue, so the board always has something live.
  const venueToday = new TZDate(now, DEMO_EVENT.timeZone);
  await inTransaction(async (transaction) => {
    const team = await Team.create(DEMO_TEAM, { transaction });
    const event = await Event.create(
      {
        ...DEMO_EVENT,
        teamId: team.id,
        teamNumber: DEMO_TEAM.number,
        startDate: formatISO(venueToday, { representation: 'date' }),
        endDate: formatISO(addDays(venueToday, 1), { representation: 'date' }),
      },
      { transaction },
    );
    await team.update({ currentEventId: event.id }, { transaction });
    for (const { role, name } of DEMO_USERS) {
      const user = await User.create({ email: demoEmail(role), name, passwordHash }, { transaction });
      await Membership.create({ teamId: team.id, userId: user.id, roles: [role] }, { transaction });
    }
  });
}
