import type { BatterySettings } from '../../shared/domain/battery-state';
import type { BatterySettingsInput } from '../../shared/schemas/batteries';
import { settingsOf } from '../batteries/settings';
import { inTransaction } from '../db/transaction';
import { BatterySetting, Team } from '../models';
import { emitToTeam } from '../realtime/broadcast';
import { invalidField } from './input-guards';

/**
 * Changes some of the team's battery settings; the team gets its own row on its first change.
 * The watch threshold stays below the replace one, whichever of the two is sent.
 */
export async function updateBatterySettings(teamId: string, changes: BatterySettingsInput): Promise<BatterySettings> {
  return inTransaction(async (transaction) => {
    await Team.lockRow(teamId, transaction);
    const settings: BatterySettings = { ...(await settingsOf(teamId, transaction)), ...changes };
    if (settings.watchIncreasePercent >= settings.replaceIncreasePercent) {
      const field = changes.replaceIncreasePercent !== undefined ? 'replaceIncreasePercent' : 'watchIncreasePercent';
      throw invalidField(field, field === 'replaceIncreasePercent' ? 'Must be above the watch threshold' : 'Must be below the replace threshold');
    }
    await BatterySetting.upsert({ teamId, ...settings }, { transaction });
    transaction.afterCommit(() => emitToTeam(teamId, 'batteries:changed', { id: teamId }));
    return settings;
  });
}
