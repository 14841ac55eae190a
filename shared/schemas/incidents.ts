import { z } from 'zod';
import {
  INCIDENT_KINDS,
  INCIDENT_LOCATIONS,
  TREATMENT_CODES,
  type AlertReason,
  type IncidentClassification,
  type IncidentKind,
  type IncidentLocation,
  type TreatmentCode,
} from '../domain/incident-classification';
import { clientId, requiredOr, versionField } from './common';
import { REPAIR_PHOTO_MAX_BYTES, REPAIR_PHOTO_TYPES, REPAIR_PHOTOS_MAX } from './repairs';
import { instantField } from './schedule';

export const INCIDENT_DESCRIPTION_MAX = 2000;
export const INCIDENT_NOTE_MAX = 2000;
export const INVOLVED_MAX = 20;
export const FOLLOW_UPS_MAX = 30;
export const FOLLOW_UP_TEXT_MAX = 300;
// Photos follow the repairs' rules: same types, size and count.
export const INCIDENT_PHOTOS_MAX = REPAIR_PHOTOS_MAX;
export const INCIDENT_PHOTO_MAX_BYTES = REPAIR_PHOTO_MAX_BYTES;
export const INCIDENT_PHOTO_TYPES = REPAIR_PHOTO_TYPES;

export const INCIDENT_STATUSES = ['open', 'closed'] as const;
export type IncidentStatus = (typeof INCIDENT_STATUSES)[number];

/**
 * Who a person involved was. Never a name: members include minors, so a report holds initials
 * and one of these.
 */
export const INVOLVED_ROLES = ['student', 'mentor', 'adult_volunteer', 'other_team', 'event_staff', 'visitor', 'other'] as const;
export type InvolvedRole = (typeof INVOLVED_ROLES)[number];
export const INVOLVED_ROLE_LABELS: Record<InvolvedRole, string> = {
  student: 'Student on the team',
  mentor: 'Mentor',
  adult_volunteer: 'Adult volunteer',
  other_team: 'Someone from another team',
  event_staff: 'Event staff',
  visitor: 'Visitor',
  other: 'Someone else',
};

export const LOCATION_LABELS: Record<IncidentLocation, string> = {
  pit: 'Pit',
  queue: 'Queue',
  field: 'Field',
  stands: 'Stands',
  travel: 'Travel',
  other: 'Somewhere else',
};

export const KIND_LABELS: Record<IncidentKind, string> = {
  injury: 'Injury',
  near_miss: 'Near miss (nobody hurt)',
  battery_or_chemical: 'Battery acid or chemical',
  tool_or_machine: 'Tool or machine',
  property_damage: 'Damage to property',
  other: 'Something else',
};

const uuid = z.uuid(requiredOr('Must be a UUID'));
const INITIALS_MESSAGE = 'Initials only: 1 to 4 letters, never a full name';
/** "a.b." or "A B" → "AB"; anything longer than four letters is refused as a possible name. */
export const initialsField = z
  .string(requiredOr(INITIALS_MESSAGE))
  .transform((value) => value.replace(/[\s.]/g, '').toUpperCase())
  .pipe(z.string().regex(/^\p{L}{1,4}$/u, { message: INITIALS_MESSAGE }));

const involvedField = z
  .array(
    z
      .object({
        initials: initialsField,
        role: z.enum(INVOLVED_ROLES, requiredOr(`One of: ${INVOLVED_ROLES.join(', ')}`)),
      })
      .strict(),
    { message: 'A list of {initials, role}' },
  )
  .max(INVOLVED_MAX, { message: `At most ${INVOLVED_MAX} people` });

const treatmentsField = z
  .array(z.enum(TREATMENT_CODES, { message: 'Pick treatments from the list' }), { message: 'A list of treatment codes' })
  .max(TREATMENT_CODES.length)
  .transform((codes) => [...new Set(codes)]);

const description = z
  .string(requiredOr('Say what happened'))
  .trim()
  .min(1, { message: 'Say what happened' })
  .max(INCIDENT_DESCRIPTION_MAX, { message: `At most ${INCIDENT_DESCRIPTION_MAX} characters` });
// An empty optional text from a form means "none".
const optionalText = (max: number) =>
  z
    .string({ message: 'Text' })
    .trim()
    .max(max, { message: `At most ${max} characters` })
    .nullish()
    .transform((value) => (value ? value : null));
const location = z.enum(INCIDENT_LOCATIONS, requiredOr(`One of: ${INCIDENT_LOCATIONS.join(', ')}`));
const kind = z.enum(INCIDENT_KINDS, requiredOr(`One of: ${INCIDENT_KINDS.join(', ')}`));

export const DATE_MESSAGE = 'A date, e.g. 2027-03-06';
export const dateOnlyField = z.iso.date(requiredOr(DATE_MESSAGE));

export const incidentParams = z.object({ id: uuid });
export const incidentPhotoParams = z.object({ id: uuid, photoId: uuid });

/**
 * `POST /api/incidents`, by anyone signed in. The event is the team's current one unless
 * `eventId` says otherwise (none for an incident outside an event, e.g. on the way there).
 */
export const createIncidentSchema = z
  .object({
    id: clientId.optional(),
    eventId: uuid.nullish(),
    occurredAt: instantField,
    location,
    kind,
    description,
    involved: involvedField.default([]),
    treatments: treatmentsField.default([]),
    immediateActions: optionalText(INCIDENT_NOTE_MAX),
    batteryId: uuid.nullish().transform((value) => value ?? null),
  })
  .strict();
export type CreateIncidentInput = z.output<typeof createIncidentSchema>;

export const followUpField = z
  .object({
    id: uuid.optional(),
    text: z
      .string(requiredOr('Say what is to be done'))
      .trim()
      .min(1, { message: 'Say what is to be done' })
      .max(FOLLOW_UP_TEXT_MAX, { message: `At most ${FOLLOW_UP_TEXT_MAX} characters` }),
    /** A member of the team (their membership id). */
    ownerId: uuid,
    dueOn: dateOnlyField,
    done: z.boolean({ message: 'true or false' }).default(false),
  })
  .strict();

/**
 * `PATCH /api/incidents/:id` (safety, admin): any of the fields, always the `version` it was
 * based on. `followUps` is the whole list. Closing needs a `closingNote`; `retireBattery` with
 * it retires the battery the incident names.
 */
export const updateIncidentSchema = z
  .object({
    version: versionField,
    occurredAt: instantField.optional(),
    location: location.optional(),
    kind: kind.optional(),
    description: description.optional(),
    involved: involvedField.optional(),
    treatments: treatmentsField.optional(),
    immediateActions: optionalText(INCIDENT_NOTE_MAX).optional(),
    batteryId: uuid.nullable().optional(),
    followUps: z.array(followUpField, { message: 'A list of follow-up actions' }).max(FOLLOW_UPS_MAX, { message: `At most ${FOLLOW_UPS_MAX} follow-up actions` }).optional(),
    status: z.enum(INCIDENT_STATUSES, { message: 'open or closed' }).optional(),
    closingNote: optionalText(INCIDENT_NOTE_MAX).optional(),
    retireBattery: z.literal(true, { message: 'Only true' }).optional(),
  })
  .strict();
export type UpdateIncidentInput = z.output<typeof updateIncidentSchema>;

/** `GET /api/incidents` and `/api/incidents.csv`: the current event's by default, `all` for every one. */
export const incidentListQuery = z
  .object({
    eventId: z.union([uuid, z.literal('all')], { message: 'An event id or all' }).optional(),
    status: z.enum(INCIDENT_STATUSES, { message: 'open or closed' }).optional(),
  })
  .strict();

export interface InvolvedPersonJson {
  initials: string;
  role: InvolvedRole;
}

export interface FollowUpJson {
  id: string;
  text: string;
  ownerId: string;
  ownerName: string;
  dueOn: string;
  done: boolean;
  doneAt: string | null;
}

export interface IncidentPhotoJson {
  id: string;
  contentType: string;
  width: number | null;
  height: number | null;
  hasThumb: boolean;
  createdAt: string;
}

export interface IncidentJson {
  id: string;
  eventId: string | null;
  occurredAt: string;
  location: IncidentLocation;
  kind: IncidentKind;
  description: string;
  involved: InvolvedPersonJson[];
  treatments: TreatmentCode[];
  immediateActions: string | null;
  batteryId: string | null;
  batteryName: string | null;
  classification: IncidentClassification;
  /** Why the safety contacts were told at once; empty when they were not. */
  alertReasons: AlertReason[];
  status: IncidentStatus;
  /**
   * `full` for safety and admin; `reporter` for the one who reported it without those roles:
   * what they sent and where it stands, without the follow-ups or the closing note.
   */
  view: 'full' | 'reporter';
  followUps: FollowUpJson[];
  closingNote: string | null;
  closedAt: string | null;
  photos: IncidentPhotoJson[];
  reporter: { id: string; name: string };
  createdAt: string;
  updatedAt: string;
  version: number;
}

export interface IncidentListJson {
  incidents: IncidentJson[];
}
