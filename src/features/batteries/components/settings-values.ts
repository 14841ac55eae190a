import { BATTERY_DEFAULTS, type BatterySettings, type SocTableName } from '@shared/domain/battery-state';
import { batterySettingsSchema } from '@shared/schemas/batteries';
import { parseForm, type FieldErrors } from '../../../lib/form-errors';
import { readDecimal } from './read-decimal';

type NumberSetting = Exclude<keyof BatterySettings, 'socTable'>;

/** The settings as typed; an empty "replace above" means no absolute limit. */
export type SettingsValues = { socTable: SocTableName } & Record<NumberSetting, string>;

/**
 * Each number, its unit, and where its default comes from (shared/domain/battery-state.ts,
 * REFERENCES §2–§4), in the order the form shows them.
 */
export const NUMBER_SETTINGS: { field: NumberSetting; label: string; unit: string; hint: string }[] = [
  {
    field: 'watchIncreasePercent',
    label: 'Health “watch” at a resistance rise of',
    unit: '%',
    hint: 'Over the battery’s own baseline. From a commercial restatement of IEEE 1188, weakly sourced.',
  },
  {
    field: 'replaceIncreasePercent',
    label: 'Health “replace” at a rise of',
    unit: '%',
    hint: 'Makers almost all want 50 % or more over the baseline for a warranty replacement (tech note on IEEE 1188-2005).',
  },
  {
    field: 'replaceAboveMilliohm',
    label: 'Also “replace” above',
    unit: 'mΩ',
    hint: 'Empty for no absolute limit. Common practice: teams pull 18 Ah batteries above about 25 mΩ; a healthy new one reads about 10–20 mΩ.',
  },
  {
    field: 'baselineReadings',
    label: 'First readings that make the baseline',
    unit: '',
    hint: 'Their median; take them with the same analyzer and probe placement (IEEE 1188 practice).',
  },
  {
    field: 'minimumStartChargePercent',
    label: 'Least charge to start a match',
    unit: '%',
    hint: 'The rotation plan never puts in a battery below it, and readiness flags one.',
  },
  {
    field: 'chargeFactor',
    label: 'Charge factor',
    unit: '×',
    hint: 'Ah put back per Ah taken out: AGM and gel 1.04–1.12, flooded 1.15–1.30 (a battery maker’s guide).',
  },
  {
    field: 'chargeTailMinutes',
    label: 'Charger’s finishing tail',
    unit: 'min',
    hint: 'Added to every recharge estimate for the slow absorption stage (common practice).',
  },
  {
    field: 'peukertExponent',
    label: 'Peukert exponent',
    unit: '',
    hint: 'How much capacity shrinks at high current: sealed AGM about 1.05–1.15, higher with age (Peukert’s law, Wikipedia).',
  },
  {
    field: 'matchAverageCurrentA',
    label: 'Average current in a match',
    unit: 'A',
    hint: 'Estimates the charge a match takes until enough before-and-after readings exist.',
  },
];

export function settingsValuesOf(settings: BatterySettings): SettingsValues {
  const values = { socTable: settings.socTable } as SettingsValues;
  for (const { field } of NUMBER_SETTINGS) values[field] = settings[field] === null ? '' : String(settings[field]);
  return values;
}

/** The default of a number setting, as the hint shows it. */
export function defaultOf(field: NumberSetting): string {
  const value = BATTERY_DEFAULTS[field];
  return value === null ? 'none' : String(value);
}

/** Checks every input with the server's schema, then keeps only what differs from `base`. */
export function readSettings(values: SettingsValues, base: BatterySettings): { ok: true; changes: Partial<BatterySettings> } | { ok: false; errors: FieldErrors } {
  const all: Record<string, unknown> = { socTable: values.socTable };
  for (const { field } of NUMBER_SETTINGS) {
    const number = readDecimal(values[field]);
    all[field] = field === 'replaceAboveMilliohm' && number === undefined ? null : number;
  }
  const parsed = parseForm(batterySettingsSchema, all);
  if (!parsed.ok) return parsed;
  const changes: Partial<BatterySettings> = {};
  for (const key of Object.keys(parsed.data) as (keyof BatterySettings)[]) {
    if (parsed.data[key] !== base[key]) Object.assign(changes, { [key]: parsed.data[key] });
  }
  return { ok: true, changes };
}
