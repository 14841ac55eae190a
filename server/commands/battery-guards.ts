import type { Transaction } from 'sequelize';
import { HttpError } from '../errors';
import { Battery, BatteryUse, Team } from '../models';

// Tablet clocks drift; a minute ahead of the server is still "now".
const FUTURE_TOLERANCE_MS = 60_000;

/**
 * Battery writes that check state (a free label, an empty robot, a free bay) queue behind the
 * team's row: two tablets can then never both pass the same check.
 */
export const lockTeam = (teamId: string, transaction: Transaction) =>
  Team.findByPk(teamId, { transaction, lock: transaction.LOCK.UPDATE, rejectOnEmpty: true });

export const invalidField = (field: string, message: string) =>
  new HttpError(400, 'invalid', `Check these fields: ${field}`, { fields: { [field]: message } });

/** 400 naming the field when the instant is ahead of the server's clock, or before `notBefore`. */
export function assertInstant(field: string, at: Date, { notBefore, what }: { notBefore?: Date; what?: string } = {}) {
  if (at.getTime() > Date.now() + FUTURE_TOLERANCE_MS) throw invalidField(field, 'Must not be in the future');
  if (notBefore && at < notBefore) throw invalidField(field, `Must not be before ${what} (${notBefore.toISOString()})`);
}

/** 409 `label_taken` when another battery of the team carries the label (letter case aside). */
export async function assertLabelFree(teamId: string, label: string, exceptId: string | null, transaction: Transaction) {
  const other = await Battery.findOne({ where: { teamId, label }, transaction });
  if (other && other.id !== exceptId) {
    throw new HttpError(409, 'label_taken', `Battery ${other.label} already has this label`, {
      fields: { label: `Another battery is labelled ${other.label}: paint a different label` },
    });
  }
}

/** The team's battery in the robot now (one robot, one battery), if any. */
export async function openUseOfTeam(teamId: string, transaction: Transaction) {
  return BatteryUse.findOne({
    where: { removedAt: null },
    include: [{ model: Battery, as: 'battery', where: { teamId }, attributes: [] }],
    transaction,
  });
}
