import { randomUUID } from 'node:crypto';
import type { Transaction } from 'sequelize';
import type { z } from 'zod';
import type { followUpField } from '../../shared/schemas/incidents';
import { Membership } from '../models';
import type { StoredFollowUp } from '../models/incident';

type SentFollowUp = z.output<typeof followUpField>;

/**
 * The incident's follow-up list as sent (the whole list, in its order): an entry keeps its id
 * (a new one gets one), and its `doneAt` while it stays done; ticking it done stamps `now`.
 * Owners are checked where they change: a new owner must be an active member of the team, while
 * an owner since gone stays on the entry they had. Answers the list and the fields to refuse.
 */
export async function nextFollowUps(teamId: string, current: readonly StoredFollowUp[], sent: readonly SentFollowUp[], now: Date, transaction: Transaction) {
  const byId = new Map(current.map((followUp) => [followUp.id, followUp]));
  const entries = sent.map((followUp) => ({ followUp, before: followUp.id === undefined ? undefined : byId.get(followUp.id) }));
  const newOwners = [...new Set(entries.filter(({ followUp, before }) => before?.ownerId !== followUp.ownerId).map(({ followUp }) => followUp.ownerId))];
  const members = newOwners.length ? await Membership.findAll({ where: { id: newOwners, teamId, active: true }, attributes: ['id'], transaction }) : [];
  const owners = new Set(members.map((member) => member.id));

  const fields: Record<string, string> = {};
  const ids = new Set<string>();
  const followUps = entries.map(({ followUp, before }, index): StoredFollowUp => {
    if (followUp.id !== undefined && ids.has(followUp.id)) fields[`followUps.${index}.id`] = 'Already in the list';
    if (followUp.id !== undefined) ids.add(followUp.id);
    if (before?.ownerId !== followUp.ownerId && !owners.has(followUp.ownerId)) fields[`followUps.${index}.ownerId`] = 'Must be a member of the team';
    return {
      id: followUp.id ?? randomUUID(),
      text: followUp.text,
      ownerId: followUp.ownerId,
      dueOn: followUp.dueOn,
      done: followUp.done,
      doneAt: followUp.done ? (before?.done && before.doneAt ? before.doneAt : now.toISOString()) : null,
    };
  });
  return { followUps, fields };
}
