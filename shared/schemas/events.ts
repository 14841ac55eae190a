import { z } from 'zod';
import { clientId, versionField } from './common';

const isoDate = z.iso.date({ message: 'Use the form YYYY-MM-DD' });

/** True when the runtime knows the IANA zone, e.g. `America/Chicago`. */
export function isTimeZone(name: string): boolean {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: name });
    return name.includes('/') || name === 'UTC';
  } catch {
    return false;
  }
}

const eventFields = z.object({
  name: z.string().trim().min(1, { message: 'Give the event a name' }).max(120),
  venue: z.string().trim().min(1, { message: 'Give the venue' }).max(160),
  timeZone: z
    .string()
    .refine(isTimeZone, { message: 'Use an IANA time zone such as Europe/Berlin' })
    // Stored as the runtime spells it, so `america/chicago` and `America/Chicago` are one zone.
    .transform((name) => new Intl.DateTimeFormat('en-US', { timeZone: name }).resolvedOptions().timeZone),
  startDate: isoDate,
  endDate: isoDate,
  teamNumber: z
    .number({ message: 'A whole number' })
    .int({ message: 'A whole number' })
    .min(1, { message: 'From 1 to 99999' })
    .max(99999, { message: 'From 1 to 99999' }),
});

const endNotBeforeStart = (event: { startDate?: string; endDate?: string }) =>
  !event.startDate || !event.endDate || event.endDate >= event.startDate;
const endDateIssue = { message: 'Must not be before the start date', path: ['endDate'] };

export const createEventSchema = eventFields
  .extend({ id: clientId.optional(), current: z.boolean().optional() })
  .refine(endNotBeforeStart, endDateIssue);
export type CreateEventInput = z.infer<typeof createEventSchema>;

const wholeIn = (min: number, max: number, unit: string) => {
  const message = `A whole number of ${unit} from ${min} to ${max}`;
  return z.number({ message }).int({ message }).min(min, { message }).max(max, { message });
};

/** Event settings the timeline reads; each may be sent alone. */
export const eventSettingsSchema = z
  .object({
    // Either a number of matches or of minutes, never both: the timeline reads exactly one.
    queueLead: z
      .object({ matches: wholeIn(1, 20, 'matches').optional(), minutes: wholeIn(1, 240, 'minutes').optional() })
      .strict()
      .refine((lead) => (lead.matches === undefined) !== (lead.minutes === undefined), {
        message: 'Give either matches or minutes',
      }),
    matchLengthSeconds: wholeIn(30, 900, 'seconds'),
    returnToPitMinutes: wholeIn(0, 60, 'minutes'),
    tightTurnaroundMinutes: wholeIn(0, 240, 'minutes'),
    allowRunningAhead: z.boolean({ message: 'true or false' }),
  })
  .partial()
  .strict();
export type EventSettingsInput = z.infer<typeof eventSettingsSchema>;

export const updateEventSchema = eventFields
  .partial()
  .extend({
    settings: eventSettingsSchema.optional(),
    current: z.literal(true, { message: 'Only true: make another event current to replace it' }).optional(),
    version: versionField.optional(),
  })
  .strict()
  .refine(endNotBeforeStart, endDateIssue);
export type UpdateEventInput = z.infer<typeof updateEventSchema>;

export interface EventJson {
  id: string;
  name: string;
  venue: string;
  timeZone: string;
  startDate: string;
  endDate: string;
  teamNumber: number;
  settings: EventSettingsJson;
  current: boolean;
  version: number;
  createdAt: string;
  updatedAt: string;
}

/** The timeline settings as answered: one queue lead, the rest always present. */
export interface EventSettingsJson {
  queueLead: { matches: number } | { minutes: number };
  matchLengthSeconds: number;
  returnToPitMinutes: number;
  tightTurnaroundMinutes: number;
  allowRunningAhead: boolean;
}
