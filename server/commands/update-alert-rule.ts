import type { AlertRuleInput, AlertRuleJson, AlertRuleKey } from '../../shared/schemas/mail';
import { inTransaction } from '../db/transaction';
import { stale } from '../errors';
import { alertRuleOf } from '../incidents/alert-rules';
import { AlertRule, Team } from '../models';

// Both lists are free of repeats (the schema drops them): equal sizes and one inside the other is the same set.
const sameSet = (a: readonly string[], b: readonly string[]) => a.length === b.length && a.every((value) => b.includes(value));

/**
 * Sets whom one alert rule reaches (roles and extra addresses), refusing a stale `version`
 * (0 for the defaults): 409 with the rule as it is now. The same roles and addresses in
 * another order write nothing.
 */
export async function updateAlertRule(teamId: string, key: AlertRuleKey, { version, roles, extraAddresses }: AlertRuleInput): Promise<AlertRuleJson> {
  return inTransaction(async (transaction) => {
    await Team.lockRow(teamId, transaction);
    const current = await alertRuleOf(teamId, key, transaction);
    if (version !== current.version) throw stale(current);
    if (sameSet(roles, current.roles) && sameSet(extraAddresses, current.extraAddresses)) return current;
    const updated = { key, roles, extraAddresses, version: current.version + 1 };
    await AlertRule.upsert({ teamId, ...updated }, { transaction });
    return updated;
  });
}
