import { addDays, formatISO } from 'date-fns';
import { TZDate } from '@date-fns/tz';
import type { Transaction } from 'sequelize';
import type { Role } from '../../../shared/roles';
import { hashPassword } from '../../auth/passwords';
import { Event, FieldMark, Match, Membership, Team, User } from '../../models';
import { seedDemoBatteries } from './demo-batteries';
import { seedDemoChecklists, type DemoChecklistMatch } from './demo-checklists';
import { seedDemoIncidents } from './demo-incidents';
import { seedDemoRepairs } from './demo-repairs';
import { demoSchedule } from './demo-schedule';
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
 * Seeds the invented demo team with one account per role, its event's qualification schedule
 * (the field partway through day one), its checklists, its battery fleet, its repair board and
 * its safety log.
 * Refuses in production, where well-known passwords must never exist.
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
    const users = {} as Record<Role, User>;
    for (const { role, name } of DEMO_USERS) {
      users[role] = await User.create({ email: demoEmail(role), name, passwordHash }, { transaction });
      await Membership.create({ teamId: team.id, userId: users[role].id, roles: [role] }, { transaction });
    }
    const matches = await createDemoMatches({ eventId: event.id, ourNumber: DEMO_TEAM.number, markedById: users.lead.id, now }, transaction);
    await seedDemoChecklists({ team, event, users, matches, now }, transaction);
    await seedDemoBatteries({ team, event, users, matches, now }, transaction);
    await seedDemoRepairs({ event, users, matches, now }, transaction);
    await seedDemoIncidents({ team, event, users, now }, transaction);
  });
}

/** The demo schedule's matches and field marks for an event; answers them as the checklists read them. */
export async function createDemoMatches(
  { eventId, ourNumber, markedById, now }: { eventId: string; ourNumber: number; markedById: string; now: Date },
  transaction: Transaction,
): Promise<DemoChecklistMatch[]> {
  const created: DemoChecklistMatch[] = [];
  for (const match of demoSchedule({ now, ourNumber })) {
    const { id } = await Match.create(
      {
        eventId,
        level: 'qualification',
        number: match.number,
        scheduledStart: match.scheduledStart,
        red1: match.red[0],
        red2: match.red[1],
        red3: match.red[2],
        blue1: match.blue[0],
        blue2: match.blue[1],
        blue3: match.blue[2],
      },
      { transaction },
    );
    if (match.startedAt) await FieldMark.create({ eventId, matchId: id, startedAt: match.startedAt, markedById }, { transaction });
    const alliance = match.red.includes(ourNumber) ? 'red' : match.blue.includes(ourNumber) ? 'blue' : null;
    created.push({ id, scheduledStart: match.scheduledStart, startedAt: match.startedAt, alliance });
  }
  return created;
}
