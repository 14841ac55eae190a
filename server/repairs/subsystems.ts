import type { Transaction } from 'sequelize';
import type { SubsystemJson, SubsystemsJson } from '../../shared/schemas/repairs';
import { RepairSetting } from '../models';

/** The list every team starts with (the issue's), until a lead edits it. */
export const DEFAULT_SUBSYSTEMS: readonly SubsystemJson[] = [
  { key: 'drivetrain', label: 'Drivetrain' },
  { key: 'intake', label: 'Intake' },
  { key: 'elevator', label: 'Elevator' },
  { key: 'arm', label: 'Arm' },
  { key: 'end_effector', label: 'End effector' },
  { key: 'electrical', label: 'Electrical' },
  { key: 'pneumatics', label: 'Pneumatics' },
  { key: 'software', label: 'Software' },
  { key: 'bumpers', label: 'Bumpers' },
  { key: 'other', label: 'Other' },
];

const KEY_MAX = 40;

/** The team's subsystem list: its row, or the defaults at version 0 while it has none. */
export async function subsystemsOf(teamId: string, transaction?: Transaction): Promise<SubsystemsJson> {
  const row = await RepairSetting.findByPk(teamId, { transaction });
  if (!row) return { subsystems: DEFAULT_SUBSYSTEMS.map((entry) => ({ ...entry })), version: 0 };
  return { subsystems: row.subsystems, version: row.version };
}

/** "End effector" → `end_effector`: lowercase, anything else than a-z0-9 → `_`, trimmed to 40. */
export function slugOf(label: string): string {
  const slug = label
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '_')
    .replace(/^_+|_+$/g, '')
    .slice(0, KEY_MAX)
    .replace(/_+$/, '');
  // A label of symbols alone ("⚙") still needs a key.
  return slug || 'subsystem';
}

/** `base`, or `base_2`, `base_3`… (kept within 40 characters), whichever is not taken yet. */
export function uniqueKey(base: string, taken: ReadonlySet<string>): string {
  if (!taken.has(base)) return base;
  for (let n = 2; ; n++) {
    const suffix = `_${n}`;
    const key = `${base.slice(0, KEY_MAX - suffix.length)}${suffix}`;
    if (!taken.has(key)) return key;
  }
}
