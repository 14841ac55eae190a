import { eventSettingsSchema, type EventSettingsInput, type EventSettingsJson } from '@shared/schemas/events';
import { isApiError } from '../../../lib/api-client';
import { parseForm, type FieldErrors } from '../../../lib/form-errors';

/** The timing inputs as typed: strings, so a half-typed number is never reformatted. */
export interface TimingValues {
  queueLeadUnit: 'matches' | 'minutes';
  queueLead: string;
  matchLengthSeconds: string;
  returnToPitMinutes: string;
  tightTurnaroundMinutes: string;
  allowRunningAhead: boolean;
}

export function timingValuesOf(settings: EventSettingsJson): TimingValues {
  const lead = settings.queueLead;
  return {
    queueLeadUnit: 'matches' in lead ? 'matches' : 'minutes',
    queueLead: String('matches' in lead ? lead.matches : lead.minutes),
    matchLengthSeconds: String(settings.matchLengthSeconds),
    returnToPitMinutes: String(settings.returnToPitMinutes),
    tightTurnaroundMinutes: String(settings.tightTurnaroundMinutes),
    allowRunningAhead: settings.allowRunningAhead,
  };
}

// `Number('')` is 0: an emptied input must be refused, not saved as zero. NaN gets the schema's message.
const whole = (text: string) => (/^\d+$/.test(text.trim()) ? Number(text) : NaN);

/** Checks the inputs with the server's schema; errors keyed `queueLead`, `matchLengthSeconds`, … */
export function readTiming(values: TimingValues): { ok: true; data: EventSettingsJson } | { ok: false; errors: FieldErrors } {
  const settings = {
    queueLead: { [values.queueLeadUnit]: whole(values.queueLead) },
    matchLengthSeconds: whole(values.matchLengthSeconds),
    returnToPitMinutes: whole(values.returnToPitMinutes),
    tightTurnaroundMinutes: whole(values.tightTurnaroundMinutes),
    allowRunningAhead: values.allowRunningAhead,
  };
  const parsed = parseForm(eventSettingsSchema, settings);
  if (!parsed.ok) return { ok: false, errors: parsed.errors };
  return { ok: true, data: settings as EventSettingsJson };
}

/** Only the settings that differ from the version the edit started with; undefined when none do. */
export function timingChanges(base: EventSettingsJson, next: EventSettingsJson): EventSettingsInput | undefined {
  const changes: EventSettingsInput = {};
  if (JSON.stringify(base.queueLead) !== JSON.stringify(next.queueLead)) changes.queueLead = next.queueLead;
  if (base.matchLengthSeconds !== next.matchLengthSeconds) changes.matchLengthSeconds = next.matchLengthSeconds;
  if (base.returnToPitMinutes !== next.returnToPitMinutes) changes.returnToPitMinutes = next.returnToPitMinutes;
  if (base.tightTurnaroundMinutes !== next.tightTurnaroundMinutes) changes.tightTurnaroundMinutes = next.tightTurnaroundMinutes;
  if (base.allowRunningAhead !== next.allowRunningAhead) changes.allowRunningAhead = next.allowRunningAhead;
  return Object.keys(changes).length > 0 ? changes : undefined;
}

/** The server names nested fields `settings.queueLead.matches`; each input shows its own. */
export function serverTimingErrors(error: unknown): FieldErrors {
  if (!isApiError(error)) return {};
  const errors: FieldErrors = {};
  for (const [key, message] of Object.entries(error.fields)) {
    const [head, name] = key.split('.');
    if (head === 'settings') errors[name ?? 'queueLead'] ??= message;
  }
  return errors;
}
