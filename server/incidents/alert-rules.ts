import type { Transaction } from 'sequelize';
import { ALERT_RULE_KEYS, DEFAULT_ALERT_ROLES, type AlertRuleJson, type AlertRuleKey } from '../../shared/schemas/mail';
import { AlertRule } from '../models';

// A rule without a row has its defaults, at version 0.
const presentRule = (key: AlertRuleKey, row: AlertRule | undefined): AlertRuleJson =>
  row ? { key, roles: row.roles, extraAddresses: row.extraAddresses, version: row.version } : { key, roles: [...DEFAULT_ALERT_ROLES[key]], extraAddresses: [], version: 0 };

/** One rule as the team has it. */
export async function alertRuleOf(teamId: string, key: AlertRuleKey, transaction?: Transaction): Promise<AlertRuleJson> {
  return presentRule(key, (await AlertRule.findOne({ where: { teamId, key }, transaction })) ?? undefined);
}

/** Every rule of the team, in ALERT_RULE_KEYS order. */
export async function alertRulesOf(teamId: string, transaction?: Transaction): Promise<AlertRuleJson[]> {
  const rows = await AlertRule.findAll({ where: { teamId }, transaction });
  return ALERT_RULE_KEYS.map((key) => presentRule(key, rows.find((row) => row.key === key)));
}
