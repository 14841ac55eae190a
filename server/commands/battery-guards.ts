import type { Transaction } from 'sequelize';
import { HttpError } from '../errors';
import { Battery, BatteryUse } from '../models';

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
