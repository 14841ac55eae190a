import type { Chemistry } from '@shared/domain/battery-state';
import { createBatterySchema, type BatteryJson, type CreateBatteryInput, type UpdateBatteryInput } from '@shared/schemas/batteries';
import { parseForm, type FieldErrors } from '../../../lib/form-errors';
import { readDecimal } from './read-decimal';

/** The battery's facts as typed. */
export interface BatteryFormValues {
  label: string;
  yearInService: string;
  nominalCapacityAh: string;
  chemistry: Chemistry;
  notes: string;
}

export type BatteryFields = Omit<CreateBatteryInput, 'id'>;

export const newBatteryValues = (year = new Date().getFullYear()): BatteryFormValues => ({
  label: '',
  yearInService: String(year),
  nominalCapacityAh: '18',
  chemistry: 'sealed_agm',
  notes: '',
});

export const batteryValuesOf = (battery: BatteryJson): BatteryFormValues => ({
  label: battery.label,
  yearInService: String(battery.yearInService),
  nominalCapacityAh: String(battery.nominalCapacityAh),
  chemistry: battery.chemistry,
  notes: battery.notes ?? '',
});

/** Checks the inputs with the server's schema; errors keyed by the API's field names. */
export function readBatteryForm(values: BatteryFormValues): { ok: true; data: BatteryFields } | { ok: false; errors: FieldErrors } {
  const parsed = parseForm(createBatterySchema, {
    label: values.label,
    yearInService: readDecimal(values.yearInService),
    nominalCapacityAh: readDecimal(values.nominalCapacityAh),
    chemistry: values.chemistry,
    notes: values.notes,
  });
  if (!parsed.ok) return parsed;
  const { id: _id, ...fields } = parsed.data;
  return { ok: true, data: fields };
}

/** Only the facts that differ from the version the edit started with. */
export function batteryChanges(base: BatteryJson, fields: BatteryFields): UpdateBatteryInput {
  const changes: UpdateBatteryInput = {};
  if (fields.label !== base.label) changes.label = fields.label;
  if (fields.yearInService !== base.yearInService) changes.yearInService = fields.yearInService;
  if (fields.nominalCapacityAh !== base.nominalCapacityAh) changes.nominalCapacityAh = fields.nominalCapacityAh;
  if (fields.chemistry !== base.chemistry) changes.chemistry = fields.chemistry;
  if (fields.notes !== base.notes) changes.notes = fields.notes;
  return changes;
}
