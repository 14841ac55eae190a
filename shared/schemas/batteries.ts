import { z } from 'zod';
import type { BatteryPlanJson } from '../domain/battery-plan';
import {
  BATTERY_STATUSES,
  CHEMISTRIES,
  SOC_TABLES,
  type BatterySettings,
  type BatteryStatus,
  type Chemistry,
  type HealthJson,
} from '../domain/battery-state';
import { clientId, requiredOr, versionField } from './common';
import { instantField } from './schedule';

export const BATTERY_LABEL_MAX = 12;

const uuid = z.uuid(requiredOr('Must be a UUID'));
const numberIn = (min: number, max: number, what: string) =>
  z
    .number(requiredOr(`${what} from ${min} to ${max}`))
    .refine(Number.isFinite, { message: `${what} from ${min} to ${max}` })
    .min(min, { message: `${what} from ${min} to ${max}` })
    .max(max, { message: `${what} from ${min} to ${max}` });
const wholeIn = (min: number, max: number, what: string) => numberIn(min, max, what).int({ message: `A whole number from ${min} to ${max}` });
const notes = z
  .string()
  .trim()
  .max(500, { message: 'At most 500 characters' })
  .nullish()
  .transform((value) => (value ? value : null));

const batteryFields = z.object({
  label: z
    .string(requiredOr('Give the label painted on it, e.g. A or 2027-3'))
    .trim()
    .min(1, { message: 'Give the label painted on it, e.g. A or 2027-3' })
    .max(BATTERY_LABEL_MAX, { message: `At most ${BATTERY_LABEL_MAX} characters` }),
  yearInService: wholeIn(2000, 2100, 'A year'),
  nominalCapacityAh: numberIn(1, 200, 'Ah'),
  chemistry: z.enum(CHEMISTRIES, requiredOr(`One of: ${CHEMISTRIES.join(', ')}`)),
  notes,
});

/** `nominalCapacityAh` defaults to 18 and `chemistry` to sealed AGM. */
export const createBatterySchema = batteryFields
  .extend({
    id: clientId.optional(),
    nominalCapacityAh: batteryFields.shape.nominalCapacityAh.default(18),
    chemistry: batteryFields.shape.chemistry.default('sealed_agm'),
    notes: notes.default(null),
  })
  .strict();
export type CreateBatteryInput = z.output<typeof createBatterySchema>;

export const updateBatterySchema = batteryFields
  .partial()
  .extend({
    status: z.enum(BATTERY_STATUSES, requiredOr(`One of: ${BATTERY_STATUSES.join(', ')}`)).optional(),
    version: versionField.optional(),
  })
  .strict();
export type UpdateBatteryInput = z.output<typeof updateBatterySchema>;

export const readingSchema = z
  .object({
    id: clientId.optional(),
    voltage: numberIn(0, 16, 'Volts'),
    internalResistanceMilliohm: numberIn(0, 1000, 'mΩ'),
    rested: z.boolean(requiredOr('true or false')),
    restedMinutes: wholeIn(0, 10080, 'Minutes').nullish().transform((value) => value ?? null),
    temperatureC: numberIn(-30, 80, '°C').nullish().transform((value) => value ?? null),
    /** When it was measured; now when left out. Never in the future. */
    takenAt: instantField.optional(),
    /** The use this reading was taken before or after, if any. */
    useId: uuid.optional(),
  })
  .strict();
export type ReadingInput = z.output<typeof readingSchema>;

export const createUseSchema = z.object({ id: clientId.optional(), matchId: uuid }).strict();
export type CreateUseInput = z.output<typeof createUseSchema>;

export const endUseSchema = z.object({ removedAt: instantField }).strict();
export type EndUseInput = z.output<typeof endUseSchema>;

export const createChargerSchema = z
  .object({
    id: clientId.optional(),
    name: z.string(requiredOr('Give it a name, e.g. Bench charger')).trim().min(1, { message: 'Give it a name, e.g. Bench charger' }).max(40, { message: 'At most 40 characters' }),
    bays: wholeIn(1, 12, 'Bays'),
    currentPerBayA: numberIn(0.5, 40, 'Amps'),
  })
  .strict();
export type CreateChargerInput = z.output<typeof createChargerSchema>;

/** Our extension: put a battery on a bay (`POST /api/batteries/:id/charging`), and take it off. */
export const startChargingSchema = z.object({ id: clientId.optional(), chargerId: uuid, bay: wholeIn(1, 12, 'Bay') }).strict();
export type StartChargingInput = z.output<typeof startChargingSchema>;
export const endChargingSchema = z.object({ endedAt: instantField }).strict();
export type EndChargingInput = z.output<typeof endChargingSchema>;

export const batterySettingsSchema = z
  .object({
    socTable: z.enum(Object.keys(SOC_TABLES) as [keyof typeof SOC_TABLES], requiredOr('bci or army')),
    watchIncreasePercent: numberIn(1, 500, 'Percent'),
    replaceIncreasePercent: numberIn(1, 500, 'Percent'),
    replaceAboveMilliohm: numberIn(1, 1000, 'mΩ').nullable(),
    baselineReadings: wholeIn(1, 10, 'Readings'),
    minimumStartChargePercent: numberIn(0, 100, 'Percent'),
    chargeFactor: numberIn(1, 2, 'A factor'),
    chargeTailMinutes: wholeIn(0, 240, 'Minutes'),
    peukertExponent: numberIn(1, 2, 'An exponent'),
    matchAverageCurrentA: numberIn(1, 200, 'Amps'),
  })
  .partial()
  .strict()
  .superRefine((settings, ctx) => {
    if (settings.watchIncreasePercent !== undefined && settings.replaceIncreasePercent !== undefined && settings.watchIncreasePercent >= settings.replaceIncreasePercent) {
      ctx.addIssue({ code: 'custom', path: ['replaceIncreasePercent'], message: 'Must be above the watch threshold' });
    }
  });

export type BatterySettingsInput = z.output<typeof batterySettingsSchema>;

export const batteryParams = z.object({ id: uuid });
/** `/api/battery-uses/:id` and `/api/charging-sessions/:id`. */
export const useParams = z.object({ id: uuid });
export const chargingSessionParams = z.object({ id: uuid });
export const planQuery = z.object({ at: instantField.optional() });

export interface PersonRef {
  id: string;
  name: string;
}

export interface ReadingJson {
  id: string;
  batteryId: string;
  voltage: number;
  internalResistanceMilliohm: number;
  rested: boolean;
  restedMinutes: number | null;
  temperatureC: number | null;
  takenAt: string;
  takenBy: PersonRef;
  useId: string | null;
  stateOfChargePercent: number;
  /** False for an unrested reading (or rested under 4 h): shown, marked as not reliable. */
  reliable: boolean;
}

/** Answer to logging a reading: the reading and the battery's health after it. */
export interface CreatedReadingJson extends ReadingJson {
  health: HealthJson;
}

export interface BatteryJson {
  id: string;
  label: string;
  yearInService: number;
  nominalCapacityAh: number;
  chemistry: Chemistry;
  notes: string | null;
  status: BatteryStatus;
  health: HealthJson;
  latestReading: ReadingJson | null;
  /**
   * Its charge now (0–100, one decimal) by the estimate the plan and readiness read: the latest
   * reading, less a match's draw for each use since, full again after a finished charge. Null when
   * it was never read nor charged.
   */
  estimatedChargePercent: number | null;
  lastUsedAt: string | null;
  /** Matches it went into at the team's current event. */
  usesThisEvent: number;
  /** While charging: the open charging session. */
  charging: ChargingSessionJson | null;
  version: number;
}

/** GET /api/batteries/:id: the battery with every reading (oldest first) and its uses. */
export interface BatteryDetailJson extends BatteryJson {
  readings: ReadingJson[];
  uses: UseJson[];
}

export interface UseJson {
  id: string;
  batteryId: string;
  matchId: string;
  installedAt: string;
  removedAt: string | null;
}

export interface ChargerJson {
  id: string;
  name: string;
  bays: number;
  currentPerBayA: number;
}

export interface ChargingSessionJson {
  id: string;
  batteryId: string;
  chargerId: string;
  bay: number;
  startedAt: string;
  endedAt: string | null;
  /** When the charge should end by REFERENCES §4 (from its charge at the start). */
  expectedEndAt: string | null;
}

export type { BatteryPlanJson, BatterySettings };
