import type { CreateChargerInput } from '../../shared/schemas/batteries';
import { inTransaction } from '../db/transaction';
import { HttpError } from '../errors';
import { Charger, Team } from '../models';
import { presentCharger } from '../presenters/battery';
import { emitToTeam } from '../realtime/broadcast';


/** Adds a charger with its bays. Idempotent on `id`, like every create. */
export async function createCharger(teamId: string, { id, ...fields }: CreateChargerInput) {
  return inTransaction(async (transaction) => {
    await Team.lockRow(teamId, transaction);
    if (id) {
      const existing = await Charger.findByPk(id, { transaction });
      if (existing?.teamId === teamId) return { charger: presentCharger(existing), created: false };
      if (existing) throw new HttpError(409, 'id_taken', 'This id is already used by another record');
    }
    const charger = await Charger.create({ id, teamId, ...fields }, { transaction });
    transaction.afterCommit(() => emitToTeam(teamId, 'batteries:changed', { id: charger.id }));
    return { charger: presentCharger(charger), created: true };
  });
}
