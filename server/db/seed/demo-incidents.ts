import { randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { localDate } from '../../../shared/domain/event-clock';
import { alertRuleFor } from '../../../shared/domain/incident-alert';
import { classifyIncident, type IncidentKind, type IncidentLocation, type TreatmentCode } from '../../../shared/domain/incident-classification';
import type { InvolvedPersonJson } from '../../../shared/schemas/incidents';
import type { Role } from '../../../shared/roles';
import { Incident, Membership, type Event, type Team, type User } from '../../models';

interface DemoIncident {
  minutesAgo: number;
  location: IncidentLocation;
  kind: IncidentKind;
  description: string;
  involved: InvolvedPersonJson[];
  treatments: TreatmentCode[];
  immediateActions: string;
  reporter: Role;
  followUp: { text: string; owner: Role; dueInDays: number; doneMinutesAgo: number | null };
  closing: { note: string; by: Role; minutesAgo: number } | null;
}

const MINUTE_MS = 60_000;
const DAY_MS = 24 * 60 * MINUTE_MS;

const LOG: readonly DemoIncident[] = [
  {
    minutesAgo: 95,
    location: 'pit',
    kind: 'near_miss',
    description: 'A spare battery slid off the top shelf of the cart as it rolled over the cable ramp and landed next to a student’s foot.',
    involved: [{ initials: 'RT', role: 'student' }],
    treatments: [],
    immediateActions: 'Batteries moved to the bottom shelf; the cart goes round the ramp for now.',
    reporter: 'crew',
    followUp: { text: 'Fit a lip or a strap to the battery cart’s top shelf', owner: 'safety', dueInDays: 1, doneMinutesAgo: null },
    closing: null,
  },
  {
    minutesAgo: 260,
    location: 'pit',
    kind: 'injury',
    description: 'Cut a fingertip on a burr while filing the new bumper bracket.',
    involved: [{ initials: 'MK', role: 'student' }],
    treatments: ['wound_cleaning', 'wound_covering'],
    immediateActions: 'Washed and bandaged from the pit first-aid kit; filing paused until gloves were found.',
    reporter: 'lead',
    followUp: { text: 'Keep cut-resistant gloves in the filing drawer', owner: 'lead', dueInDays: 0, doneMinutesAgo: 200 },
    closing: { note: 'Finger checked at lunch, healing; gloves now live with the files.', by: 'safety', minutesAgo: 180 },
  },
];

/**
 * The demo team's safety log, invented: a near miss in the pit this morning (open, with a
 * follow-up for the safety captain) and a cut finger that needed first aid (closed, its
 * follow-up done). Written as the API would have left them, alert rule applied, but without
 * queueing any mail: a fresh demo must not send alerts about things that never happened.
 */
export async function seedDemoIncidents(
  { team, event, users, now }: { team: Team; event: Event; users: Record<Role, User>; now: Date },
  transaction: Transaction,
) {
  const memberships = await Membership.findAll({ where: { teamId: team.id }, transaction });
  const membershipOf = (role: Role) => memberships.find((member) => member.userId === users[role].id)!;
  const ago = (minutes: number) => new Date(now.getTime() - minutes * MINUTE_MS);
  for (const demo of LOG) {
    const at = ago(demo.minutesAgo);
    const { followUp, closing } = demo;
    await Incident.create(
      {
        teamId: team.id,
        eventId: event.id,
        occurredAt: at,
        location: demo.location,
        kind: demo.kind,
        description: demo.description,
        involved: demo.involved,
        treatments: demo.treatments,
        immediateActions: demo.immediateActions,
        batteryId: null,
        incidentClass: classifyIncident(demo).class,
        alertedRule: alertRuleFor(demo),
        followUps: [
          {
            id: randomUUID(),
            text: followUp.text,
            ownerId: membershipOf(followUp.owner).id,
            dueOn: localDate(new Date(now.getTime() + followUp.dueInDays * DAY_MS), event.timeZone),
            done: followUp.doneMinutesAgo !== null,
            doneAt: followUp.doneMinutesAgo === null ? null : ago(followUp.doneMinutesAgo).toISOString(),
          },
        ],
        status: closing ? 'closed' : 'open',
        closingNote: closing?.note ?? null,
        closedAt: closing ? ago(closing.minutesAgo) : null,
        closedById: closing ? users[closing.by].id : null,
        reporterId: users[demo.reporter].id,
        // Reported a few minutes after it happened.
        createdAt: ago(demo.minutesAgo - 5),
        updatedAt: ago(closing?.minutesAgo ?? demo.minutesAgo - 5),
      },
      { transaction, silent: true },
    );
  }
}
