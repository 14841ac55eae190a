import { readingSchema, type ReadingInput } from '@shared/schemas/batteries';
import { parseForm, type FieldErrors } from '../../../lib/form-errors';
import { readDecimal } from './read-decimal';

/** The form as typed: strings, so a half-typed number is never reformatted. */
export interface ReadingValues {
  batteryId: string;
  voltage: string;
  resistance: string;
  /** Unanswered until tapped: whether it rested is a fact each reading must state. */
  rested: boolean | null;
  restedMinutes: string;
  temperature: string;
}

export const emptyReading = (batteryId = ''): ReadingValues => ({
  batteryId,
  voltage: '',
  resistance: '',
  rested: null,
  restedMinutes: '',
  temperature: '',
});

/** Checks the inputs with the server's schema; errors keyed by the API's field names, plus `batteryId`. */
export function readReading(values: ReadingValues): { ok: true; batteryId: string; input: ReadingInput } | { ok: false; errors: FieldErrors } {
  const parsed = parseForm(readingSchema, {
    voltage: readDecimal(values.voltage),
    internalResistanceMilliohm: readDecimal(values.resistance),
    rested: values.rested ?? undefined,
    // Minutes of rest only mean something for a rested battery.
    restedMinutes: values.rested ? (readDecimal(values.restedMinutes) ?? null) : null,
    temperatureC: readDecimal(values.temperature) ?? null,
  });
  const errors: FieldErrors = parsed.ok ? {} : { ...parsed.errors };
  if (errors.rested) errors.rested = 'Say whether it rested before this reading';
  if (!values.batteryId) errors.batteryId = 'Pick the battery you measured';
  if (!parsed.ok || errors.batteryId) return { ok: false, errors };
  return { ok: true, batteryId: values.batteryId, input: parsed.data };
}
