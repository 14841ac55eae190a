import type { Transaction } from 'sequelize';
import { can } from '../../shared/roles';
import { Match, Membership } from '../models';
import { subsystemsOf } from './subsystems';

export const MESSAGES = {
  subsystem: 'Pick a subsystem from the list',
  foundInMatchId: 'Pick a match of this event',
  assigneeId: 'Pick a member of the team who works on repairs',
};

/** What a ticket names that the database must vouch for; undefined (or unchanged) is not checked. */
export interface References {
  subsystem?: string;
  foundInMatchId?: string | null;
  assigneeId?: string | null;
}

/**
 * The fields that name something the team does not have: a subsystem off its list, a match of
 * another event, an assignee who is not an active member with `repairs:work`. Answers
 * field → message, in the order the body lists them.
 */
export async function invalidReferences(teamId: string, eventId: string, references: References, transaction: Transaction) {
  const fields: Record<string, string> = {};
  if (references.subsystem !== undefined) {
    const { subsystems } = await subsystemsOf(teamId, transaction);
    if (!subsystems.some((entry) => entry.key === references.subsystem)) fields.subsystem = MESSAGES.subsystem;
  }
  if (references.foundInMatchId) {
    const match = await Match.findOne({ where: { id: references.foundInMatchId, eventId }, attributes: ['id'], transaction });
    if (!match) fields.foundInMatchId = MESSAGES.foundInMatchId;
  }
  if (references.assigneeId) {
    const membership = await Membership.findOne({ where: { teamId, userId: references.assigneeId, active: true }, transaction });
    if (!membership || !can(membership.roles, 'repairs:work')) fields.assigneeId = MESSAGES.assigneeId;
  }
  return fields;
}
