import type { Transaction } from 'sequelize';
import { TREATMENT_CODES, type TreatmentCode } from '../../shared/domain/incident-classification';
import { HttpError } from '../errors';
import { Battery, Event, Team } from '../models';

/** 404 for a record of another team (never told apart from a missing one), naming the field that sent it. */
const notOurs = (what: string, field: string, message: string) => new HttpError(404, 'not_found', `${what} not found`, { fields: { [field]: message } });

/**
 * The event a new report belongs to: the team's current one when the body does not say, none
 * when it says `null` (on the road, between events), else one of the team's events.
 */
export async function eventOfReport(team: Team, eventId: string | null | undefined, transaction: Transaction): Promise<string | null> {
  if (eventId === undefined) return team.currentEventId;
  if (eventId === null) return null;
  const event = await Event.findOne({ where: { id: eventId, teamId: team.id }, attributes: ['id'], transaction });
  if (!event) throw notOurs('Event', 'eventId', 'Not an event of this team');
  return event.id;
}

/** 404 unless the battery is one of the team's (a retired one still is). */
export async function assertOurBattery(teamId: string, batteryId: string, transaction: Transaction) {
  if ((await Battery.count({ where: { id: batteryId, teamId }, transaction })) === 0) throw notOurs('Battery', 'batteryId', 'Not a battery of this team');
}

/** Treatments in the list's order, whatever order they were ticked in: equal care, equal record. */
export const inListOrder = (treatments: readonly TreatmentCode[]) => TREATMENT_CODES.filter((code) => treatments.includes(code));
