import type { SubsystemJson, SubsystemsInput, SubsystemsJson } from '../../shared/schemas/repairs';
import { inTransaction } from '../db/transaction';
import { stale } from '../errors';
import { RepairSetting, Team } from '../models';
import { emitToTeam } from '../realtime/broadcast';
import { slugOf, subsystemsOf, uniqueKey } from '../repairs/subsystems';
import { assertNoInvalidFields } from './input-guards';

/** The list as sent, each entry with a key: its own, or one made from its label; 400 on a repeat. */
function keyed(entries: SubsystemsInput['subsystems']): SubsystemJson[] {
  const fields: Record<string, string> = {};
  const labels = new Map<string, number>();
  const keys = new Set<string>();
  entries.forEach(({ key, label }, index) => {
    const folded = label.toLocaleLowerCase('en');
    if (labels.has(folded)) fields[`subsystems.${index}.label`] = 'Already in the list';
    labels.set(folded, index);
    if (key !== undefined && keys.has(key)) fields[`subsystems.${index}.key`] = 'Already in the list';
    if (key !== undefined) keys.add(key);
  });
  assertNoInvalidFields(fields);
  // Keys sent are kept first, so a new entry never takes the key of one that is staying.
  return entries.map(({ key, label }) => {
    if (key !== undefined) return { key, label };
    const made = uniqueKey(slugOf(label), keys);
    keys.add(made);
    return { key: made, label };
  });
}

/**
 * Replaces the team's subsystem list, refusing a stale `version`. A subsystem taken off the list
 * stays on the tickets that name it (they show its key); new tickets cannot pick it. A list
 * equal to the current one writes nothing.
 */
export async function updateRepairSubsystems(teamId: string, { version, subsystems }: SubsystemsInput): Promise<SubsystemsJson> {
  return inTransaction(async (transaction) => {
    await Team.lockRow(teamId, transaction);
    const current = await subsystemsOf(teamId, transaction);
    if (version !== current.version) throw stale(current);
    const next = keyed(subsystems);
    if (JSON.stringify(next) === JSON.stringify(current.subsystems)) return current;
    const updated = { subsystems: next, version: current.version + 1 };
    await RepairSetting.upsert({ teamId, ...updated }, { transaction });
    transaction.afterCommit(() => emitToTeam(teamId, 'repairs:subsystems-changed', {}));
    return updated;
  });
}
